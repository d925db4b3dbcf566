import { addClockHours, shiftWorkingHours } from '../../src/shared/floor/working-time';
import { nextShift } from '../../src/shared/floor/shift-window';

const LONDON = 'Europe/London';
const at = (iso: string) => Date.parse(iso);
const iso = (ms: number) => new Date(ms).toISOString();

describe('working hours between shifts', () => {
  // A 07:00-15:30 shift every day (the demo shop's hours); all cases worked by hand.
  const work = shiftWorkingHours(LONDON, '07:00', '15:30');

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
    const nights = shiftWorkingHours(LONDON, '22:00', '06:00');
    expect(iso(nights(at('2026-01-15T05:00:00Z'), 2))).toBe('2026-01-15T23:00:00.000Z');
  });

  it('counts every hour when the shop keeps no shifts', () => {
    expect(iso(addClockHours(at('2026-01-14T20:00:00Z'), 1))).toBe('2026-01-14T21:00:00.000Z');
  });
});

describe('the next shift to plan for', () => {
  it('is today\'s shift before it starts and tomorrow\'s once it has', () => {
    expect(nextShift(new Date('2026-01-14T05:00:00Z'), LONDON, '07:00', '15:30')).toMatchObject({ startAt: '2026-01-14T07:00:00.000Z', endAt: '2026-01-14T15:30:00.000Z' });
    expect(nextShift(new Date('2026-01-14T16:00:00Z'), LONDON, '07:00', '15:30')).toMatchObject({ startAt: '2026-01-15T07:00:00.000Z', endAt: '2026-01-15T15:30:00.000Z' });
  });
});
