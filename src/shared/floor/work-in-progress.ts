import { BAG_STAGES, type BagStage } from '../names';
import type { FloorBag } from './floor-types';

/** Bags and pieces sitting in one stage. */
export interface StageLoad {
  bags: number;
  pieces: number;
}

/** Work in progress: each stage's load, and the total still on the floor (every stage but "packed"). */
export interface WorkInProgress {
  byStage: Record<BagStage, StageLoad>;
  inSystem: StageLoad;
}

/** Counts each bag, with all its pieces, in its current stage (a part-done bag sits where its stage says). */
export function workInProgress(bags: readonly Pick<FloorBag, 'stage' | 'pieces'>[]): WorkInProgress {
  const byStage = Object.fromEntries(BAG_STAGES.map((s) => [s, { bags: 0, pieces: 0 }])) as Record<BagStage, StageLoad>;
  const inSystem = { bags: 0, pieces: 0 };
  for (const bag of bags) {
    byStage[bag.stage].bags += 1;
    byStage[bag.stage].pieces += bag.pieces;
    if (bag.stage !== 'packed') {
      inSystem.bags += 1;
      inSystem.pieces += bag.pieces;
    }
  }
  return { byStage, inSystem };
}
