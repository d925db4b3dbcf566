import type { IsoWeekday } from '../shop-contract';
import { addDays, localDate, shiftOnDay, worksOn } from './shift-window';
import { HOUR_MS } from './floor-types';

/** Adds hours of work to a time, counting only the hours inside shifts; answers epoch milliseconds. */
export type AddWorkingHours = (fromMs: number, hours: number) => number;

/** Plain clock time: every hour is a working hour. */
export const addClockHours: AddWorkingHours = (fromMs, hours) => fromMs + hours * HOUR_MS;

/** Far enough ahead for any real order; beyond it the answer is the clock time, not a hang. */
const MAX_DAYS = 400;

/**
 * Working time for a shop that runs one shift a day on its working days, from `shiftStart` to `shiftEnd`
 * in its time zone: work left at the end of a shift carries over to the next working day's shift start.
 * A shift belongs to the day it starts on (an overnight shift from Friday night runs into Saturday).
 * Days are stepped as local calendar days, so a shift on the day the clocks change keeps its wall-clock
 * times. No working days at all is read as every day; closed days ('YYYY-MM-DD') do not work.
 */
export function shiftWorkingHours(
  timeZone: string,
  shiftStart: string,
  shiftEnd: string,
  workingDays: readonly IsoWeekday[],
  closedDays: readonly string[] = [],
): AddWorkingHours {
  const works = worksOn(workingDays, closedDays);
  return (fromMs, hours) => {
    let left = hours * HOUR_MS;
    let at = fromMs;
    // Start a day early: an overnight shift that began yesterday may still be running.
    let day = addDays(localDate(new Date(fromMs), timeZone), -1);
    for (let i = 0; i < MAX_DAYS; i++, day = addDays(day, 1)) {
      if (!works(day)) continue;
      const shift = shiftOnDay(day, timeZone, shiftStart, shiftEnd);
      const endMs = Date.parse(shift.endAt);
      if (endMs <= at) continue;
      const begin = Math.max(at, Date.parse(shift.startAt));
      if (left <= endMs - begin) return begin + left;
      left -= endMs - begin;
      at = endMs;
    }
    return at + left;
  };
}
