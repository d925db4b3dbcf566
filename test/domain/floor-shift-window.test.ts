import { isoWeekdayOf, isRealDay, localDate, localDaySpan, localDaysBetween, parseClock, shiftWindow, worksOn } from '../../src/shared/floor/shift-window';
import { WEEKDAY_NAMES } from '../../src/shared/shop-contract';

const HOUR_MS = 3_600_000;
const LONDON = 'Europe/London';

/** The UTC offset Node's own ICU data gives for an instant, e.g. "GMT+01:00" (an independent reference). */
function intlOffset(at: string, timeZone: string): string {
  const parts = new Intl.DateTimeFormat('en-GB', { timeZone, timeZoneName: 'longOffset' }).formatToParts(new Date(at));
  return parts.find((p) => p.type === 'timeZoneName')!.value;
}

/** The local wall-clock time Node's ICU data gives for an instant, "HH:MM". */
function intlClock(at: string, timeZone: string): string {
  return new Intl.DateTimeFormat('en-GB', { timeZone, hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(new Date(at));
}

describe('the shift window in the shop\'s time zone', () => {
  it('gives a winter day shift of 07:00-15:30 in London as 07:00Z-15:30Z (GMT is UTC+00:00)', () => {
    const shift = shiftWindow(new Date('2026-01-14T10:00:00Z'), LONDON, '07:00', '15:30');
    expect(shift).toMatchObject({ startAt: '2026-01-14T07:00:00.000Z', endAt: '2026-01-14T15:30:00.000Z', now: '2026-01-14T10:00:00.000Z' });
  });

  it('opens the day\'s shift halfway through the night\'s break, so a board at 06:30 shows the shift about to start', () => {
    // Worked by hand: 15:30 to 07:00 is a 15.5 h break; halfway is 23:15.
    const early = shiftWindow(new Date('2026-01-14T06:30:00Z'), LONDON, '07:00', '15:30');
    expect(early).toEqual({ startAt: '2026-01-14T07:00:00.000Z', endAt: '2026-01-14T15:30:00.000Z', now: '2026-01-14T06:30:00.000Z', openedAt: '2026-01-13T23:15:00.000Z' });
    expect(shiftWindow(new Date('2026-01-13T23:15:00Z'), LONDON, '07:00', '15:30').startAt).toBe('2026-01-14T07:00:00.000Z');
  });

  it('keeps showing the day\'s shift in the evening, overtime included, until halfway through the break', () => {
    const evening = shiftWindow(new Date('2026-01-14T22:45:00Z'), LONDON, '07:00', '15:30');
    expect(evening.startAt).toBe('2026-01-14T07:00:00.000Z');
    expect(evening.now).toBe('2026-01-14T22:45:00.000Z');
    expect(shiftWindow(new Date('2026-01-14T23:14:59Z'), LONDON, '07:00', '15:30').startAt).toBe('2026-01-14T07:00:00.000Z');
  });

  it('moves the shift one hour earlier in UTC on the day the clocks go forward (29 March 2026)', () => {
    // Summer Time Act 1972 as amended, with EU directive 2000/84/EC: summer time starts at 01:00 UTC on the last
    // Sunday of March, which in 2026 is 29 March; London goes from UTC+00:00 to UTC+01:00.
    const saturday = shiftWindow(new Date('2026-03-28T09:00:00Z'), LONDON, '07:00', '15:30');
    const sunday = shiftWindow(new Date('2026-03-29T09:00:00Z'), LONDON, '07:00', '15:30');
    expect(saturday.startAt).toBe('2026-03-28T07:00:00.000Z');
    expect(sunday.startAt).toBe('2026-03-29T06:00:00.000Z');
    expect(sunday.endAt).toBe('2026-03-29T14:30:00.000Z');
    // Cross-check against Node's Intl.DateTimeFormat: the start reads 07:00 on the wall, at UTC+01:00 that day and UTC+00:00 the day before.
    expect(intlOffset(sunday.startAt, LONDON)).toBe('GMT+01:00');
    // ICU versions write UTC+00:00 as "GMT" or "GMT+00:00".
    expect(intlOffset(saturday.startAt, LONDON)).toMatch(/^GMT(\+00:00)?$/);
    expect(intlClock(sunday.startAt, LONDON)).toBe('07:00');
    expect(intlClock(sunday.endAt, LONDON)).toBe('15:30');
  });

  it('ends an overnight shift the next day, one hour shorter across the spring change', () => {
    // 22:00 GMT on Saturday 28 March to 06:00 BST on Sunday 29 March: 22:00Z to 05:00Z, 7 hours (Summer Time Act 1972 rule as above).
    const shift = shiftWindow(new Date('2026-03-28T23:00:00Z'), LONDON, '22:00', '06:00');
    expect(shift.startAt).toBe('2026-03-28T22:00:00.000Z');
    expect(shift.endAt).toBe('2026-03-29T05:00:00.000Z');
    expect(Date.parse(shift.endAt) - Date.parse(shift.startAt)).toBe(7 * HOUR_MS);
  });

  it('still shows last night\'s overnight shift in the small hours, not tonight\'s', () => {
    const shift = shiftWindow(new Date('2026-01-15T03:00:00Z'), LONDON, '22:00', '06:00');
    expect(shift).toMatchObject({ startAt: '2026-01-14T22:00:00.000Z', endAt: '2026-01-15T06:00:00.000Z' });
  });

  it('reads the clock as the database gives it back, with seconds', () => {
    const shift = shiftWindow(new Date('2026-01-14T10:00:00Z'), LONDON, '07:00:30', '15:30:00');
    expect(shift.startAt).toBe('2026-01-14T07:00:30.000Z');
  });

  it('works in a zone east of UTC with a half-hour offset', () => {
    // Asia/Kolkata is UTC+05:30 all year (no summer time; from memory, checked against Intl below).
    const shift = shiftWindow(new Date('2026-06-01T04:00:00Z'), 'Asia/Kolkata', '09:00', '17:30');
    expect(shift.startAt).toBe('2026-06-01T03:30:00.000Z');
    expect(intlOffset(shift.startAt, 'Asia/Kolkata')).toBe('GMT+05:30');
  });

  it('refuses a clock that is not HH:MM and a time zone that does not exist, with a sentence', () => {
    expect(() => parseClock('7am')).toThrow('"7am" is not a time of day: write it as HH:MM, e.g. 07:00.');
    expect(() => parseClock('24:00')).toThrow(RangeError);
    expect(() => shiftWindow(new Date(), 'Europe/Hollinford', '07:00', '15:30')).toThrow('"Europe/Hollinford" is not a known time zone');
  });
});

describe('local calendar days for the reports', () => {
  it('gives the spring-change day in London 23 hours, midnight to midnight', () => {
    // Summer Time Act 1972 / EU directive 2000/84/EC: the last Sunday of March (29 March 2026) has 23 hours.
    const day = localDaySpan('2026-03-29', LONDON);
    expect(day).toEqual({ startAt: '2026-03-29T00:00:00.000Z', endAt: '2026-03-29T23:00:00.000Z' });
    expect(intlOffset(day.endAt, LONDON)).toBe('GMT+01:00');
    expect(intlClock(day.endAt, LONDON)).toBe('00:00');
  });

  it('gives the autumn-change day in London 25 hours', () => {
    // Same directive: summer time ends at 01:00 UTC on the last Sunday of October (25 October 2026).
    const day = localDaySpan('2026-10-25', LONDON);
    expect(day).toEqual({ startAt: '2026-10-24T23:00:00.000Z', endAt: '2026-10-26T00:00:00.000Z' });
    expect(Date.parse(day.endAt) - Date.parse(day.startAt)).toBe(25 * HOUR_MS);
  });

  it('puts an instant on the local date it falls on, not the UTC date', () => {
    expect(localDate(new Date('2026-07-01T23:30:00Z'), LONDON)).toBe('2026-07-02');
    expect(localDate(new Date('2026-01-01T23:30:00Z'), LONDON)).toBe('2026-01-01');
    // Cross-check with Intl's own date in the zone (en-CA formats as YYYY-MM-DD).
    expect(new Intl.DateTimeFormat('en-CA', { timeZone: LONDON }).format(new Date('2026-07-01T23:30:00Z'))).toBe('2026-07-02');
  });

  it('lists every day of a range across a month end and a leap day, both ends included', () => {
    // 2028 is a leap year (Gregorian rule: divisible by 4, not by 100 unless by 400).
    expect(localDaysBetween('2028-02-27', '2028-03-01')).toEqual(['2028-02-27', '2028-02-28', '2028-02-29', '2028-03-01']);
    expect(localDaysBetween('2026-11-30', '2026-11-30')).toEqual(['2026-11-30']);
  });

  it('knows which dates exist', () => {
    expect(isRealDay('2028-02-29')).toBe(true);
    expect(isRealDay('2026-02-29')).toBe(false);
    expect(isRealDay('2026-13-01')).toBe(false);
    expect(isRealDay('2026-3-1')).toBe(false);
  });
});

describe('ISO 8601 weekdays of calendar days', () => {
  /** The weekday Node's Intl.DateTimeFormat (ICU data) gives for noon of a day in the zone: an independent reference. */
  const intlWeekday = (day: string, timeZone: string) => new Intl.DateTimeFormat('en-GB', { timeZone, weekday: 'long' }).format(new Date(`${day}T12:00:00Z`));

  it('numbers Monday 1 to Sunday 7 as ISO 8601 does', () => {
    // ISO 8601's own example (from memory): calendar date 1985-04-12 is week date 1985-W15-5, a Friday.
    expect(isoWeekdayOf('1985-04-12')).toBe(5);
    expect(intlWeekday('1985-04-12', 'UTC')).toBe('Friday');
    expect(isoWeekdayOf('2026-01-18')).toBe(7);
    expect(intlWeekday('2026-01-18', 'Europe/London')).toBe('Sunday');
  });

  it('agrees with Intl.DateTimeFormat on every day of three years, a leap day and both clock changes included', () => {
    // Noon UTC falls on the same calendar day in London, summer or winter.
    const days = localDaysBetween('2026-01-01', '2028-12-31');
    expect(days).toHaveLength(365 + 365 + 366);
    for (const day of days) expect(WEEKDAY_NAMES[isoWeekdayOf(day)]).toBe(intlWeekday(day, 'Europe/London'));
  });

  it('tells working days from days off, and reads no working days as every day', () => {
    const weekdays = worksOn([1, 2, 3, 4, 5]);
    expect(weekdays('2026-01-16')).toBe(true);
    expect(weekdays('2026-01-17')).toBe(false);
    expect(weekdays('2026-01-18')).toBe(false);
    expect(worksOn([])('2026-01-17')).toBe(true);
  });

  it('refuses a day that does not exist', () => {
    expect(() => isoWeekdayOf('2026-02-29')).toThrow('"2026-02-29" is not a calendar date');
  });
});
