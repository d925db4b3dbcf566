/** Step between the rungs of a test cut ladder, in grams of blade force (common practice, no published source). */
export const TEST_CUT_FORCE_STEP_G = 10;

/**
 * Blade exposure guide: about half the thickness of a bank card. An ID-1 card is 0.76 mm thick
 * (ISO/IEC 7810), so about 0.38 mm (common practice, no published source for the "half" rule).
 */
export const BLADE_EXPOSURE_GUIDE_MM = 0.76 / 2;

/** The guidance sentence shown beside the blade exposure, with the safety caution. */
export const BLADE_EXPOSURE_GUIDANCE =
  `Set the blade tip about ${BLADE_EXPOSURE_GUIDE_MM.toFixed(2)} mm out of its holder, about half a bank card's thickness, ` +
  'then fine-tune with a test cut. The blade is sharp: hold the holder, not the tip, keep fingers clear of the cutting path, ' +
  "and follow the cutter supplier's instructions and your local workplace safety rules.";

/** The three forces to try: the preset, one step below and one step above. */
export function testCutLadder(presetForceG: number): [number, number, number] {
  return [Math.max(TEST_CUT_FORCE_STEP_G, presetForceG - TEST_CUT_FORCE_STEP_G), presetForceG, presetForceG + TEST_CUT_FORCE_STEP_G];
}

/** How one rung of the ladder turned out. */
export interface TestCutRung {
  forceG: number;
  cutClean: boolean;
  weededClean: boolean;
}

/** The recorded test cut: which force to use next and why. */
export interface TestCutRecord {
  rungs: TestCutRung[];
  passed: boolean;
  nextForceG: number;
  sentence: string;
}

/**
 * Records a test cut. The lightest force that both cut clean and weeded clean wins: it spares the
 * blade and the carrier. If none passed, the next ladder starts a step above the heaviest tried.
 */
export function recordTestCut(rungs: readonly TestCutRung[]): TestCutRecord {
  if (rungs.length === 0) throw new Error('A test cut needs at least one force tried.');
  const byForce = [...rungs].sort((a, b) => a.forceG - b.forceG);
  const clean = byForce.find((r) => r.cutClean && r.weededClean);
  if (clean) {
    return { rungs: byForce, passed: true, nextForceG: clean.forceG, sentence: `Cut at ${clean.forceG} g: it cut and weeded clean.` };
  }
  const heaviest = byForce[byForce.length - 1].forceG;
  const nextForceG = heaviest + TEST_CUT_FORCE_STEP_G;
  return {
    rungs: byForce,
    passed: false,
    nextForceG,
    sentence:
      `No force cut and weeded clean. Check the blade's exposure and edge (the blade is sharp: follow the cutter ` +
      `supplier's instructions), then test again around ${nextForceG} g.`,
  };
}

/** What the cutter remembers about its blade and its last test cut (from the cutters table). */
export interface CutterBladeState {
  bladeInstalledAt: Date | null;
  lastTestCutAt: Date | null;
  bladeDistanceMm: number;
  distanceAtLastTestMm: number;
  testCutEveryMm: number;
  /** Wear class of the film this cutter last cut; null if it has not cut yet. */
  lastFilmWearClass: number | null;
}

/** Whether a test cut is due before this cut, with every reason as a sentence. */
export interface TestCutDue {
  due: boolean;
  reasons: string[];
}

/**
 * Decides whether a test cut is due: no test on record, a blade changed since the last test, a
 * harder film than the last one cut, or the blade has run its distance since the last test.
 * "Harder" means a strictly higher wear class than the film this cutter cut last (not the film of
 * the last test): a blade that has just cut a soft film may be set too light for an abrasive one.
 * Moving to an equal or softer film is not a reason on its own.
 */
export function testCutDue(cutter: CutterBladeState, filmWearClass: number): TestCutDue {
  const reasons: string[] = [];
  if (!cutter.lastTestCutAt) {
    reasons.push('No test cut is on record for this cutter.');
  } else if (cutter.bladeInstalledAt && cutter.bladeInstalledAt.getTime() > cutter.lastTestCutAt.getTime()) {
    reasons.push('The blade was changed after the last test cut.');
  }
  if (cutter.lastFilmWearClass !== null && filmWearClass > cutter.lastFilmWearClass) {
    reasons.push(`This film is harder on the blade (wear class ${filmWearClass}) than the last one cut (wear class ${cutter.lastFilmWearClass}).`);
  }
  const sinceTest = cutter.bladeDistanceMm - cutter.distanceAtLastTestMm;
  if (cutter.lastTestCutAt && sinceTest >= cutter.testCutEveryMm) {
    reasons.push(`The blade has cut ${(sinceTest / 1000).toFixed(1)} m (wear-weighted) since the last test, past the ${(cutter.testCutEveryMm / 1000).toFixed(1)} m set for this cutter.`);
  }
  return { due: reasons.length > 0, reasons };
}
