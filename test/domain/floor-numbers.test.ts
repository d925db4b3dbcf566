import { floorNumbers, type FloorInput } from '../../src/shared/floor/floor-numbers';
import { emptyCounts } from '../../src/shared/floor/bag-counts';

// A small morning worked by hand: shift 07:00-15:00, now 09:00.
// Press 1 pressed 20 pieces of bag 1 at 08:30 and 10 more at 08:50: 30 in the shift (2 h) = 15 per hour;
// 30 in the rolling hour 08:00-09:00 = 30 per hour.
// Bag 1 (order A, 40 pieces) is cut and weeded 40, pressed 30, so it sits in "weeded" with 10 left to press
// and 40 to pack. Bag 2 (order B, 12 pieces) is still queued.
// Order A is due at 09:30. Press worked 20 minutes (08:30 to 08:50) for the 10 pieces after its first event, fewer
// than the dozen an observed rate needs, and nothing is packed yet, so both use the standard 20 per hour:
// press needs 10/20 = 0.5 h, pack 40/20 = 2 h, so pack is the bottleneck and the ETA is 09:00 + 2 h = 11:00,
// after 09:30: at risk (common practice, no published source, for using the slowest remaining stage as the finish estimate).
const at = (hhmm: string) => `2026-12-02T${hhmm}:00.000Z`;
const bag1 = { ...emptyCounts(), cut: 40, weeded: 40, pressed: 30 };
const input: FloorInput = {
  stations: [{ id: 4, kind: 'press', name: 'Press 1' }],
  events: [
    { bagId: 1, stationId: 4, stationKind: 'press', kind: 'press_done', quantity: 20, at: at('08:30') },
    { bagId: 1, stationId: 4, stationKind: 'press', kind: 'press_done', quantity: 10, at: at('08:50') },
  ],
  bags: [
    { id: 1, orderId: 10, stage: 'weeded', pieces: 40, counts: bag1, queuedAt: at('06:30') },
    { id: 2, orderId: 11, stage: 'queued', pieces: 12, counts: emptyCounts(), queuedAt: at('08:00') },
  ],
  orders: [
    { id: 10, code: 'A', dueAt: at('09:30') },
    { id: 11, code: 'B', dueAt: '2026-12-09T15:00:00.000Z' },
  ],
  spoils: [{ reason: 'Scorch or shine mark', quantity: 2 }],
  shift: { startAt: at('07:00'), endAt: at('15:00'), now: at('09:00') },
  standardRates: { cut: 20, weed: 20, press: 20, pack: 20 },
};

describe('the floor board\'s numbers, put together', () => {
  const numbers = floorNumbers(input);

  it('gives each station its rolling-hour and shift rates', () => {
    expect(numbers.stations).toEqual([
      expect.objectContaining({ stationId: 4, rollingHourPieces: 30, rollingHourPiecesPerHour: 30, shiftPieces: 30, shiftPiecesPerHour: 15 }),
    ]);
  });

  it('counts work in progress by stage', () => {
    expect(numbers.workInProgress.byStage.weeded).toEqual({ bags: 1, pieces: 40 });
    expect(numbers.workInProgress.byStage.queued).toEqual({ bags: 1, pieces: 12 });
  });

  it('flags the order whose slowest remaining stage finishes after its due time', () => {
    const a = numbers.orders.find((order) => order.code === 'A')!;
    expect(a.bottleneck).toBe('pack');
    expect(a.eta).toBe(at('11:00'));
    expect(a.atRisk).toBe(true);
    expect(numbers.orders.find((order) => order.code === 'B')!.atRisk).toBe(false);
  });

  it('leaves a stage\'s observed rate out of the ETA until it rests on a dozen pieces, and the bench\'s waiting out of that rate', () => {
    // Worked by hand: the packer stood waiting until 08:30, opened bag 1 then (a scan) and packed 6 of its pieces at 08:45.
    // Six pieces are too few to stand for the bench, so pack keeps the standard 20 per hour: (40 - 6) / 20 = 1.7 h -> 10:42.
    // With 12 packed at 08:45 the bench's own rate counts: 12 pieces in 15 working minutes = 48 per hour, and
    // (40 - 12) / 48 = 0.583 h = 35 min -> 09:35 (press: 10 / 20 = 0.5 h, so pack is still the bottleneck). Over the
    // shift so far the bench packed 12 in 2 h, 6 per hour, which would have put the ETA at 13:40 for want of bags.
    const packed = (n: number): FloorInput => ({
      ...input,
      events: [
        ...input.events,
        { bagId: 1, stationId: 6, stationKind: 'pack', kind: 'scan', quantity: 0, at: at('08:30') },
        { bagId: 1, stationId: 6, stationKind: 'pack', kind: 'pack_done', quantity: n, at: at('08:45') },
      ],
      bags: [{ ...input.bags[0]!, counts: { ...bag1, packed: n } }, input.bags[1]!],
    });
    const few = floorNumbers(packed(6)).orders.find((order) => order.code === 'A')!;
    expect(few).toMatchObject({ bottleneck: 'pack', rateSource: 'standard', eta: at('10:42') });
    const enough = floorNumbers(packed(12)).orders.find((order) => order.code === 'A')!;
    expect(enough).toMatchObject({ bottleneck: 'pack', rateSource: 'observed', bottleneckRate: 48, eta: at('09:35') });
  });

  it('works out today\'s takt from the time left and the pieces due by the shift end', () => {
    // 09:00 to 15:00 = 21,600 s; order A's 40 unpacked pieces are due today: 540 s per piece.
    expect(numbers.takt).toEqual({ availableSeconds: 21_600, piecesDue: 40, secondsPerPiece: 540 });
  });

  it('ranks the spoil reasons', () => {
    expect(numbers.spoilReasons[0]).toEqual({ reason: 'Scorch or shine mark', quantity: 2, share: 1, cumulativeShare: 1 });
  });
});
