import type { FloorBag, FloorEvent } from '../../src/shared/floor/floor-types';
import { floorYieldFromEvents, spoilPareto } from '../../src/shared/floor/spoil-pareto';
import { taktForToday, taktSeconds } from '../../src/shared/floor/takt';

const noSpoils = { cut: 0, weed: 0, press: 0, pack: 0 };
function bag(id: number, orderId: number, pieces: number, packed: number): FloorBag {
  return { id, orderId, stage: 'queued', pieces, counts: { cut: 0, weeded: 0, pressed: 0, packed, spoiledAt: noSpoils }, queuedAt: '2026-03-02T06:00:00Z' };
}

describe('takt time', () => {
  it('gives 60 seconds per piece for 27,600 available seconds and 460 pieces demanded', () => {
    // Rother & Shook, "Learning to See" (1999), takt time example: 27,600 s / 460 pieces = 60 s (from memory).
    expect(taktSeconds(27_600, 460)).toBe(60);
  });

  it('spreads what is left of the shift over the unpacked pieces due by its end, overdue ones included', () => {
    // Worked by hand: shift 06:00-14:30, now 10:00 -> 4.5 h = 16,200 s.
    // Due today: A 40 pieces with 10 packed -> 30; B due at 14:30 exactly, 60 -> 60; D overdue, 10 -> 10; C due tomorrow is left out.
    // 100 pieces; takt = 16,200 / 100 = 162 s per piece.
    const shift = { startAt: '2026-03-02T06:00:00Z', endAt: '2026-03-02T14:30:00Z', now: '2026-03-02T10:00:00Z' };
    const orders = [
      { id: 1, code: 'A', dueAt: '2026-03-02T12:00:00Z' },
      { id: 2, code: 'B', dueAt: '2026-03-02T14:30:00Z' },
      { id: 3, code: 'C', dueAt: '2026-03-03T12:00:00Z' },
      { id: 4, code: 'D', dueAt: '2026-03-01T12:00:00Z' },
    ];
    const takt = taktForToday(shift, orders, [bag(1, 1, 40, 10), bag(2, 2, 60, 0), bag(3, 3, 100, 0), bag(4, 4, 10, 0)]);
    expect(takt).toEqual({ availableSeconds: 16_200, piecesDue: 100, secondsPerPiece: 162 });
  });

  it('has no takt when nothing is due and no time left after the shift ends', () => {
    const late = { startAt: '2026-03-02T06:00:00Z', endAt: '2026-03-02T14:30:00Z', now: '2026-03-02T15:00:00Z' };
    expect(taktForToday(late, [], []).secondsPerPiece).toBeNull();
    expect(taktForToday(late, [{ id: 1, code: 'A', dueAt: '2026-03-02T12:00:00Z' }], [bag(1, 1, 5, 0)]).availableSeconds).toBe(0);
  });
});

describe('spoils: Pareto ranking and first-pass yield', () => {
  it('ranks reasons by pieces with each share and the running share', () => {
    // Worked by hand: misweed 3 + 5 = 8, scorched 5, off-centre 4, peeled too hot 2, wrong size cut 1; total 20.
    // shares 8/20 = .40, .25, .20, .10, .05; cumulative .40, .65, .85, .95, 1.00.
    // The ranked bars with a cumulative line are the Pareto chart of quality practice (J. M. Juran, Quality Control Handbook; from memory).
    const rows = spoilPareto([
      { reason: 'peeled too hot', quantity: 2 },
      { reason: 'misweed', quantity: 3 },
      { reason: 'scorched', quantity: 5 },
      { reason: 'misweed', quantity: 5 },
      { reason: 'off-centre', quantity: 4 },
      { reason: 'wrong size cut', quantity: 1 },
    ]);
    expect(rows.map((r) => [r.reason, r.quantity])).toEqual([['misweed', 8], ['scorched', 5], ['off-centre', 4], ['peeled too hot', 2], ['wrong size cut', 1]]);
    [0.4, 0.25, 0.2, 0.1, 0.05].forEach((share, i) => expect(rows[i].share).toBeCloseTo(share, 10));
    [0.4, 0.65, 0.85, 0.95, 1].forEach((cumulative, i) => expect(rows[i].cumulativeShare).toBeCloseTo(cumulative, 10));
  });

  it('orders reasons with equal pieces by their label', () => {
    expect(spoilPareto([{ reason: 'scorched', quantity: 3 }, { reason: 'lifted edge', quantity: 3 }]).map((r) => r.reason)).toEqual(['lifted edge', 'scorched']);
  });

  it('computes first-pass yield as pieces not spoiled over pieces attempted, counting a remake as a new attempt', () => {
    // Worked by hand: 96 cut good + 4 spoiled at cut = 100 attempted; spoiled 4 + 3 at the press = 7;
    // FPY = (100 - 7) / 100 = 0.93; spoil rate 0.07. The event before the window is left out.
    // FPY = good first time / attempted, spoil rate = its complement: common practice, no published source.
    const at = (hh: string) => `2026-03-02T${hh}:00:00Z`;
    const e = (kind: FloorEvent['kind'], stationKind: FloorEvent['stationKind'], quantity: number, time: string): FloorEvent => ({ bagId: 1, stationId: 1, stationKind, kind, quantity, at: at(time) });
    const events = [e('cut_done', 'cut', 96, '07'), e('spoil', 'cut', 4, '07'), e('spoil', 'press', 3, '09'), e('weed_done', 'weed', 90, '08'), e('cut_done', 'cut', 50, '05')];
    const y = floorYieldFromEvents(events, { fromMs: Date.parse(at('06')), toMs: Date.parse(at('10')) });
    expect(y.attempted).toBe(100);
    expect(y.spoiled).toBe(7);
    expect(y.firstPassYield).toBeCloseTo(0.93, 10);
    expect(y.spoilRate).toBeCloseTo(0.07, 10);
  });
});
