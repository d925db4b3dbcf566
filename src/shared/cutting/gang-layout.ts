import { MM_PER_METRE, MM_PER_YARD } from './length-units';
import type { GangLayout, GangLayoutSettings, PackedRectangle, PieceGroup, PieceRectangle, Placement } from './gang-layout-types';
import { layoutPreviewSvg } from './layout-preview-svg';
import { MAXRECTS_STRATEGIES, packWithMaxrects } from './maxrects-strategy';
import { pieceRectangles, usableWidthMm } from './piece-rectangles';
import { packInShelves, type ShelfOrientation } from './shelf-layout';

const SHELF_ORIENTATIONS: readonly ShelfOrientation[] = ['as-drawn', 'long-side-across', 'short-side-across'];

interface Candidate {
  name: string;
  packed: PackedRectangle[];
  extentMm: number;
}

/**
 * Lays pieces out on the roll: tries several maxrects runs and shelf (grid) layouts, keeps the
 * shortest, and reports placements in roll coordinates, film used, yield and a preview.
 * Throws GangLayoutRefusal with a sentence when a piece fits the usable width neither way round.
 */
export function layoutGang(groups: readonly PieceGroup[], settings: GangLayoutSettings): GangLayout {
  const pieces = pieceRectangles(groups, settings);
  const usable = usableWidthMm(settings);
  const candidates = [...shelfCandidates(pieces, usable, settings.gapMm), ...maxrectsCandidates(pieces, usable, settings.gapMm)];
  // Ties go to the earlier candidate: shelves come first, so an exact grid wins over an equal maxrects result.
  const best = candidates.reduce((a, b) => (b.extentMm < a.extentMm - 1e-9 ? b : a));
  return describeLayout(best, candidates, pieces, settings);
}

/** The length along the roll that packed pieces reach, from the start of the film. */
export function packedExtentMm(packed: readonly PackedRectangle[]): number {
  return packed.reduce((far, p) => Math.max(far, p.y + p.height), 0);
}

/** Shelf layouts only, in usable-width coordinates; the benchmark's baseline. */
export function shelfLayoutExtentMm(groups: readonly PieceGroup[], settings: GangLayoutSettings): number {
  const pieces = pieceRectangles(groups, settings);
  return Math.min(...shelfCandidates(pieces, usableWidthMm(settings), settings.gapMm).map((c) => c.extentMm));
}

function shelfCandidates(pieces: readonly PieceRectangle[], usable: number, gap: number): Candidate[] {
  const anyTurnable = pieces.some((p) => p.mayRotate);
  const orientations = anyTurnable ? SHELF_ORIENTATIONS : SHELF_ORIENTATIONS.slice(0, 1);
  return orientations.map((orientation) => {
    const packed = packInShelves(pieces, usable, gap, orientation);
    return { name: `shelves, ${orientation}`, packed, extentMm: packedExtentMm(packed) };
  });
}

function maxrectsCandidates(pieces: readonly PieceRectangle[], usable: number, gap: number): Candidate[] {
  const candidates: Candidate[] = [];
  for (const strategy of MAXRECTS_STRATEGIES) {
    const packed = packWithMaxrects(pieces, usable, gap, strategy);
    if (packed) candidates.push({ name: strategy.name, packed, extentMm: packedExtentMm(packed) });
  }
  return candidates;
}

function describeLayout(
  best: Candidate,
  candidates: readonly Candidate[],
  pieces: readonly PieceRectangle[],
  settings: GangLayoutSettings,
): GangLayout {
  const margin = settings.edgeMarginMm;
  const trailing = settings.trailingMarginMm ?? margin;
  const placements: Placement[] = best.packed.map((p) => ({
    pieceId: p.piece.pieceId,
    groupId: p.piece.groupId,
    label: p.piece.label,
    x: p.x + margin,
    y: p.y,
    width: p.width,
    height: p.height,
    rotated: p.rotated,
  }));
  const count = placements.length;
  const lengthUsedMm = count === 0 ? 0 : best.extentMm + trailing;
  const designArea = pieces.reduce((sum, p) => sum + p.designAreaMm2, 0);
  const farSide = placements.reduce((far, p) => Math.max(far, p.x + p.width), 0);
  return {
    placements,
    lengthUsedMm,
    widthNeededMm: count === 0 ? 0 : farSide + margin,
    yield: lengthUsedMm > 0 ? designArea / (settings.rollWidthMm * lengthUsedMm) : 0,
    piecesPerMetre: lengthUsedMm > 0 ? count / (lengthUsedMm / MM_PER_METRE) : 0,
    piecesPerYard: lengthUsedMm > 0 ? count / (lengthUsedMm / MM_PER_YARD) : 0,
    strategy: best.name,
    triedStrategies: candidates.map((c) => ({ name: c.name, lengthUsedMm: c.extentMm + trailing })),
    previewSvg: layoutPreviewSvg({
      placements,
      rollWidthMm: settings.rollWidthMm,
      lengthUsedMm,
      edgeMarginMm: margin,
      trailingMarginMm: trailing,
      weedingBorderMm: settings.weedingBorderMm,
      rulerUnit: settings.rulerUnit,
    }),
  };
}
