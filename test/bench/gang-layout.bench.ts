// 500 mixed pieces laid out on a 20 in roll: median time of the full layout (all strategies) next to
// the shelf layout alone as the same-run baseline, with the length, yield and area lower bound.
import { layoutGang, shelfLayoutExtentMm } from '../../src/shared/cutting/gang-layout';
import type { GangLayoutSettings, PieceGroup } from '../../src/shared/cutting/gang-layout-types';
import { medianMs } from './median-time';

const RUNS = 7;

// A small seeded generator (mulberry32) so every run lays out the same invented demo set.
function seeded(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function mixedPieces(total: number): PieceGroup[] {
  const random = seeded(500);
  const groups: PieceGroup[] = [];
  let count = 0;
  for (let i = 0; count < total; i++) {
    // A mix of left-chest crests, numbers, names (roster lines are one piece each) and full backs.
    const kind = i % 4;
    const quantity = kind === 2 ? 1 : Math.min(total - count, 1 + Math.floor(random() * 24));
    const [w, h] = kind === 0 ? [80 + random() * 30, 80 + random() * 30] : kind === 1 ? [150 + random() * 100, 200 + random() * 60] : kind === 2 ? [180 + random() * 120, 50 + random() * 20] : [250 + random() * 60, 280 + random() * 80];
    groups.push({ id: `g${i}`, label: `G${i}`, designWidthMm: w, designHeightMm: h, quantity, mayRotate: kind !== 2 });
    count += quantity;
  }
  return groups;
}

const settings: GangLayoutSettings = { rollWidthMm: 508, edgeMarginMm: 10, gapMm: 5, weedingBorderMm: 3, trailingMarginMm: 10, rulerUnit: 'in' };
const groups = mixedPieces(500);
const layout = layoutGang(groups, settings);
const usable = settings.rollWidthMm - 2 * settings.edgeMarginMm;
const paddedArea = layout.placements.reduce((sum, p) => sum + p.width * p.height, 0);
const lowerBoundMm = paddedArea / usable + (settings.trailingMarginMm ?? 0);
const shelfLengthMm = shelfLayoutExtentMm(groups, settings) + (settings.trailingMarginMm ?? 0);

const layoutMs = medianMs(() => layoutGang(groups, settings), RUNS);
const shelfMs = medianMs(() => shelfLayoutExtentMm(groups, settings), RUNS);

console.log(`pieces: ${layout.placements.length}, runs: ${RUNS}, kept strategy: ${layout.strategy}`);
console.table([
  { what: 'full layout (all strategies)', medianMs: +layoutMs.toFixed(1), timeVsShelf: +(layoutMs / shelfMs).toFixed(1), lengthMm: +layout.lengthUsedMm.toFixed(0), lengthVsLowerBound: +(layout.lengthUsedMm / lowerBoundMm).toFixed(3), yield: +layout.yield.toFixed(3) },
  { what: 'shelf layout only (baseline)', medianMs: +shelfMs.toFixed(1), timeVsShelf: 1, lengthMm: +shelfLengthMm.toFixed(0), lengthVsLowerBound: +(shelfLengthMm / lowerBoundMm).toFixed(3), yield: null },
  { what: 'area lower bound', medianMs: null, timeVsShelf: null, lengthMm: +lowerBoundMm.toFixed(0), lengthVsLowerBound: 1, yield: null },
]);
console.log('strategies tried (length used, mm):');
for (const tried of layout.triedStrategies) console.log(`  ${tried.name}: ${tried.lengthUsedMm.toFixed(0)}`);
