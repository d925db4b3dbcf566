import { svgPathProperties } from 'svg-path-properties';
import { applyToPoint, uniformScale, type Affine } from './affine-transform';

// Samples per path segment when a stretch (uneven scale or skew) turns circles into ellipses and
// the segment must be measured point by point; a chord error of (1/64)^2 is far below a blade's width.
const SAMPLES_PER_SEGMENT = 64;

/** Length and contour counts of one path's data after a transform. */
export interface ContourMeasure {
  lengthMm: number;
  closedContours: number;
  openContours: number;
  /** True when the transform stretched the path and its length was measured from sampled points. */
  sampled: boolean;
}

/** Measures path data under a transform with svg-path-properties. */
export function measurePathData(d: string, matrix: Affine): ContourMeasure {
  const properties = new svgPathProperties(d);
  const scale = uniformScale(matrix);
  let lengthMm: number;
  if (scale !== undefined) {
    lengthMm = properties.getTotalLength() * scale;
  } else {
    // An uneven scale distorts arcs, so no single factor is right: sample each segment and
    // transform the points, then add up the transformed chords.
    lengthMm = 0;
    for (const part of properties.getParts()) {
      let previous = applyToPoint(matrix, part.start.x, part.start.y);
      for (let i = 1; i <= SAMPLES_PER_SEGMENT; i++) {
        const point = part.getPointAtLength((part.length * i) / SAMPLES_PER_SEGMENT);
        const next = applyToPoint(matrix, point.x, point.y);
        lengthMm += Math.hypot(next.x - previous.x, next.y - previous.y);
        previous = next;
      }
    }
  }
  const { closed, open } = countContours(d);
  return { lengthMm, closedContours: closed, openContours: open, sampled: scale === undefined };
}

/** Counts subpaths: each moveto starts one, and it is closed when a Z or z ends it. */
export function countContours(d: string): { closed: number; open: number } {
  let closed = 0;
  let open = 0;
  let current: 'none' | 'open' | 'closed' = 'none';
  for (const [command] of d.matchAll(/[MmZzLlHhVvCcSsQqTtAa]/g)) {
    if (command === 'M' || command === 'm') {
      if (current === 'open') open++;
      current = 'open';
    } else if (command === 'Z' || command === 'z') {
      if (current === 'open') closed++;
      current = 'closed';
    } else if (current === 'closed') {
      // Drawing on after a Z without a moveto starts a new subpath at the same point.
      current = 'open';
    }
  }
  if (current === 'open') open++;
  return { closed, open };
}
