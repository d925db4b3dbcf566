import { TZDate } from '@date-fns/tz';
import { format } from 'date-fns';

/** A moment as the shop's clock shows it, e.g. "Tue 14 Jul 15:30". */
export function shopTime(at: string | Date, timeZone: string): string {
  return format(new TZDate(new Date(at), timeZone), 'EEE d MMM HH:mm');
}

/** A shop calendar day (YYYY-MM-DD) in words, e.g. "Tuesday 14 July 2026". */
export function shopDay(day: string): string {
  const [y, m, d] = day.split('-').map(Number);
  return format(new Date(Date.UTC(y!, m! - 1, d!, 12)), 'EEEE d MMMM yyyy');
}
