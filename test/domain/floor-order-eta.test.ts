import type { FloorBag } from '../../src/shared/floor/floor-types';
import { orderEtas } from '../../src/shared/floor/order-eta';
import { shiftWorkingHours } from '../../src/shared/floor/working-time';

const NOW = Date.parse('2026-03-02T10:00:00Z');
const spoiledNone = { cut: 0, weed: 0, press: 0, pack: 0 };
function bag(id: number, orderId: number, pieces: number, c: [number, number, number, number], spoiledAt = spoiledNone): FloorBag {
  return { id, orderId, stage: 'queued', pieces, counts: { cut: c[0], weeded: c[1], pressed: c[2], packed: c[3], spoiledAt }, queuedAt: '2026-03-02T06:00:00Z' };
}
// Observed shift rates: cut 120/h, weed 40/h, press 60/h, nothing packed yet; the shop's standard is 50/h at every stage.
const observed = { cut: 120, weed: 40, press: 60, pack: null };
const STANDARD = { cut: 50, weed: 50, press: 50, pack: 50 };

describe('order ETA from the bottleneck stage', () => {
  it('finishes a part-done order at the slowest stage it still needs and flags it when that is after due', () => {
    // Worked by hand: 60 pieces, 60 cut, 20 weeded, 10 pressed, 0 packed.
    // weed 40/40 = 1.0 h; press 50/60 = 0.833 h; pack 60/50 (standard) = 1.2 h -> bottleneck pack;
    // ETA = 10:00 + 1.2 h = 11:12, after the 11:00 due -> at risk.
    const [eta] = orderEtas([{ id: 1, code: 'A', dueAt: '2026-03-02T11:00:00Z' }], [bag(1, 1, 60, [60, 20, 10, 0])], observed, STANDARD, NOW);
    expect(eta.remaining).toEqual({ cut: 0, weed: 40, press: 50, pack: 60 });
    expect(eta.bottleneck).toBe('pack');
    expect(eta.rateSource).toBe('standard');
    expect(eta.eta).toBe('2026-03-02T11:12:00.000Z');
    expect(eta.atRisk).toBe(true);
  });

  it('counts the ETA in working hours: work that does not fit today waits for tomorrow\'s shift', () => {
    // Worked by hand: shift 07:00-15:30 Monday to Friday in London (GMT on Monday 2 March 2026); now 14:30; 100 pieces to pack at the
    // standard 50/h = 2 h: 1 h today to 15:30, 1 h from 07:00 tomorrow -> 08:00 on 3 March. Due 18:00 today:
    // by clock hours it would be on time (16:30), in working hours it is at risk.
    const order = [{ id: 3, code: 'C', dueAt: '2026-03-02T18:00:00Z' }];
    const bags = [bag(3, 3, 100, [100, 100, 100, 0])];
    const now = Date.parse('2026-03-02T14:30:00Z');
    expect(orderEtas(order, bags, observed, STANDARD, now)[0]).toMatchObject({ eta: '2026-03-02T16:30:00.000Z', atRisk: false });
    const [eta] = orderEtas(order, bags, observed, STANDARD, now, shiftWorkingHours('Europe/London', '07:00', '15:30', [1, 2, 3, 4, 5]));
    expect(eta).toMatchObject({ eta: '2026-03-03T08:00:00.000Z', atRisk: true });
  });

  it('uses the observed rate at the bottleneck once there is one', () => {
    // Worked by hand: 24 pieces left to pack. Standard 50/h: 24/50 = 0.48 h = 28.8 min -> 10:28:48.
    // Observed 100/h: 24/100 = 0.24 h = 14.4 min -> 10:14:24. Due 12:00 -> not at risk either way.
    const order = [{ id: 2, code: 'B', dueAt: '2026-03-02T12:00:00Z' }];
    const bags = [bag(2, 2, 30, [30, 30, 30, 6])];
    expect(orderEtas(order, bags, observed, STANDARD, NOW)[0].eta).toBe('2026-03-02T10:28:48.000Z');
    const [seen] = orderEtas(order, bags, { ...observed, pack: 100 }, STANDARD, NOW);
    expect(seen.eta).toBe('2026-03-02T10:14:24.000Z');
    expect(seen.rateSource).toBe('observed');
    expect(seen.atRisk).toBe(false);
  });

  it('counts a remake of a spoiled piece as work again at the earlier stages and is not at risk when ETA equals due', () => {
    // Worked by hand: 20 pieces, 20 cut, 20 weeded, 18 pressed, 2 spoiled at the press.
    // cut and weed owe 20 + 2 = 22 -> 2 each; press owes 20 -> 2; pack 20.
    // hours: cut 2/120, weed 2/40 = 0.05, press 2/60, pack 20/50 = 0.4 -> pack; ETA 10:24 = due -> not at risk (ETA > due is late).
    const bags = [bag(3, 3, 20, [20, 20, 18, 0], { cut: 0, weed: 0, press: 2, pack: 0 })];
    const [eta] = orderEtas([{ id: 3, code: 'D', dueAt: '2026-03-02T10:24:00Z' }], bags, observed, STANDARD, NOW);
    expect(eta.remaining).toEqual({ cut: 2, weed: 2, press: 2, pack: 20 });
    expect(eta.eta).toBe('2026-03-02T10:24:00.000Z');
    expect(eta.atRisk).toBe(false);
  });

  it('sums the bags of one order and picks an earlier stage when it holds the most hours', () => {
    // Worked by hand: two bags of 40, nothing done: cut 80/120 = 0.667 h, weed 80/40 = 2 h, press 80/60 = 1.333 h,
    // pack 80/50 = 1.6 h -> bottleneck weed; ETA = 12:00, due 11:59 -> at risk.
    const bags = [bag(4, 4, 40, [0, 0, 0, 0]), bag(5, 4, 40, [0, 0, 0, 0]), bag(6, 99, 500, [0, 0, 0, 0])];
    const [eta] = orderEtas([{ id: 4, code: 'E', dueAt: '2026-03-02T11:59:00Z' }], bags, observed, STANDARD, NOW);
    expect(eta.bottleneck).toBe('weed');
    expect(eta.eta).toBe('2026-03-02T12:00:00.000Z');
    expect(eta.atRisk).toBe(true);
  });

  it('plans each stage at its own standard rate before the floor has shown any', () => {
    // Worked by hand: a shop planning cut 120/h, weed 30/h, press 45/h and pack 90/h; 36 pieces, nothing done, nothing observed.
    // cut 36/120 = 0.3 h, weed 36/30 = 1.2 h, press 36/45 = 0.8 h, pack 36/90 = 0.4 h -> weed; ETA 10:00 + 1.2 h = 11:12.
    const none = { cut: null, weed: null, press: null, pack: null };
    const [eta] = orderEtas([{ id: 6, code: 'F', dueAt: '2026-03-02T12:00:00Z' }], [bag(8, 6, 36, [0, 0, 0, 0])], none, { cut: 120, weed: 30, press: 45, pack: 90 }, NOW);
    expect(eta).toMatchObject({ bottleneck: 'weed', bottleneckRate: 30, rateSource: 'standard', eta: '2026-03-02T11:12:00.000Z', atRisk: false });
  });

  it('gives a packed order no ETA and never calls it at risk', () => {
    const [eta] = orderEtas([{ id: 5, code: 'C', dueAt: '2026-03-01T10:00:00Z' }], [bag(7, 5, 12, [12, 12, 12, 12])], observed, STANDARD, NOW);
    expect(eta.bottleneck).toBeNull();
    expect(eta.eta).toBeNull();
    expect(eta.atRisk).toBe(false);
  });
});
