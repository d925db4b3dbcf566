import { MaxRectsPacker, PACKING_LOGIC, Rectangle } from 'maxrects-packer';
import type { PackedRectangle, PieceRectangle } from './gang-layout-types';

/** How one maxrects run is set up. */
export interface MaxrectsStrategy {
  name: string;
  logic: PACKING_LOGIC;
  /** Let the packer grow its bin from nothing (true) or start from the whole strip (false). */
  smart: boolean;
  /** Our own feeding order; without it the packer sorts by its logic. */
  order?: (a: PieceRectangle, b: PieceRectangle) => number;
}

/** The maxrects runs Dwell tries; the shortest result wins. */
export const MAXRECTS_STRATEGIES: readonly MaxrectsStrategy[] = [
  { name: 'maxrects longest edge, grown', logic: PACKING_LOGIC.MAX_EDGE, smart: true },
  { name: 'maxrects longest edge, whole strip', logic: PACKING_LOGIC.MAX_EDGE, smart: false },
  { name: 'maxrects largest area, grown', logic: PACKING_LOGIC.MAX_AREA, smart: true },
  { name: 'maxrects largest area, whole strip', logic: PACKING_LOGIC.MAX_AREA, smart: false },
  {
    name: 'maxrects tallest first, whole strip',
    logic: PACKING_LOGIC.MAX_AREA,
    smart: false,
    order: (a, b) => b.height - a.height || b.width - a.width,
  },
  {
    name: 'maxrects widest first, grown',
    logic: PACKING_LOGIC.MAX_EDGE,
    smart: true,
    order: (a, b) => b.width - a.width || b.height - a.height,
  },
];

/**
 * Packs pieces into a strip of the usable width with maxrects-packer; returns undefined if the
 * packer spilled into a second bin (it should not: the strip is made long enough for a single column).
 */
export function packWithMaxrects(
  pieces: readonly PieceRectangle[],
  usableWidthMm: number,
  gapMm: number,
  strategy: MaxrectsStrategy,
): PackedRectangle[] | undefined {
  // The gap: every rectangle grows by one gap, and so does the strip, so two neighbours are at least
  // one gap apart and the last one may touch the far side of the usable width.
  const stripLength = pieces.reduce((sum, p) => sum + Math.max(p.width, p.height) + gapMm, 0);
  const packer = new MaxRectsPacker<Rectangle>(usableWidthMm + gapMm, stripLength, 0, {
    smart: strategy.smart,
    pot: false,
    square: false,
    // Rotation is decided per rectangle below (2.7.3 honours a rectangle's own allowRotation);
    // the packer-wide flag only widens its bin-sizing check.
    allowRotation: pieces.some((p) => p.mayRotate),
    logic: strategy.logic,
  });
  const rectangles = pieces.map((piece) => {
    const rectangle = new Rectangle(piece.width + gapMm, piece.height + gapMm, 0, 0, false, piece.mayRotate);
    rectangle.data = piece;
    return rectangle;
  });
  if (strategy.order) {
    const order = strategy.order;
    const sorted = [...rectangles].sort((a, b) => order(a.data as PieceRectangle, b.data as PieceRectangle));
    for (const rectangle of sorted) packer.add(rectangle);
  } else {
    packer.addArray(rectangles);
  }
  if (packer.bins.length !== 1 || packer.bins[0].rects.length !== pieces.length) return undefined;
  return packer.bins[0].rects.map((rectangle) => ({
    piece: rectangle.data as PieceRectangle,
    x: rectangle.x,
    y: rectangle.y,
    width: rectangle.width - gapMm,
    height: rectangle.height - gapMm,
    rotated: rectangle.rot,
  }));
}
