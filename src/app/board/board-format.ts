import { format, isSameDay, addDays } from 'date-fns';
import type { BagStage, StationKind } from '../../shared/names';

/** What each bag stage is called on the board, and which station takes the bags next. */
export const STAGE_LABELS: Readonly<Record<BagStage, { label: string; next: string }>> = {
  queued: { label: 'Queued', next: 'waiting for Cut' },
  cut: { label: 'Cut', next: 'waiting for Weed' },
  weeded: { label: 'Weeded', next: 'waiting for Press' },
  pressed: { label: 'Pressed', next: 'waiting for Pack' },
  packed: { label: 'Packed', next: 'ready to go' },
};

/** Station kinds as the board names a bottleneck. */
export const KIND_LABELS: Readonly<Record<StationKind, string>> = { cut: 'Cut', weed: 'Weed', press: 'Press', pack: 'Pack' };

/** A fraction 0 to 1 as a percentage; small ones keep a decimal so 2.4 % does not read as 2 %. */
export function percent(fraction: number | null): string {
  if (fraction === null || !Number.isFinite(fraction)) return '—';
  const value = fraction * 100;
  return value < 10 && value !== 0 ? `${value.toFixed(1)} %` : `${Math.round(value)} %`;
}

/** Pieces per hour, whole; a dash before any time has passed. */
export function rate(piecesPerHour: number | null): string {
  return piecesPerHour === null || !Number.isFinite(piecesPerHour) ? '—' : String(Math.round(piecesPerHour));
}

/** Seconds per piece as minutes and seconds ("1 min 32 s"); a dash when nothing is due. */
export function taktText(seconds: number | null): string {
  if (seconds === null || !Number.isFinite(seconds)) return '—';
  const whole = Math.round(seconds);
  if (whole < 60) return `${whole} s`;
  const minutes = Math.floor(whole / 60);
  const rest = whole % 60;
  return rest === 0 ? `${minutes} min` : `${minutes} min ${rest} s`;
}

/** A clock time (HH:mm) in this screen's time zone, or a dash. */
export function clock(iso: string | null): string {
  return iso ? format(new Date(iso), 'HH:mm') : '—';
}

/** A due time or ETA relative to `now`, as its day ("Today", "Tomorrow", "Thu 12 Jun") and its clock time, or a dash. */
export function dayAndTime(iso: string | null, now: Date): { day: string; time: string } {
  if (!iso) return { day: '—', time: '' };
  const at = new Date(iso);
  const time = format(at, 'HH:mm');
  if (isSameDay(at, now)) return { day: 'Today', time };
  if (isSameDay(at, addDays(now, 1))) return { day: 'Tomorrow', time };
  return { day: format(at, 'EEE d MMM'), time };
}
