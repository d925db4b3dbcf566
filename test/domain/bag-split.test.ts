import fc from 'fast-check';
import { SIZES, type Size, type SizeQuantities } from '../../src/shared/intake-contract';
import { bagCode, countPieces, splitIntoBags } from '../../src/shared/intake/bag-split';

describe('splitting a job into bags', () => {
  it('keeps each size in one bag and uses the fewest bags (worked by hand)', () => {
    // 14 S, 10 M, 24 L, 6 XL at 24 a bag: L fills a bag; S+M = 24 fill one; XL alone: 3 bags is the minimum (54/24 -> 3).
    const bags = splitIntoBags({ S: 14, M: 10, L: 24, XL: 6 }, 24);
    expect(bags.map((b) => b.sizes)).toEqual([{ S: 14, M: 10 }, { L: 24 }, { XL: 6 }]);
  });

  it('splits a size larger than a bag into full bags and carries its rest like any size', () => {
    const bags = splitIntoBags({ M: 50, L: 4 }, 24);
    expect(bags.map((b) => b.sizes)).toEqual([{ M: 24 }, { M: 24 }, { M: 2, L: 4 }]);
  });

  it('puts roster lines in the bag of their size, in roster order', () => {
    const lines = [{ size: 'M' }, { size: 'S' }, { size: 'M' }, { size: 'L' }, { size: 'S' }];
    const bags = splitIntoBags(lines, 3);
    // 5 pieces at 3 a bag need 2 bags; S (2) and L (1) share one, M (2) has the other.
    expect(bags).toEqual([
      { sizes: { S: 2, L: 1 }, rosterLineIndexes: [1, 3, 4] },
      { sizes: { M: 2 }, rosterLineIndexes: [0, 2] },
    ]);
  });

  it('keeps the bag limit, the totals and whole sizes for any quantities (property test)', () => {
    const quantities = fc.dictionary(fc.constantFrom(...SIZES), fc.integer({ min: 0, max: 60 }));
    fc.assert(
      fc.property(quantities, fc.integer({ min: 1, max: 40 }), (q, max) => {
        const bags = splitIntoBags(q as SizeQuantities, max);
        const totals: Record<string, number> = {};
        for (const bag of bags) {
          expect(countPieces(bag.sizes)).toBeLessThanOrEqual(max);
          expect(countPieces(bag.sizes)).toBeGreaterThan(0);
          for (const [size, n] of Object.entries(bag.sizes)) totals[size] = (totals[size] ?? 0) + n!;
        }
        const expected = Object.fromEntries(Object.entries(q).filter(([, n]) => n > 0));
        expect(totals).toEqual(expected);
        // A size is split only when it alone is more than a bag, and then into full bags plus at most one rest.
        for (const [size, n] of Object.entries(expected)) {
          const holding = bags.filter((b) => (b.sizes[size as Size] ?? 0) > 0);
          if (n <= max) expect(holding).toHaveLength(1);
          else expect(holding.filter((b) => b.sizes[size as Size] !== max).length).toBeLessThanOrEqual(1);
        }
        // Never fewer bags than the pieces need.
        expect(bags.length).toBeGreaterThanOrEqual(Math.ceil(countPieces(q as SizeQuantities) / max));
      }),
      { numRuns: 300 },
    );
  });

  it('gives the same split every time for the same quantities', () => {
    const q = { XL: 7, S: 9, YM: 11, M: 5, L: 13 };
    expect(splitIntoBags(q, 20)).toEqual(splitIntoBags({ ...q }, 20));
  });
});

describe('bag codes', () => {
  it('counts A to Z, then AA, AB like spreadsheet columns', () => {
    expect([0, 1, 25, 26, 27, 51, 52, 701, 702].map((i) => bagCode('1042', i))).toEqual([
      '1042-A', '1042-B', '1042-Z', '1042-AA', '1042-AB', '1042-AZ', '1042-BA', '1042-ZZ', '1042-AAA',
    ]);
  });
});
