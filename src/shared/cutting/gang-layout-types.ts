import type { LengthUnit } from './length-units';

/** A design to cut a number of times: its bounding box (without the weeding border) in mm. */
export interface PieceGroup {
  /** Stable id, e.g. a job id or a roster line id. */
  id: string;
  /** What the preview writes on each piece, e.g. "Front crest" or "12 OKORO". */
  label: string;
  designWidthMm: number;
  designHeightMm: number;
  quantity: number;
  /** Whether pieces of this group may be turned 90 degrees on the roll. */
  mayRotate: boolean;
}

/** The roll and the shop's spacing rules for one layout. All in mm. */
export interface GangLayoutSettings {
  rollWidthMm: number;
  /** Kept clear along each long edge of the roll (pinch rollers, edge wander). */
  edgeMarginMm: number;
  /** Minimum clear film between two pieces. */
  gapMm: number;
  /** Clear film around each design inside its piece, so the weeder can pick the waste. */
  weedingBorderMm: number;
  /** Film left after the far edge of the last piece before the cut-off; defaults to the edge margin. */
  trailingMarginMm?: number;
  /** Ruler ticks in the preview: every inch or every 100 mm. */
  rulerUnit: LengthUnit;
}

/** One piece on the roll, in roll coordinates (x across from the roll's edge, y along from the start). */
export interface Placement {
  pieceId: string;
  groupId: string;
  label: string;
  /** The piece rectangle: the design plus its weeding border, after any turn. */
  x: number;
  y: number;
  width: number;
  height: number;
  rotated: boolean;
}

/** Which way of packing produced a layout. */
export type LayoutStrategyName = string;

/** A finished gang layout. */
export interface GangLayout {
  placements: Placement[];
  /** Film pulled off the roll: far edge of the last piece plus the trailing margin. */
  lengthUsedMm: number;
  /** Across the roll from its edge to the far side of the widest-reaching piece plus an edge margin. */
  widthNeededMm: number;
  /** Design area over film area (roll width x length used), 0..1. */
  yield: number;
  piecesPerMetre: number;
  piecesPerYard: number;
  /** The strategy whose result was kept (the shortest). */
  strategy: LayoutStrategyName;
  /** The length every strategy tried reached, for the planner's curiosity and for tests. */
  triedStrategies: Array<{ name: LayoutStrategyName; lengthUsedMm: number }>;
  previewSvg: string;
}

/** A padded piece before placement: the rectangle the packer sees, without the gap. */
export interface PieceRectangle {
  pieceId: string;
  groupId: string;
  label: string;
  width: number;
  height: number;
  mayRotate: boolean;
  designAreaMm2: number;
}

/** A placement in usable-width coordinates (origin at the inner edge of the near margin). */
export interface PackedRectangle {
  piece: PieceRectangle;
  x: number;
  y: number;
  width: number;
  height: number;
  rotated: boolean;
}
