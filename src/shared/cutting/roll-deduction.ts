import type { RackRoll } from './roll-choice';

/** A roll's stock after a confirmed cut. */
export interface RollDeduction {
  remainingMm: number;
  /** True when the remaining length is now below the roll's reorder length. */
  belowReorder: boolean;
  /** True only on the cut that took it below: the moment to e-mail the lead once. */
  crossedReorder: boolean;
  /** Film the floor says it used beyond what the rack thought was left (a miscount to check). */
  overdrawnMm: number;
}

/**
 * Deducts a confirmed cut (layout length plus any test cut) from a roll. The leader allowance is
 * not deducted: it is still on the core, only kept out of planning.
 */
export function deductCut(roll: Pick<RackRoll, 'remainingMm' | 'reorderMm'>, lengthMm: number, testCutMm = 0): RollDeduction {
  if (lengthMm < 0 || testCutMm < 0) throw new Error('A cut cannot add film back to a roll.');
  const used = lengthMm + testCutMm;
  // The rolls table keeps whole millimetres; round once here so repeated cuts do not drift.
  const remainingMm = Math.max(0, Math.round(roll.remainingMm - used));
  const belowReorder = remainingMm < roll.reorderMm;
  return {
    remainingMm,
    belowReorder,
    crossedReorder: belowReorder && roll.remainingMm >= roll.reorderMm,
    overdrawnMm: Math.max(0, used - roll.remainingMm),
  };
}
