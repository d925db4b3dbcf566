import { format, startOfISOWeek, startOfMonth, subDays } from 'date-fns';
import type { DayRange } from './reports-api';

/** The quick picks of the range picker. */
export const QUICK_RANGES = ['last7', 'thisWeek', 'thisMonth'] as const;
export type QuickRange = (typeof QUICK_RANGES)[number];

/** How each quick pick is labelled. */
export const QUICK_RANGE_LABELS: Readonly<Record<QuickRange, string>> = {
  last7: 'Last 7 days',
  thisWeek: 'This week',
  thisMonth: 'This month',
};

/** The days of a quick pick, ending today (the tablet's calendar day). Weeks start on Monday. */
export function quickRange(pick: QuickRange, today: Date): DayRange {
  const day = (d: Date) => format(d, 'yyyy-MM-dd');
  switch (pick) {
    case 'last7': return { from: day(subDays(today, 6)), to: day(today) };
    case 'thisWeek': return { from: day(startOfISOWeek(today)), to: day(today) };
    case 'thisMonth': return { from: day(startOfMonth(today)), to: day(today) };
  }
}
