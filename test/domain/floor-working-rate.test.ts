import type { FloorEvent } from '../../src/shared/floor/floor-types';
import { stationWorkingOutput, workingRatesByWork } from '../../src/shared/floor/working-rate';

// The rate an ETA relies on is a stage's good pieces per hour of working time: gaps between one station's
// events count as work when short (up to 20 minutes) or when both events are about the same bag (up to 2 hours).
// These thresholds are Dwell's own rule; every case below is worked by hand.
const day = (hhmm: string) => `2026-03-02T${hhmm}:00.000Z`;
const window = { fromMs: Date.parse(day('07:00')), toMs: Date.parse(day('15:30')) };
const event = (stationId: number, stationKind: FloorEvent['stationKind'], kind: FloorEvent['kind'], bagId: number, quantity: number, hhmm: string): FloorEvent =>
  ({ bagId, stationId, stationKind, kind, quantity, at: day(hhmm) });
const pack = (kind: FloorEvent['kind'], bagId: number, quantity: number, hhmm: string) => event(6, 'pack', kind, bagId, quantity, hhmm);
const weed = (stationId: number, kind: FloorEvent['kind'], bagId: number, quantity: number, hhmm: string) => event(stationId, 'weed', kind, bagId, quantity, hhmm);

describe('a stage\'s rate over its working time', () => {
  it('leaves out the time a bench stood waiting for bags', () => {
    // Worked by hand: the packer opens bag 1 at 08:00 and packs its 6 pieces at 08:03, then waits 87 minutes for the
    // next bag. Bag 2 opened at 09:30, 6 packed at 09:33; bag 3 opened at 09:36, 8 packed at 09:40.
    // Working time: 3 + 3 + 3 + 4 = 13 minutes (the 87-minute wait is idle); pieces counted: 6 + 6 + 8 = 20.
    // 20 pieces / (13/60) h = 92.31 per hour, where the shift so far (20 pieces in 2 h 40 min) would say 7.5.
    const events = [pack('scan', 1, 0, '08:00'), pack('pack_done', 1, 6, '08:03'), pack('scan', 2, 0, '09:30'), pack('pack_done', 2, 6, '09:33'), pack('scan', 3, 0, '09:36'), pack('pack_done', 3, 8, '09:40')];
    expect(stationWorkingOutput(events, window)).toEqual([{ stationId: 6, kind: 'pack', pieces: 20, workingHours: 13 / 60 }]);
    expect(workingRatesByWork(events, window).pack).toBeCloseTo(92.31, 2);
  });

  it('counts a long spell on one bag as work, up to two hours', () => {
    // Worked by hand: a big weed opened at 10:00 and its 20 pieces weeded at 10:50: 50 minutes on one bag, so
    // 20 / (50/60) h = 24 per hour. A bag opened at 11:50 and finished at 14:10 (2 h 20 min, over the lunch break)
    // is left out: neither its 12 pieces nor its time count.
    const events = [weed(2, 'scan', 5, 0, '10:00'), weed(2, 'weed_done', 5, 20, '10:50'), weed(2, 'scan', 7, 0, '11:50'), weed(2, 'weed_done', 7, 12, '14:10')];
    expect(stationWorkingOutput(events, window)).toEqual([{ stationId: 2, kind: 'weed', pieces: 20, workingHours: 50 / 60 }]);
    expect(workingRatesByWork(events, window).weed).toBeCloseTo(24, 10);
  });

  it('adds up the benches of one kind working side by side', () => {
    // Worked by hand: Weed 1 weeds 12 pieces in 30 minutes (24 per hour) and Weed 2 6 pieces in 20 minutes (18 per hour).
    // Together the stage weeds 24 + 18 = 42 per hour, on 18 pieces.
    const events = [weed(2, 'scan', 1, 0, '08:00'), weed(2, 'weed_done', 1, 12, '08:30'), weed(3, 'scan', 2, 0, '08:10'), weed(3, 'weed_done', 2, 6, '08:30')];
    expect(workingRatesByWork(events, window).weed).toBeCloseTo(42, 10);
  });

  it('has no rate for a stage until a dozen pieces were finished in working time', () => {
    // Worked by hand: 11 pieces after a scan is one short of twelve; the 30 pieces finished after the 08:00 start with
    // no event before them have no known working time and do not count towards the dozen.
    const events = [pack('pack_done', 9, 30, '08:00'), pack('scan', 1, 0, '08:30'), pack('pack_done', 1, 11, '08:35')];
    expect(workingRatesByWork(events, window)).toEqual({ cut: null, weed: null, press: null, pack: null });
    const twelve = [...events.slice(0, 2), pack('pack_done', 1, 12, '08:35')];
    expect(workingRatesByWork(twelve, window).pack).toBeCloseTo(144, 10); // 12 pieces in 5 minutes
  });

  it('measures the gaps on the tablet\'s clock, so work done offline and sent in one batch keeps its pace', () => {
    // Worked by hand: a press tablet offline from 09:00 records 6 pieces at 09:06, 09:12 and 09:18 on its own clock;
    // all reach the hub at 09:40 with its 09:00 scan. On the tablet's clock: 18 minutes of work and 18 pieces: 60 per hour.
    const offline = (hhmm: string) => ({ ...event(4, 'press', 'press_done', 3, 6, '09:40'), recordedAt: day(hhmm) });
    const events = [{ ...event(4, 'press', 'scan', 3, 0, '09:40'), recordedAt: day('09:00') }, offline('09:06'), offline('09:12'), offline('09:18')];
    expect(stationWorkingOutput(events, window)).toEqual([{ stationId: 4, kind: 'press', pieces: 18, workingHours: 18 / 60 }]);
    expect(workingRatesByWork(events, window).press).toBeCloseTo(60, 10); // 18 pieces in 0.3 h
  });

  it('reads only the events inside the window', () => {
    const events = [pack('scan', 1, 0, '06:50'), pack('pack_done', 1, 20, '06:55'), pack('scan', 2, 0, '15:35'), pack('pack_done', 2, 20, '15:40')];
    expect(stationWorkingOutput(events, window)).toEqual([]);
  });
});
