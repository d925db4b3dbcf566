import fc from 'fast-check';
import potpack from 'potpack';
import { layoutGang } from '../../src/shared/cutting/gang-layout';
import type { GangLayoutSettings, PieceGroup } from '../../src/shared/cutting/gang-layout-types';

// Cross-check against potpack (an independent packer from npm). potpack packs boxes into a near-square
// of free width, so its result is comparable with ours only where its box fits across our roll: then
// potpack's arrangement is itself a valid layout on our roll (every piece upright, gaps kept by growing
// each box by the gap), and ours, which keeps the shortest of several strategies, should be no longer
// as a rule. fast-check found a set where potpack is 5% shorter: neither heuristic dominates, so we
// assert a 10% band per set and a better average. Where potpack's box is wider than the roll there is
// no fair length to compare, so we only report densities (piece area over bounding area): a strip of
// fixed width cannot match a free square's density for a handful of pieces (one small piece on a wide
// roll), so asserting that would be unfair.

// Dwell's own tolerance for one set: potpack may win a set by up to this factor.
const PER_SET_BAND = 1.1;

describe('gang layout against potpack', () => {
  const settings: GangLayoutSettings = { rollWidthMm: 381, edgeMarginMm: 10, gapMm: 5, weedingBorderMm: 3, trailingMarginMm: 0, rulerUnit: 'mm' };
  const usable = settings.rollWidthMm - 2 * settings.edgeMarginMm;

  it('is shorter than potpack on average where potpack fits across the roll, and never more than 10% longer on one set', () => {
    const rows: Array<{ set: number; pieces: number; comparable: boolean; oursMm: number; potpackMm: number; oursDensity: number; potpackDensity: number }> = [];
    const group = fc.record({
      designWidthMm: fc.integer({ min: 10, max: 200 }),
      designHeightMm: fc.integer({ min: 10, max: 200 }),
      quantity: fc.integer({ min: 1, max: 6 }),
      mayRotate: fc.boolean(),
    });
    fc.assert(
      fc.property(fc.array(group, { minLength: 1, maxLength: 5 }), (drawn) => {
        const groups: PieceGroup[] = drawn.map((g, i) => ({ ...g, id: `g${i}`, label: `G${i}` }));
        const ours = layoutGang(groups, settings);
        const g = settings.gapMm;
        const boxes = groups.flatMap((grp) =>
          Array.from({ length: grp.quantity }, () => ({
            w: grp.designWidthMm + 2 * settings.weedingBorderMm + g,
            h: grp.designHeightMm + 2 * settings.weedingBorderMm + g,
          })),
        );
        const packedArea = boxes.reduce((sum, b) => sum + b.w * b.h, 0);
        const potpackResult = potpack(boxes);
        // Both measured with the gap grown on: our strip is (usable + gap) wide and (extent + gap) long.
        const oursLength = ours.lengthUsedMm + g;
        const comparable = potpackResult.w <= usable + g;
        rows.push({
          set: rows.length + 1,
          pieces: boxes.length,
          comparable,
          oursMm: round(oursLength),
          potpackMm: round(potpackResult.h),
          oursDensity: round(packedArea / ((usable + g) * oursLength), 3),
          potpackDensity: round(potpackResult.fill, 3),
        });
        // Neither packer is optimal, so one set may favour potpack: allow a band, then judge the average.
        if (comparable) expect(oursLength).toBeLessThanOrEqual(potpackResult.h * PER_SET_BAND);
      }),
      { numRuns: 300, seed: 4242 },
    );
    const comparable = rows.filter((r) => r.comparable);
    const summary = {
      sets: rows.length,
      comparableSets: comparable.length,
      potpackShorter: comparable.filter((r) => r.oursMm > r.potpackMm + 1e-6).length,
      oursShorter: comparable.filter((r) => r.oursMm < r.potpackMm - 1e-6).length,
      equal: comparable.filter((r) => Math.abs(r.oursMm - r.potpackMm) <= 1e-6).length,
      meanLengthRatioOursOverPotpack: round(mean(comparable.map((r) => r.oursMm / r.potpackMm)), 3),
      meanDensityOurs: round(mean(rows.map((r) => r.oursDensity)), 3),
      meanDensityPotpack: round(mean(rows.map((r) => r.potpackDensity)), 3),
      oursDenserSets: rows.filter((r) => r.oursDensity > r.potpackDensity).length,
    };
    console.log('gang layout vs potpack\n' + JSON.stringify(summary, null, 1) + '\nfirst sets:');
    console.table(rows.slice(0, 8));
    expect(comparable.length).toBeGreaterThan(50);
    expect(summary.meanLengthRatioOursOverPotpack).toBeLessThanOrEqual(1);
    expect(summary.potpackShorter).toBeLessThan(summary.oursShorter);
  });
});

function round(value: number, decimals = 1): number {
  return Number(value.toFixed(decimals));
}

function mean(values: number[]): number {
  return values.reduce((a, b) => a + b, 0) / Math.max(1, values.length);
}
