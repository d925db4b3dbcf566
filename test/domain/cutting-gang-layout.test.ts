import fc from 'fast-check';
import { layoutGang } from '../../src/shared/cutting/gang-layout';
import { GangLayoutRefusal } from '../../src/shared/cutting/gang-layout-refusal';
import type { GangLayout, GangLayoutSettings, PieceGroup } from '../../src/shared/cutting/gang-layout-types';
import { inchesToMm, MM_PER_YARD } from '../../src/shared/cutting/length-units';

const inch = inchesToMm;

/** True when two placements come closer than the gap (touching at exactly the gap is allowed). */
function tooClose(a: GangLayout['placements'][number], b: GangLayout['placements'][number], gap: number): boolean {
  const slack = 1e-6;
  return (
    a.x < b.x + b.width + gap - slack &&
    b.x < a.x + a.width + gap - slack &&
    a.y < b.y + b.height + gap - slack &&
    b.y < a.y + a.height + gap - slack
  );
}

describe('gang layout on a grid worked by hand', () => {
  // 3.5 x 3.5 in designs with a 0.25 in weeding border each side make 4 x 4 in pieces (the border is
  // inside the 4 in). 15 in roll, 0.5 in edge margins: usable 15 - 2 x 0.5 = 14 in.
  // Across: n x 4 + (n - 1) x 0.25 <= 14 -> n = 3 (12.5 in; 4 would need 16.75 in).
  // 12 pieces / 3 per row = 4 rows: 4 x 4 + 3 x 0.25 = 16.75 in, plus a 0.5 in trailing margin = 17.25 in
  // = 438.15 mm. Yield: 12 x 3.5^2 / (15 x 17.25) = 147 / 258.75.
  const settings: GangLayoutSettings = {
    rollWidthMm: inch(15),
    edgeMarginMm: inch(0.5),
    gapMm: inch(0.25),
    weedingBorderMm: inch(0.25),
    trailingMarginMm: inch(0.5),
    rulerUnit: 'in',
  };
  const crest: PieceGroup = { id: 'crest', label: 'Crest', designWidthMm: inch(3.5), designHeightMm: inch(3.5), quantity: 12, mayRotate: true };

  it('lays twelve 4 in pieces in four rows of three, 17.25 in of film', () => {
    const layout = layoutGang([crest], settings);
    expect(layout.lengthUsedMm).toBeCloseTo(inch(17.25), 9);
    expect(new Set(layout.placements.map((p) => Math.round(p.y * 1000))).size).toBe(4);
    expect(layout.yield).toBeCloseTo(147 / 258.75, 9);
  });

  it('starts the first piece at the edge margin and reports pieces per metre and per yard', () => {
    const layout = layoutGang([crest], settings);
    expect(Math.min(...layout.placements.map((p) => p.x))).toBeCloseTo(inch(0.5), 9);
    expect(layout.piecesPerMetre).toBeCloseTo(12 / (inch(17.25) / 1000), 9);
    // 1 yd = 914.4 mm (NIST SP 811).
    expect(layout.piecesPerYard).toBeCloseTo(12 / (inch(17.25) / MM_PER_YARD), 9);
  });

  it('fits a fourth piece across when the usable width reaches 16.75 in', () => {
    // 4 x 4 + 3 x 0.25 = 16.75 in usable -> 17.75 in roll: 12 pieces in 3 rows = 12.5 in + 0.5 in.
    const layout = layoutGang([crest], { ...settings, rollWidthMm: inch(17.75) });
    expect(layout.lengthUsedMm).toBeCloseTo(inch(13), 9);
  });

  it('turns oblong pieces to fit more across when they may turn, and not when they may not', () => {
    // 2 x 5 in pieces (1.5 x 4.5 in designs + 0.25 in border) on 14 in usable, 0.25 in gap.
    // Upright: 6 across (6 x 2 + 5 x 0.25 = 13.25), 12 pieces = 2 rows of 5 in: 10.25 in.
    // Turned (5 across the roll): 2 across (10.25), 6 rows of 2 in: 6 x 2 + 5 x 0.25 = 13.25 in. Upright wins.
    const tall: PieceGroup = { id: 'tall', label: 'Tall', designWidthMm: inch(1.5), designHeightMm: inch(4.5), quantity: 12, mayRotate: false };
    const layout = layoutGang([tall], settings);
    expect(layout.lengthUsedMm).toBeCloseTo(inch(10.25 + 0.5), 9);
    expect(layout.placements.every((p) => !p.rotated)).toBe(true);
    // 5 x 2 in pieces that may turn: as drawn only 2 across; turned they become the 2 x 5 grid above.
    const wide: PieceGroup = { id: 'wide', label: 'Wide', designWidthMm: inch(4.5), designHeightMm: inch(1.5), quantity: 12, mayRotate: true };
    const turned = layoutGang([wide], settings);
    expect(turned.lengthUsedMm).toBeCloseTo(inch(10.25 + 0.5), 9);
    expect(turned.placements.every((p) => p.rotated)).toBe(true);
  });
});

describe('gang layout refusals', () => {
  const settings: GangLayoutSettings = { rollWidthMm: 381, edgeMarginMm: 10, gapMm: 5, weedingBorderMm: 3, rulerUnit: 'mm' };

  it('refuses a piece wider than the usable width either way round with a sentence', () => {
    const banner: PieceGroup = { id: 'b', label: 'Banner', designWidthMm: 400, designHeightMm: 380, quantity: 1, mayRotate: true };
    expect(() => layoutGang([banner], settings)).toThrow(GangLayoutRefusal);
    expect(() => layoutGang([banner], settings)).toThrow(/"Banner" is 406 mm by 386 mm .* either way round/);
  });

  it('turns a piece that only fits turned, and refuses it when it may not turn', () => {
    const strip: PieceGroup = { id: 's', label: 'Strip', designWidthMm: 500, designHeightMm: 40, quantity: 2, mayRotate: true };
    const layout = layoutGang([strip], settings);
    expect(layout.placements.every((p) => p.rotated && p.width === 46)).toBe(true);
    expect(() => layoutGang([{ ...strip, mayRotate: false }], settings)).toThrow(/may not be turned/);
  });
});

describe('gang layout preview', () => {
  it('draws the roll at its real proportions with every piece labelled and an inch ruler', () => {
    const settings: GangLayoutSettings = { rollWidthMm: 381, edgeMarginMm: 10, gapMm: 5, weedingBorderMm: 3, rulerUnit: 'in' };
    const groups: PieceGroup[] = [
      { id: 'n7', label: '7 <REYNE>', designWidthMm: 250, designHeightMm: 60, quantity: 1, mayRotate: false },
      { id: 'n9', label: '9 HOLT', designWidthMm: 220, designHeightMm: 60, quantity: 1, mayRotate: false },
    ];
    const layout = layoutGang(groups, settings);
    expect(layout.previewSvg).toContain(`width="381" height="${Math.round(layout.lengthUsedMm * 100) / 100}"`);
    expect(layout.previewSvg.match(/class="piece"/g)).toHaveLength(2);
    expect(layout.previewSvg).toContain('7 &lt;REYNE&gt;');
    const ticks = Math.floor(layout.lengthUsedMm / 25.4) + 1;
    expect(layout.previewSvg.match(/ in<\/text>/g)).toHaveLength(ticks);
  });
});

describe('gang layout properties over random piece sets', () => {
  const group = fc.record({
    designWidthMm: fc.integer({ min: 5, max: 300 }),
    designHeightMm: fc.integer({ min: 5, max: 300 }),
    quantity: fc.integer({ min: 1, max: 6 }),
    mayRotate: fc.boolean(),
  });
  const scenario = fc.record({
    groups: fc.array(group, { minLength: 1, maxLength: 5 }),
    rollWidthMm: fc.constantFrom(305, 381, 508),
    edgeMarginMm: fc.integer({ min: 0, max: 15 }),
    gapMm: fc.integer({ min: 0, max: 10 }),
    weedingBorderMm: fc.integer({ min: 0, max: 5 }),
  });

  it('never overlaps, stays inside the usable width and never beats the area lower bound', () => {
    fc.assert(
      fc.property(scenario, (s) => {
        const settings: GangLayoutSettings = { ...s, trailingMarginMm: 0, rulerUnit: 'mm' };
        const usable = s.rollWidthMm - 2 * s.edgeMarginMm;
        const groups: PieceGroup[] = s.groups.map((g, i) => ({ ...g, id: `g${i}`, label: `G${i}` }));
        const fitsEitherWay = (g: PieceGroup) =>
          g.designWidthMm + 2 * s.weedingBorderMm <= usable || (g.mayRotate && g.designHeightMm + 2 * s.weedingBorderMm <= usable);
        if (!groups.every(fitsEitherWay)) {
          expect(() => layoutGang(groups, settings)).toThrow(GangLayoutRefusal);
          return;
        }
        const layout = layoutGang(groups, settings);
        const p = layout.placements;
        expect(p).toHaveLength(groups.reduce((n, g) => n + g.quantity, 0));
        for (const piece of p) {
          expect(piece.x).toBeGreaterThanOrEqual(s.edgeMarginMm - 1e-6);
          expect(piece.x + piece.width).toBeLessThanOrEqual(s.rollWidthMm - s.edgeMarginMm + 1e-6);
          expect(piece.y).toBeGreaterThanOrEqual(0);
          const group = groups[Number(piece.groupId.slice(1))];
          if (!group.mayRotate) expect(piece.rotated).toBe(false);
        }
        for (let i = 0; i < p.length; i++) for (let j = i + 1; j < p.length; j++) expect(tooClose(p[i], p[j], s.gapMm)).toBe(false);
        // Area lower bounds: the pieces fill at most the usable width times the length; with each piece
        // grown by one gap, they fill at most (usable + gap) x (length + gap).
        const areas = p.map((x) => x.width * x.height);
        const grown = p.map((x) => (x.width + s.gapMm) * (x.height + s.gapMm));
        const sum = (xs: number[]) => xs.reduce((a, b) => a + b, 0);
        expect(layout.lengthUsedMm).toBeGreaterThanOrEqual(sum(areas) / usable - 1e-6);
        expect(layout.lengthUsedMm).toBeGreaterThanOrEqual(sum(grown) / (usable + s.gapMm) - s.gapMm - 1e-6);
        expect(layout.yield).toBeLessThanOrEqual(1);
      }),
      { numRuns: 1000, seed: 20260 },
    );
  });
});
