import { compose, parseTransformList, type Affine } from './affine-transform';
import { measurePathData } from './contour-length';
import { readSvgElements, type SvgElement } from './svg-element-tree';
import { userUnitsToMm } from './svg-physical-scale';
import { CUT_SHAPES, shapeToPathData } from './svg-shape-paths';

/** Extra cut past the start of each closed contour so the shape lifts out whole (common practice, no published source). */
export const OVERCUT_PER_CLOSED_CONTOUR_MM = 1;

/** Time to lift the blade, travel to the next contour and drop it again (common practice, no published source). */
export const LIFT_AND_MOVE_S_PER_CONTOUR = 0.3;

/**
 * How much faster a blade dulls per millimetre cut, by the film's wear class (1 thin smooth .. 4
 * abrasive). Dwell's own starting weights, common practice, no published source: thick and abrasive
 * films (glitter, flock) dull a blade faster. A shop tunes them from its own blade records.
 */
export const WEAR_FACTOR_BY_CLASS: Readonly<Record<1 | 2 | 3 | 4, number>> = { 1: 1, 2: 1.5, 3: 2.5, 4: 4 };

/** The film facts the estimate needs (from film_types). */
export interface CutFilm {
  wearClass: 1 | 2 | 3 | 4;
  cutSpeedMmS: number;
}

/** What cutting a design will take. */
export interface CutEstimate {
  /** Every contour's length at the design's physical size. */
  pathLengthMm: number;
  closedContours: number;
  openContours: number;
  overcutMm: number;
  /** Path length plus overcut, for all copies. */
  cutLengthMm: number;
  cutTimeS: number;
  /** Cut length weighted by the film's wear class, added to the blade's distance. */
  bladeDistanceMm: number;
  /** Sentences about what was not counted or was read by assumption. */
  warnings: string[];
}

const NOT_DRAWN = new Set(['defs', 'clipPath', 'mask', 'symbol', 'pattern', 'marker', 'metadata', 'title', 'desc', 'style', 'script', 'linearGradient', 'radialGradient', 'filter']);

/** Estimates cut length, time and blade wear for a design SVG (markup or an already-read element tree). */
export function estimateCut(design: string | SvgElement, film: CutFilm, copies = 1): CutEstimate {
  const tree = typeof design === 'string' ? readSvgElements(design) : design;
  const root = findRoot(tree);
  if (!root) throw new Error('The design has no <svg> element, so Dwell cannot estimate its cut.');
  const { matrix, warnings } = userUnitsToMm(root);
  const totals = { length: 0, closed: 0, open: 0, sampled: false };
  const skipped = new Map<string, number>();
  walk(root, compose(matrix, parseTransformList(root.attributes['transform'])), totals, skipped);
  if (totals.sampled) {
    warnings.push('Part of the design is stretched unevenly, so its curves were measured point by point (within a fraction of a millimetre).');
  }
  for (const [name, count] of skipped) warnings.push(skippedSentence(name, count));
  const perCopyOvercut = totals.closed * OVERCUT_PER_CLOSED_CONTOUR_MM;
  const cutLengthMm = (totals.length + perCopyOvercut) * copies;
  const contours = (totals.closed + totals.open) * copies;
  return {
    pathLengthMm: totals.length * copies,
    closedContours: totals.closed * copies,
    openContours: totals.open * copies,
    overcutMm: perCopyOvercut * copies,
    cutLengthMm,
    cutTimeS: cutLengthMm / film.cutSpeedMmS + contours * LIFT_AND_MOVE_S_PER_CONTOUR,
    bladeDistanceMm: cutLengthMm * WEAR_FACTOR_BY_CLASS[film.wearClass],
    warnings,
  };
}

function walk(
  element: SvgElement,
  matrix: Affine,
  totals: { length: number; closed: number; open: number; sampled: boolean },
  skipped: Map<string, number>,
): void {
  for (const child of element.children) {
    if (NOT_DRAWN.has(child.name) || child.attributes['display'] === 'none') continue;
    const childMatrix = compose(matrix, parseTransformList(child.attributes['transform']));
    if ((CUT_SHAPES as readonly string[]).includes(child.name)) {
      const d = shapeToPathData(child);
      if (!d) continue;
      const measure = measurePathData(d, childMatrix);
      totals.length += measure.lengthMm;
      totals.closed += measure.closedContours;
      totals.open += measure.openContours;
      totals.sampled ||= measure.sampled;
    } else if (child.name === 'text' || child.name === 'use' || child.name === 'image') {
      skipped.set(child.name, (skipped.get(child.name) ?? 0) + 1);
    } else {
      walk(child, childMatrix, totals, skipped);
    }
  }
}

function skippedSentence(name: string, count: number): string {
  const times = count === 1 ? 'one' : String(count);
  if (name === 'text') return `The design has ${times} text element(s) that are not counted: convert text to outlines before cutting.`;
  if (name === 'use') return `The design has ${times} reused element(s) (<use>) that are not counted: expand them in the design.`;
  return `The design has ${times} embedded picture(s) that a cutter cannot cut; they are not counted.`;
}

function findRoot(element: SvgElement): SvgElement | undefined {
  if (element.name === 'svg') return element;
  for (const child of element.children) {
    const found = findRoot(child);
    if (found) return found;
  }
  return undefined;
}
