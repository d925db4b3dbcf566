import { quickRange } from './report-range';

// Week starts: ISO 8601 (weeks begin on Monday). Weekdays of the dates below checked against
// Python's datetime.date.isocalendar(), which follows ISO 8601.
describe('quickRange', () => {
  const thursday = new Date(2026, 2, 5, 14, 30); // 2026-03-05 is a Thursday, ISO week 10.

  it('gives the last 7 days as today and the six days before it', () => {
    expect(quickRange('last7', thursday)).toEqual({ from: '2026-02-27', to: '2026-03-05' });
  });

  it('starts this week on Monday', () => {
    expect(quickRange('thisWeek', thursday)).toEqual({ from: '2026-03-02', to: '2026-03-05' });
  });

  it('puts a Sunday in the week that began the Monday before', () => {
    // 2026-03-01 is a Sunday: ISO weekday 7 of week 9, which began on 2026-02-23.
    expect(quickRange('thisWeek', new Date(2026, 2, 1, 9, 0))).toEqual({ from: '2026-02-23', to: '2026-03-01' });
  });

  it('starts this month on its first day, also across a year end for the last 7 days', () => {
    expect(quickRange('thisMonth', thursday)).toEqual({ from: '2026-03-01', to: '2026-03-05' });
    expect(quickRange('last7', new Date(2030, 0, 1))).toEqual({ from: '2029-12-26', to: '2030-01-01' });
  });
});
