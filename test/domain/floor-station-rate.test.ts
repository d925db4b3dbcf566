import type { FloorEvent } from '../../src/shared/floor/floor-types';
import { stationRates } from '../../src/shared/floor/station-rate';
import { workInProgress } from '../../src/shared/floor/work-in-progress';

const cutter = [{ id: 1, kind: 'cut' as const, name: 'Cut 1' }];
const e = (kind: FloorEvent['kind'], quantity: number, at: string, stationId = 1): FloorEvent => ({ bagId: 1, stationId, stationKind: 'cut', kind, quantity, at: `2026-03-02T${at}:00Z` });

describe('pieces per hour per station', () => {
  it('counts only good pieces, over the rolling hour and over the shift so far', () => {
    // Worked by hand: shift from 06:00, now 09:00. Rolling hour (08:00, 09:00]: 45 + 15 = 60 -> 60/h.
    // Shift: 30 + 45 + 15 = 90 over 3 h = 30/h. The spoil, the scan and the other station's pieces are not counted.
    const events = [e('cut_done', 30, '07:00'), e('cut_done', 45, '08:30'), e('cut_done', 15, '09:00'), e('spoil', 5, '08:45'), e('scan', 0, '08:50'), e('cut_done', 99, '08:40', 2)];
    const [rate] = stationRates(cutter, events, { startAt: '2026-03-02T06:00:00Z', endAt: '2026-03-02T14:30:00Z', now: '2026-03-02T09:00:00Z' });
    expect(rate).toMatchObject({ rollingHourPieces: 60, rollingHourPiecesPerHour: 60, shiftPieces: 90, shiftPiecesPerHour: 30 });
  });

  it('shortens the rolling hour to the time since the shift start early in the shift', () => {
    // Worked by hand: now 06:30, 20 pieces since 06:00 -> 20 / 0.5 h = 40/h.
    const [rate] = stationRates(cutter, [e('cut_done', 20, '06:20'), e('cut_done', 7, '05:50')], { startAt: '2026-03-02T06:00:00Z', endAt: '2026-03-02T14:30:00Z', now: '2026-03-02T06:30:00Z' });
    expect(rate.rollingHourPiecesPerHour).toBe(40);
  });

  it('counts work begun before the shift start from the hour it began in', () => {
    // Worked by hand: shift 06:00-14:30, opened at 21:45 the night before; 12 pieces at 05:15 and 6 at 05:40,
    // looked at at 05:45. The working time runs from 05:00 (the shift clock's hour of the first piece): 18 in 0.75 h = 24/h.
    // A piece at 21:30 the night before belongs to the shift before and is not counted.
    const shift = { startAt: '2026-03-02T06:00:00Z', endAt: '2026-03-02T14:30:00Z', now: '2026-03-02T05:45:00Z', openedAt: '2026-03-01T21:45:00Z' };
    const early = [e('cut_done', 12, '05:15'), e('cut_done', 6, '05:40'), { ...e('cut_done', 9, '05:00'), at: '2026-03-01T21:30:00Z' }];
    const [rate] = stationRates(cutter, early, shift);
    expect(rate).toMatchObject({ shiftPieces: 18, shiftPiecesPerHour: 24, rollingHourPieces: 18, rollingHourPiecesPerHour: 24 });
  });

  it('does not thin the shift rate with the hours after the shift ended, but counts overtime', () => {
    // Worked by hand: shift 06:00-14:30 (8.5 h), 85 pieces in it, looked at at 20:00: 85 / 8.5 h = 10/h, not 85 / 14 h.
    const shift = { startAt: '2026-03-02T06:00:00Z', endAt: '2026-03-02T14:30:00Z', now: '2026-03-02T20:00:00Z' };
    const inShift = [e('cut_done', 40, '09:00'), e('cut_done', 45, '14:00')];
    expect(stationRates(cutter, inShift, shift)[0]).toMatchObject({ shiftPieces: 85, shiftPiecesPerHour: 10, rollingHourPieces: 0 });
    // 15 more in overtime up to 16:30: 100 pieces over 10.5 h.
    const [overtime] = stationRates(cutter, [...inShift, e('cut_done', 15, '16:30')], shift);
    expect(overtime.shiftPieces).toBe(100);
    expect(overtime.shiftPiecesPerHour).toBeCloseTo(100 / 10.5, 10);
  });
});

describe('work in progress', () => {
  it('counts each bag with all its pieces in its current stage and leaves packed bags off the floor total', () => {
    const wip = workInProgress([{ stage: 'queued', pieces: 12 }, { stage: 'weeded', pieces: 5 }, { stage: 'weeded', pieces: 7 }, { stage: 'packed', pieces: 30 }]);
    expect(wip.byStage.weeded).toEqual({ bags: 2, pieces: 12 });
    expect(wip.byStage.cut).toEqual({ bags: 0, pieces: 0 });
    expect(wip.inSystem).toEqual({ bags: 3, pieces: 24 });
  });
});
