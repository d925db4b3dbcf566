import { compose, type Affine } from './affine-transform';
import { MM_PER_INCH } from './length-units';
import type { SvgElement } from './svg-element-tree';

// CSS Values and Units Level 3, section 5.2 (absolute lengths): 1 in = 96 px = 72 pt = 6 pc, 1 cm = 10 mm.
const MM_PER_UNIT: Record<string, number> = {
  '': MM_PER_INCH / 96,
  px: MM_PER_INCH / 96,
  pt: MM_PER_INCH / 72,
  pc: MM_PER_INCH / 6,
  in: MM_PER_INCH,
  cm: 10,
  mm: 1,
};

/** The matrix from the root's user units to millimetres on the film, with anything worth telling the planner. */
export function userUnitsToMm(root: SvgElement): { matrix: Affine; warnings: string[] } {
  const warnings: string[] = [];
  const width = physicalMm(root.attributes['width'], 'width', warnings);
  const height = physicalMm(root.attributes['height'], 'height', warnings);
  const box = (root.attributes['viewBox'] ?? '').split(/[\s,]+/).filter(Boolean).map(Number);
  const hasViewBox = box.length === 4 && box.every(Number.isFinite) && box[2] > 0 && box[3] > 0;
  if (!hasViewBox) {
    // Without a viewBox one user unit is one CSS pixel (SVG 1.1 section 7.2).
    const pixel = MM_PER_UNIT['px'];
    if (width === undefined && height === undefined) warnings.push('The design has no width or height, so Dwell read it at 96 pixels to the inch.');
    return { matrix: [pixel, 0, 0, pixel, 0, 0], warnings };
  }
  const [minX, minY, boxWidth, boxHeight] = box;
  let sx = width !== undefined ? width / boxWidth : undefined;
  let sy = height !== undefined ? height / boxHeight : undefined;
  if (sx === undefined && sy === undefined) {
    warnings.push('The design has no width or height, so Dwell read its viewBox at 96 pixels to the inch.');
    sx = sy = MM_PER_UNIT['px'];
  }
  sx ??= sy as number;
  sy ??= sx;
  // SVG 1.1 section 7.8: unless preserveAspectRatio is "none", the viewBox scales evenly ("meet": the smaller factor).
  if ((root.attributes['preserveAspectRatio'] ?? '').trim() !== 'none') sx = sy = Math.min(sx, sy);
  return { matrix: compose([sx, 0, 0, sy, 0, 0], [1, 0, 0, 1, -minX, -minY]), warnings };
}

function physicalMm(text: string | undefined, name: string, warnings: string[]): number | undefined {
  if (text === undefined) return undefined;
  const match = /^\s*([-+]?(?:\d+\.?\d*|\.\d+)(?:e[-+]?\d+)?)\s*([a-z%]*)\s*$/i.exec(text);
  const factor = match ? MM_PER_UNIT[match[2].toLowerCase()] : undefined;
  if (!match || factor === undefined || !(Number(match[1]) > 0)) {
    warnings.push(`The design's ${name} "${text}" is not a physical size, so Dwell ignored it.`);
    return undefined;
  }
  return Number(match[1]) * factor;
}
