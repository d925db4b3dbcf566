import type { GangLayout } from './gang-layout-types';
import type { RackRoll, RollChoice } from './roll-choice';
import type { TestCutDue } from './test-cut';

/** One queued bag waiting for one of its layer films to be cut. */
export interface CutGroupBag {
  bagId: number;
  bagCode: string;
  orderCode: string;
  jobName: string;
  pieces: number;
  designWidthMm: number;
  designHeightMm: number;
  rotationAllowed: boolean;
  /** "Layer 1 of 2" for multi-layer jobs, null for a single layer. */
  layerNote: string | null;
}

/** GET /api/cut-groups: queued bags grouped by the film they still need cut. */
export interface CutGroup {
  filmId: number;
  filmTypeId: number;
  filmTypeName: string;
  colour: string;
  colourHex: string;
  pieces: number;
  bags: CutGroupBag[];
}

/** POST /api/cut-plans/preview */
export interface CutPlanRequest {
  bagIds: number[];
  filmId: number;
  rollId?: number;
  cutterId: number;
  gapMm?: number;
  edgeMarginMm?: number;
  weedBorderMm?: number;
}

/** The film type's cut preset, plus the force that last tested clean on this cutter. */
export interface CutPreset {
  filmTypeId: number;
  filmTypeName: string;
  wearClass: 1 | 2 | 3 | 4;
  forceG: number;
  speedMmS: number;
  bladeAngleDeg: number;
  /** The force that last cut and weeded clean on this cutter for this film type, if any. */
  testedForceG: number | null;
  /** The three forces of the test-cut ladder: one step below, the preset, one step above. */
  ladderG: [number, number, number];
}

/** Cut length, time and blade wear for the bags in the plan. */
export interface CutPlanEstimate {
  cutLengthMm: number;
  cutTimeS: number;
  bladeDistanceMm: number;
  /** One sentence per design read by approximation (a PNG) or with something left out. */
  warnings: string[];
}

/** A roll as the planner and the Roll rack show it. */
export interface RollView extends RackRoll {
  filmTypeName: string;
  colour: string;
  colourHex: string;
  low: boolean;
}

/** The cutter's blade as the station shows it. */
export interface CutterView {
  id: number;
  name: string;
  carriageWidthMm: number;
  minMediaMm: number;
  maxMediaMm: number;
  bladeInstalledAt: string | null;
  bladeDistanceMm: number;
  lastTestCutAt: string | null;
  /** Wear-weighted distance since the last test cut, and the distance after which one is due. */
  sinceTestMm: number;
  testCutEveryMm: number;
  lastFilmTypeId: number | null;
}

/** What the hub answers to a preview. */
export interface CutPlanPreview {
  bags: CutGroupBag[];
  film: { id: number; filmTypeName: string; colour: string; colourHex: string };
  layout: Omit<GangLayout, 'triedStrategies'>;
  /** The plain layout for the cutter's own software: mm units, one outline per piece. */
  cutterSvg: string;
  settings: { gapMm: number; edgeMarginMm: number; weedBorderMm: number; rollWidthMm: number };
  rollChoice: RollChoice;
  /** The roll the layout was made for (the chosen one, or the one asked for). */
  roll: RollView | null;
  preset: CutPreset;
  estimate: CutPlanEstimate;
  testCut: TestCutDue;
  /** Film a test cut takes from the roll, deducted with the cut when a test was made. */
  testCutFilmMm: number;
  cutter: CutterView;
  units: 'imperial' | 'metric';
}

/** A refused preview: the layout cannot be made, with the sentence why. */
export interface CutPlanRefusal {
  error: string;
}

/** POST /api/cut-plans/confirm */
export interface CutConfirmRequest {
  bagIds: number[];
  filmId: number;
  rollId: number;
  cutterId: number;
  lengthMm: number;
  testCutMm?: number;
}

/** What a confirmed cut changed. */
export interface CutConfirmReply {
  roll: RollView;
  /** True only on the cut that took the roll below its reorder length. */
  crossedReorder: boolean;
  cutter: CutterView;
  /** Bags whose every layer is now cut (a cut_done event was recorded for each). */
  cutBagIds: number[];
  /** Bags that still have another layer film to cut. */
  waitingBagIds: number[];
  sentence: string;
}

/** POST /api/test-cuts */
export interface TestCutRequest {
  cutterId: number;
  filmTypeId: number;
  bagId?: number;
  steps: { forceG: number; cutClean: boolean; weededClean: boolean }[];
}

/** What a recorded test cut says. */
export interface TestCutReply {
  passed: boolean;
  nextForceG: number;
  sentence: string;
  cutter: CutterView;
}

/** One row of a roll's history. */
export interface RollMovement {
  id: number;
  kind: 'received' | 'cut' | 'measure';
  changeMm: number;
  remainingMm: number;
  cutLengthMm: number | null;
  testCutMm: number | null;
  cutterName: string | null;
  userName: string | null;
  bagCodes: string[];
  note: string;
  at: string;
}

/** POST /api/rolls */
export interface RollCreate {
  filmId: number;
  label: string;
  widthMm: number;
  lengthMm: number;
  remainingMm?: number;
  reorderMm: number;
  rackSlot?: string;
}
