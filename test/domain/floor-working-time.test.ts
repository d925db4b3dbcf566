import { addClockHours, shiftWorkingHours } from '../../src/shared/floor/working-time';
import { nextShift } from '../../src/shared/floor/shift-window';
import { ISO_WEEKDAYS } from '../../src/shared/shop-contract';

const LONDON = 'Europe/London';
const MONDAY_TO_FRIDAY = [1, 2, 3, 4, 5] as const;
const at = (iso: string) => Date.parse(iso);
const iso = (ms: number) => new Date(ms).toISOString();

/** The weekday of an instant in London as Node's ICU data names it (Intl.DateTimeFormat, independent of Dwell's calendar arithmetic). */
const londonWeekday = (iso: string) => new Intl.DateTimeFormat('en-GB', { timeZone: LONDON, weekday: 'long' }).format(new Date(iso));

describe('working hours between shifts', () => {
  // A 07:00-15:30 shift every day (the demo shop's hours, with every day worked); all cases worked by hand.
  const work = shiftWorkingHours(LONDON, '07:00', '15:30', ISO_WEEKDAYS);

  it('adds hours inside a shift as plain clock time', () => {
    // Wednesday 14 January 2026, 10:00 GMT + 2 h = 12:00, still inside the shift.
    expect(iso(work(at('2026-01-14T10:00:00Z'), 2))).toBe('2026-01-14T12:00:00.000Z');
  });

  it('carries what does not fit into the next shift', () => {
    // 14:30 + 3 h of work: 1 h until 15:30 today, the other 2 h from 07:00 tomorrow, so 09:00 on Thursday.
    expect(iso(work(at('2026-01-14T14:30:00Z'), 3))).toBe('2026-01-15T09:00:00.000Z');
  });

  it('starts work left overnight at the next shift start', () => {
    // 05:00 is before the 07:00 start: 1 h of work ends at 08:00 the same day.
    expect(iso(work(at('2026-01-14T05:00:00Z'), 1))).toBe('2026-01-14T08:00:00.000Z');
    // 20:00, after the shift: 1 h ends at 08:00 the next day.
    expect(iso(work(at('2026-01-14T20:00:00Z'), 1))).toBe('2026-01-15T08:00:00.000Z');
  });

  it('spans several shifts of 8.5 hours each', () => {
    // 20 h from 07:00 Monday 12 January: 8.5 h Monday, 8.5 h Tuesday, 3 h on Wednesday, so 10:00 Wednesday.
    expect(iso(work(at('2026-01-12T07:00:00Z'), 20))).toBe('2026-01-14T10:00:00.000Z');
  });

  it('keeps the wall-clock shift start on the morning the clocks go forward', () => {
    // Summer Time Act 1972 as amended (EU directive 2000/84/EC): London moves to UTC+01:00 on Sunday 29 March 2026,
    // so Sunday's 07:00 start is 06:00 UTC. 15:00 GMT Saturday + 1.5 h: 0.5 h on Saturday, 1 h from 06:00Z Sunday.
    expect(iso(work(at('2026-03-28T15:00:00Z'), 1.5))).toBe('2026-03-29T07:00:00.000Z');
  });

  it('follows an overnight shift across midnight', () => {
    // A 22:00-06:00 shift: at 05:00 one hour is left of it, so 2 h of work end at 23:00 that evening.
    const nights = shiftWorkingHours(LONDON, '22:00', '06:00', ISO_WEEKDAYS);
    expect(iso(nights(at('2026-01-15T05:00:00Z'), 2))).toBe('2026-01-15T23:00:00.000Z');
  });

  it('counts every hour when the shop keeps no shifts', () => {
    expect(iso(addClockHours(at('2026-01-14T20:00:00Z'), 1))).toBe('2026-01-14T21:00:00.000Z');
  });
});

describe('working hours on a shop\'s working days only', () => {
  // January 2026 in London is GMT (UTC+00:00), so wall clock and UTC agree. Every case worked by hand.
  const weekdays = shiftWorkingHours(LONDON, '07:00', '15:30', MONDAY_TO_FRIDAY);

  it('uses weekdays checked against Intl.DateTimeFormat in the shop\'s zone', () => {
    // Independent source for every weekday named in this file: Node's Intl.DateTimeFormat, weekday 'long', Europe/London.
    expect(londonWeekday('2026-01-15T12:00:00Z')).toBe('Thursday');
    expect(londonWeekday('2026-01-16T12:00:00Z')).toBe('Friday');
    expect(londonWeekday('2026-01-17T12:00:00Z')).toBe('Saturday');
    expect(londonWeekday('2026-01-19T12:00:00Z')).toBe('Monday');
    expect(londonWeekday('2026-01-20T12:00:00Z')).toBe('Tuesday');
    expect(londonWeekday('2026-03-27T12:00:00Z')).toBe('Friday');
    expect(londonWeekday('2026-03-30T12:00:00Z')).toBe('Monday');
  });

  it('carries work left at Friday\'s end over the weekend to Monday\'s start (hand-worked)', () => {
    // Friday 16 January 14:30 + 3 h: 1 h to 15:30 Friday, 2 h from 07:00 Monday 19 January -> Monday 09:00.
    expect(iso(weekdays(at('2026-01-16T14:30:00Z'), 3))).toBe('2026-01-19T09:00:00.000Z');
    // Friday 15:00 + 3 h: 0.5 h on Friday, 2.5 h from 07:00 Monday -> Monday 09:30.
    expect(iso(weekdays(at('2026-01-16T15:00:00Z'), 3))).toBe('2026-01-19T09:30:00.000Z');
  });

  it('starts work asked for on a Saturday morning at Monday\'s shift (hand-worked)', () => {
    // Saturday 17 January 09:00 + 1 h: no shift Saturday or Sunday, so 07:00 to 08:00 on Monday 19 January.
    expect(iso(weekdays(at('2026-01-17T09:00:00Z'), 1))).toBe('2026-01-19T08:00:00.000Z');
  });

  it('still counts a weekday the same way as a shop that works every day (hand-worked)', () => {
    // Wednesday 14 January 14:30 + 3 h -> Thursday 09:00, as in the every-day case above.
    expect(iso(weekdays(at('2026-01-14T14:30:00Z'), 3))).toBe('2026-01-15T09:00:00.000Z');
  });

  it('plans a four-day week of ten-hour shifts, Monday to Thursday (hand-worked)', () => {
    const fourDays = shiftWorkingHours(LONDON, '07:00', '17:00', [1, 2, 3, 4]);
    // Thursday 15 January 16:00 + 12 h: 1 h to 17:00 Thursday, Friday to Sunday off, 10 h Monday 19 January
    // (07:00-17:00), the last 1 h from 07:00 Tuesday 20 January -> Tuesday 08:00.
    expect(iso(fourDays(at('2026-01-15T16:00:00Z'), 12))).toBe('2026-01-20T08:00:00.000Z');
    // Friday 16 January 10:00 is a day off: 2 h of work run 07:00-09:00 on Monday.
    expect(iso(fourDays(at('2026-01-16T10:00:00Z'), 2))).toBe('2026-01-19T09:00:00.000Z');
  });

  it('keeps Monday\'s wall-clock start after the spring clock change over the weekend', () => {
    // Summer Time Act 1972 as amended (EU directive 2000/84/EC): London moves to UTC+01:00 on Sunday 29 March 2026,
    // so Monday 30 March's 07:00 start is 06:00 UTC. Friday 27 March 15:00 GMT + 1.5 h: 0.5 h on Friday, 1 h from 06:00Z Monday.
    expect(iso(weekdays(at('2026-03-27T15:00:00Z'), 1.5))).toBe('2026-03-30T07:00:00.000Z');
  });

  it('counts an overnight shift that starts on Friday night into Saturday morning, then waits for Monday night', () => {
    // A 22:00-06:00 shift, Monday to Friday nights: a shift belongs to the day it starts.
    const nights = shiftWorkingHours(LONDON, '22:00', '06:00', MONDAY_TO_FRIDAY);
    // Friday 16 January 23:00 + 5 h: Friday night's shift runs to 06:00 Saturday, so the work ends 04:00 Saturday.
    expect(iso(nights(at('2026-01-16T23:00:00Z'), 5))).toBe('2026-01-17T04:00:00.000Z');
    // Saturday 05:00 + 3 h: 1 h left of Friday night's shift, no Saturday or Sunday night shift, 2 h from 22:00 Monday -> 00:00 Tuesday.
    expect(iso(nights(at('2026-01-17T05:00:00Z'), 3))).toBe('2026-01-20T00:00:00.000Z');
  });

  it('reads no working days at all as every day', () => {
    const none = shiftWorkingHours(LONDON, '07:00', '15:30', []);
    // Saturday 17 January 09:00 + 1 h -> 10:00 the same Saturday.
    expect(iso(none(at('2026-01-17T09:00:00Z'), 1))).toBe('2026-01-17T10:00:00.000Z');
  });
});

describe('working hours around the shop\'s closed days', () => {
  // England and Wales bank holidays at Christmas 2026: Friday 25 December, and Monday 28 December as the substitute
  // for Boxing Day on a Saturday (from memory; the weekdays are checked against Intl below).
  const CHRISTMAS = ['2026-12-25', '2026-12-28'];
  const work = shiftWorkingHours(LONDON, '07:00', '15:30', MONDAY_TO_FRIDAY, CHRISTMAS);

  it('uses weekdays checked against Intl.DateTimeFormat in the shop\'s zone', () => {
    expect(londonWeekday('2026-12-24T12:00:00Z')).toBe('Thursday');
    expect(londonWeekday('2026-12-25T12:00:00Z')).toBe('Friday');
    expect(londonWeekday('2026-12-28T12:00:00Z')).toBe('Monday');
  });

  it('carries work left on Christmas Eve past the holiday weekend to Tuesday (hand-worked)', () => {
    // Thursday 24 December 14:30 GMT + 3 h: 1 h to 15:30, then Friday (closed), the weekend and Monday (closed) are
    // skipped; the other 2 h run from Tuesday 29 December 07:00 to 09:00.
    expect(iso(work(at('2026-12-24T14:30:00Z'), 3))).toBe('2026-12-29T09:00:00.000Z');
    // Without the closed days the same work ends on Friday the 25th at 09:00.
    expect(iso(shiftWorkingHours(LONDON, '07:00', '15:30', MONDAY_TO_FRIDAY)(at('2026-12-24T14:30:00Z'), 3))).toBe('2026-12-25T09:00:00.000Z');
  });

  it('plans the next shift after Christmas Eve for Tuesday', () => {
    expect(nextShift(new Date('2026-12-24T16:00:00Z'), LONDON, '07:00', '15:30', MONDAY_TO_FRIDAY, CHRISTMAS).startAt).toBe('2026-12-29T07:00:00.000Z');
  });
});

describe('the next shift to plan for', () => {
  it('is today\'s shift before it starts and tomorrow\'s once it has', () => {
    expect(nextShift(new Date('2026-01-14T05:00:00Z'), LONDON, '07:00', '15:30', ISO_WEEKDAYS)).toMatchObject({ startAt: '2026-01-14T07:00:00.000Z', endAt: '2026-01-14T15:30:00.000Z' });
    expect(nextShift(new Date('2026-01-14T16:00:00Z'), LONDON, '07:00', '15:30', ISO_WEEKDAYS)).toMatchObject({ startAt: '2026-01-15T07:00:00.000Z', endAt: '2026-01-15T15:30:00.000Z' });
  });

  it('is Monday\'s shift once Friday\'s has ended in a Monday-to-Friday shop', () => {
    // Friday 16 January 16:00 and Sunday 18 January 12:00 both look ahead to Monday 19 January 07:00-15:30 (weekdays checked by Intl above).
    const fromFriday = nextShift(new Date('2026-01-16T16:00:00Z'), LONDON, '07:00', '15:30', MONDAY_TO_FRIDAY);
    expect(fromFriday).toEqual({ startAt: '2026-01-19T07:00:00.000Z', endAt: '2026-01-19T15:30:00.000Z', now: '2026-01-16T16:00:00.000Z' });
    expect(londonWeekday(fromFriday.startAt)).toBe('Monday');
    expect(nextShift(new Date('2026-01-18T12:00:00Z'), LONDON, '07:00', '15:30', MONDAY_TO_FRIDAY).startAt).toBe('2026-01-19T07:00:00.000Z');
  });

  it('is a week later when the shop works one day a week and that day\'s shift has begun', () => {
    // Monday-only shop at 08:00 on Monday 19 January: next is Monday 26 January 07:00.
    expect(nextShift(new Date('2026-01-19T08:00:00Z'), LONDON, '07:00', '15:30', [1]).startAt).toBe('2026-01-26T07:00:00.000Z');
  });
});
