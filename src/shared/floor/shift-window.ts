import { TZDate } from '@date-fns/tz';
import type { IsoWeekday } from '../shop-contract';
import type { FloorShift } from './floor-types';

/** A span of local time given as ISO 8601 instants: start included, end excluded. */
export interface LocalSpan {
  startAt: string;
  endAt: string;
}

const CLOCK = /^([01]\d|2[0-3]):([0-5]\d)(?::([0-5]\d))?$/;
const DAY = /^(\d{4})-(\d{2})-(\d{2})$/;

/** Reads a wall-clock time 'HH:MM' (or 'HH:MM:SS', as the database gives it back). */
export function parseClock(clock: string): { hours: number; minutes: number; seconds: number } {
  const match = CLOCK.exec(clock);
  if (!match) throw new RangeError(`"${clock}" is not a time of day: write it as HH:MM, e.g. 07:00.`);
  return { hours: Number(match[1]), minutes: Number(match[2]), seconds: Number(match[3] ?? 0) };
}

/** Throws a RangeError with a sentence when the time zone is not an IANA name this runtime knows. */
export function checkTimeZone(timeZone: string): void {
  try {
    new Intl.DateTimeFormat('en-GB', { timeZone });
  } catch {
    throw new RangeError(`"${timeZone}" is not a known time zone: use an IANA name such as Europe/London.`);
  }
}

/** The calendar date 'YYYY-MM-DD' an instant falls on in the time zone. */
export function localDate(at: Date, timeZone: string): string {
  const local = new TZDate(at.getTime(), timeZone);
  return `${local.getFullYear()}-${pad(local.getMonth() + 1)}-${pad(local.getDate())}`;
}

/** The local calendar day [start, end) in the time zone; a day the clocks change is 23 or 25 hours long. */
export function localDaySpan(day: string, timeZone: string): LocalSpan {
  const { year, month, date } = parseDay(day);
  return {
    startAt: wallClock(year, month, date, 0, 0, 0, timeZone).toISOString(),
    endAt: wallClock(year, month, date + 1, 0, 0, 0, timeZone).toISOString(),
  };
}

/** The local days from `from` to `to`, both included, in order. */
export function localDaysBetween(from: string, to: string): string[] {
  const days: string[] = [];
  const start = parseDay(from);
  // Calendar arithmetic in UTC: a day is a date, not 24 hours of some zone.
  for (let d = Date.UTC(start.year, start.month, start.date); ; d += 86_400_000) {
    const day = new Date(d).toISOString().slice(0, 10);
    if (day > to) return days;
    days.push(day);
  }
}

/**
 * The shift on the floor in the shop's time zone. A shift whose end is not after its start ends the
 * next day. The floor changes over from one shift to the next halfway through the break between
 * them: until then overtime counts towards the shift that ended, after it early work counts towards
 * the next one (its `openedAt`), so nothing done on the floor goes missing from the board.
 */
export function shiftWindow(now: Date, timeZone: string, shiftStart: string, shiftEnd: string): FloorShift {
  checkTimeZone(timeZone);
  const today = localDate(now, timeZone);
  // Three days' shifts around today cover every changeover that can fall on it, overnight shifts included.
  const shifts = [-2, -1, 0, 1].map((offset) => shiftOnDay(addDays(today, offset), timeZone, shiftStart, shiftEnd));
  const nowMs = now.getTime();
  for (let i = shifts.length - 1; i >= 1; i--) {
    const previous = shifts[i - 1]!;
    const shift = shifts[i]!;
    const openedMs = (Date.parse(previous.endAt) + Date.parse(shift.startAt)) / 2;
    if (openedMs <= nowMs) return { ...shift, now: now.toISOString(), openedAt: new Date(openedMs).toISOString() };
  }
  return { ...shifts[0]!, now: now.toISOString() };
}

/** The calendar day `days` after 'YYYY-MM-DD' (calendar arithmetic in UTC: a day is a date, not 24 hours of a zone). */
export function addDays(day: string, days: number): string {
  return new Date(Date.parse(`${day}T00:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);
}

/** The shift that starts on a local calendar day 'YYYY-MM-DD' (ending the next day when it runs past midnight). */
export function shiftOnDay(day: string, timeZone: string, shiftStart: string, shiftEnd: string): LocalSpan {
  const { year, month, date } = parseDay(day);
  const start = parseClock(shiftStart);
  const end = parseClock(shiftEnd);
  const startAt = wallClock(year, month, date, start.hours, start.minutes, start.seconds, timeZone);
  let endAt = wallClock(year, month, date, end.hours, end.minutes, end.seconds, timeZone);
  if (endAt.getTime() <= startAt.getTime()) endAt = wallClock(year, month, date + 1, end.hours, end.minutes, end.seconds, timeZone);
  return { startAt: startAt.toISOString(), endAt: endAt.toISOString() };
}

/**
 * The next shift on a working day that is not a closed day to start after `now` (for planning the day
 * ahead once the current one has ended). No working days at all is read as every day.
 */
export function nextShift(
  now: Date,
  timeZone: string,
  shiftStart: string,
  shiftEnd: string,
  workingDays: readonly IsoWeekday[],
  closedDays: readonly string[] = [],
): FloorShift {
  checkTimeZone(timeZone);
  const works = worksOn(workingDays, closedDays);
  const today = localDate(now, timeZone);
  // A week and a day from today reach the next working day's shift even when today's has already started;
  // every closed day can push it one day further.
  for (let offset = 0; offset <= 7 + closedDays.length; offset++) {
    const day = addDays(today, offset);
    if (!works(day)) continue;
    const shift = shiftOnDay(day, timeZone, shiftStart, shiftEnd);
    if (Date.parse(shift.startAt) > now.getTime()) return { ...shift, now: now.toISOString() };
  }
  throw new RangeError('The shop has no working day on which a shift could start.');
}

/** The ISO 8601 weekday of a calendar day 'YYYY-MM-DD' (1 Monday to 7 Sunday), by calendar arithmetic. */
export function isoWeekdayOf(day: string): IsoWeekday {
  const { year, month, date } = parseDay(day);
  // A calendar date's weekday is the same in every zone: read it in UTC, where a day is always 24 hours.
  const sundayIsZero = new Date(Date.UTC(year, month, date)).getUTCDay();
  return (sundayIsZero === 0 ? 7 : sundayIsZero) as IsoWeekday;
}

/**
 * Whether a shift starting on a calendar day runs: on the shop's working days (none at all is read as
 * every day), except its closed days ('YYYY-MM-DD').
 */
export function worksOn(workingDays: readonly IsoWeekday[], closedDays: readonly string[] = []): (day: string) => boolean {
  const days = new Set(workingDays.length === 0 ? [1, 2, 3, 4, 5, 6, 7] : workingDays);
  const closed = new Set(closedDays);
  return (day) => days.has(isoWeekdayOf(day)) && !closed.has(day);
}

function wallClock(year: number, month: number, date: number, hours: number, minutes: number, seconds: number, timeZone: string): Date {
  // TZDate rolls over day and month overflow (date + 1 on the 31st) the way Date does.
  return new Date(new TZDate(year, month, date, hours, minutes, seconds, timeZone).getTime());
}

function parseDay(day: string): { year: number; month: number; date: number } {
  const match = DAY.exec(day);
  if (!match || !isRealDay(day)) throw new RangeError(`"${day}" is not a calendar date: write it as YYYY-MM-DD, e.g. 2026-03-29.`);
  return { year: Number(match[1]), month: Number(match[2]) - 1, date: Number(match[3]) };
}

/** Whether 'YYYY-MM-DD' names a day that exists (no 30 February). */
export function isRealDay(day: string): boolean {
  const match = DAY.exec(day);
  if (!match) return false;
  const utc = new Date(Date.UTC(Number(match[1]), Number(match[2]) - 1, Number(match[3])));
  return utc.toISOString().slice(0, 10) === day;
}

const pad = (n: number) => String(n).padStart(2, '0');
