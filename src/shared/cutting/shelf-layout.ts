import type { PackedRectangle, PieceRectangle } from './gang-layout-types';

/** How a shelf layout turns pieces that may turn. */
export type ShelfOrientation = 'as-drawn' | 'long-side-across' | 'short-side-across';

// Lengths are sums of decimals converted from inches; a micrometre's slack keeps 3 x 101.6 + 2 x 6.35
// from failing to fit 317.5 through rounding.
const FIT_SLACK_MM = 1e-6;

interface Shelf {
  y: number;
  height: number;
  usedWidth: number;
}

/**
 * Rows of pieces across the roll, tallest first, each piece in the first row it fits (first fit
 * decreasing height). For identical pieces this is the exact grid: n per row where
 * n x width + (n - 1) x gap <= usable width, and rows x height + (rows - 1) x gap along the roll.
 */
export function packInShelves(
  pieces: readonly PieceRectangle[],
  usableWidthMm: number,
  gapMm: number,
  orientation: ShelfOrientation,
): PackedRectangle[] {
  const oriented = pieces.map((piece) => orient(piece, usableWidthMm, orientation));
  oriented.sort((a, b) => b.height - a.height || b.width - a.width);
  const shelves: Shelf[] = [];
  const packed: PackedRectangle[] = [];
  for (const item of oriented) {
    let shelf = shelves.find(
      (s) => item.height <= s.height + FIT_SLACK_MM && s.usedWidth + gapMm + item.width <= usableWidthMm + FIT_SLACK_MM,
    );
    let x: number;
    if (shelf) {
      x = shelf.usedWidth + gapMm;
    } else {
      const last = shelves[shelves.length - 1];
      shelf = { y: last ? last.y + last.height + gapMm : 0, height: item.height, usedWidth: 0 };
      shelves.push(shelf);
      x = 0;
    }
    shelf.usedWidth = x + item.width;
    packed.push({ ...item, x, y: shelf.y });
  }
  return packed;
}

function orient(piece: PieceRectangle, usable: number, orientation: ShelfOrientation): Omit<PackedRectangle, 'x' | 'y'> {
  const upright = { piece, width: piece.width, height: piece.height, rotated: false };
  const turned = { piece, width: piece.height, height: piece.width, rotated: true };
  if (!piece.mayRotate) return upright;
  if (piece.width > usable + FIT_SLACK_MM) return turned;
  if (piece.height > usable + FIT_SLACK_MM) return upright;
  if (orientation === 'long-side-across') return piece.width >= piece.height ? upright : turned;
  if (orientation === 'short-side-across') return piece.width <= piece.height ? upright : turned;
  return upright;
}
