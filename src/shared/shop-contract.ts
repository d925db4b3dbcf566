import type { StationKind } from './names';
import type { ShopUnits } from './press/units';

/** ISO 8601 weekday numbers: 1 is Monday, 7 is Sunday. */
export const ISO_WEEKDAYS = [1, 2, 3, 4, 5, 6, 7] as const;
export type IsoWeekday = (typeof ISO_WEEKDAYS)[number];

/** Weekday names by ISO number, as screens and messages write them. */
export const WEEKDAY_NAMES: Record<IsoWeekday, string> = { 1: 'Monday', 2: 'Tuesday', 3: 'Wednesday', 4: 'Thursday', 5: 'Friday', 6: 'Saturday', 7: 'Sunday' };

/** Bounds the hub enforces on the shop's settings (the screen checks the same ones before sending). */
export const SHOP_LIMITS = {
  shopNameMax: 120,
  addressMax: 400,
  phoneMax: 40,
  emailMax: 254,
  timeZoneMax: 64,
  standardRate: { min: 1, max: 2000 },
  bagMaxPieces: { min: 1, max: 500 },
  heatExposureLimitS: { min: 5, max: 600 },
  closedDaysMax: 60,
  closedDayNoteMax: 80,
} as const;

/** A calendar day the shop is closed although it falls on a working day (a bank holiday, a stocktake). */
export interface ClosedDay {
  /** 'YYYY-MM-DD' in the shop's calendar. */
  date: string;
  /** Why, for the people reading the list ("Bank holiday"); may be empty. */
  note: string;
}

/**
 * GET /api/shop (owner and lead) answers this; PUT /api/shop (owner only) takes it without `updatedAt`
 * and answers the stored settings. Times of day are the shop's wall clock, 'HH:MM'; a shift whose end
 * is not after its start runs past midnight. `workingDays` are the days the shift runs, sorted, at least one;
 * `closedDays` (at most closedDaysMax, each date once) are dates it does not run all the same.
 */
export interface ShopSettings {
  shopName: string;
  address: string;
  phone: string;
  email: string;
  units: ShopUnits;
  /** An IANA time zone name, e.g. Europe/London. */
  timeZone: string;
  shiftStart: string;
  shiftEnd: string;
  workingDays: IsoWeekday[];
  /** Days the shift does not run although they are working days, in date order. */
  closedDays: ClosedDay[];
  /** Good pieces per hour each stage of work is planned at before the floor has shown its own rate. */
  standardRates: Record<StationKind, number>;
  /** Most pieces one job bag holds when an order's jobs are split into bags. */
  bagMaxPieces: number;
  /** Longest press dwell, in seconds, before the press card warns of heat exposure. */
  heatExposureLimitS: number;
  updatedAt: string;
}

/** What the owner sends to change the settings. */
export type ShopSettingsInput = Omit<ShopSettings, 'updatedAt'>;

/** Writes working days as the database keeps them: '1,2,3,4,5'. */
export function workingDaysText(days: readonly IsoWeekday[]): string {
  return [...new Set(days)].sort((a, b) => a - b).join(',');
}

/** Reads working days as the database keeps them; anything unreadable is left out. */
export function parseWorkingDays(text: string): IsoWeekday[] {
  const days = text.split(',').map((part) => Number(part.trim()));
  return ISO_WEEKDAYS.filter((day) => days.includes(day));
}
