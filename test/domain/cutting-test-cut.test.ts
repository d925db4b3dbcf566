import {
  BLADE_EXPOSURE_GUIDANCE,
  BLADE_EXPOSURE_GUIDE_MM,
  recordTestCut,
  TEST_CUT_FORCE_STEP_G,
  testCutDue,
  testCutLadder,
  type CutterBladeState,
} from '../../src/shared/cutting/test-cut';

describe('test cut ladder and record', () => {
  it('brackets the preset force one step below and one above', () => {
    // Common practice, no published source: preset, one step either side.
    expect(testCutLadder(120)).toEqual([120 - TEST_CUT_FORCE_STEP_G, 120, 120 + TEST_CUT_FORCE_STEP_G]);
  });

  it('uses the lightest force that cut and weeded clean next', () => {
    const record = recordTestCut([
      { forceG: 130, cutClean: true, weededClean: true },
      { forceG: 110, cutClean: false, weededClean: false },
      { forceG: 120, cutClean: true, weededClean: true },
    ]);
    expect(record).toMatchObject({ passed: true, nextForceG: 120 });
  });

  it('moves a step above the heaviest tried when none passed, with the blade caution', () => {
    const record = recordTestCut([
      { forceG: 110, cutClean: false, weededClean: false },
      { forceG: 120, cutClean: false, weededClean: false },
      { forceG: 130, cutClean: true, weededClean: false },
    ]);
    expect(record).toMatchObject({ passed: false, nextForceG: 130 + TEST_CUT_FORCE_STEP_G });
    expect(record.sentence).toMatch(/blade is sharp/);
  });

  it('guides blade exposure to half an ID-1 card and says the blade is sharp', () => {
    // ISO/IEC 7810: an ID-1 card is 0.76 mm thick; half is 0.38 mm (common practice, no published source).
    expect(BLADE_EXPOSURE_GUIDE_MM).toBeCloseTo(0.38, 9);
    expect(BLADE_EXPOSURE_GUIDANCE).toMatch(/0\.38 mm.*blade is sharp.*supplier's instructions.*safety rules/);
  });
});

describe('when a test cut is due', () => {
  const tested: CutterBladeState = {
    bladeInstalledAt: new Date('2026-03-01T08:00:00Z'),
    lastTestCutAt: new Date('2026-03-02T08:00:00Z'),
    bladeDistanceMm: 120_000,
    distanceAtLastTestMm: 100_000,
    testCutEveryMm: 500_000,
    lastFilmWearClass: 2,
  };

  it('is not due on the same or a softer film soon after a test', () => {
    expect(testCutDue(tested, 2)).toEqual({ due: false, reasons: [] });
    expect(testCutDue(tested, 1).due).toBe(false);
  });

  it('is due after a change to a harder film than the last one cut', () => {
    expect(testCutDue(tested, 4).reasons).toEqual(['This film is harder on the blade (wear class 4) than the last one cut (wear class 2).']);
  });

  it('is due when the blade was changed after the last test', () => {
    const changed = { ...tested, bladeInstalledAt: new Date('2026-03-03T08:00:00Z') };
    expect(testCutDue(changed, 2).reasons).toEqual(['The blade was changed after the last test cut.']);
  });

  it('is due when the blade has run past its distance since the last test, and lists every reason', () => {
    const worn = { ...tested, bladeDistanceMm: 600_000, bladeInstalledAt: new Date('2026-03-03T08:00:00Z') };
    const due = testCutDue(worn, 3);
    expect(due.due).toBe(true);
    expect(due.reasons).toHaveLength(3);
    expect(due.reasons[2]).toMatch(/cut 500\.0 m \(wear-weighted\) since the last test, past the 500\.0 m/);
  });

  it('is due when no test cut is on record', () => {
    expect(testCutDue({ ...tested, lastTestCutAt: null }, 1).reasons).toEqual(['No test cut is on record for this cutter.']);
  });
});
