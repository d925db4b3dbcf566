import fc from 'fast-check';
import {
  cylinderAreaIn2,
  equivalentGaugePsi,
  gaugeForPlatenPsi,
  geometryProblems,
  overMaximumProblem,
  PLATEN_PSI_BY_PRESSURE_CLASS,
  platenForceLbf,
  platenPsiFromGauge,
  readingAtGauge,
  readingForPressureClass,
  type AirPressGeometry,
} from '../../src/shared/press/air-press';
import { PRESSURE_CLASSES } from '../../src/shared/names';

const clamshell15: AirPressGeometry = { boreIn: 3, platenWidthIn: 15, platenHeightIn: 15 };
const full16x20: AirPressGeometry = { boreIn: 3, platenWidthIn: 16, platenHeightIn: 20, maxGaugePsi: 100 };

describe('air press: force = pressure x area', () => {
  it('gives 424.1 lbf from a 3 in bore at 60 psi', () => {
    // Worked by hand (force = pressure x area): bore area = π x (3/2)² = π x 2.25 = 7.0686 in²;
    // 7.0686 in² x 60 lbf/in² = 424.12 lbf.
    expect(cylinderAreaIn2(3)).toBeCloseTo(7.0686, 4);
    expect(platenForceLbf(60, 3)).toBeCloseTo(424.12, 2);
  });

  it('spreads that force over a 15 x 15 in platen as 1.885 psi', () => {
    // Worked by hand: platen area = 15 x 15 = 225 in²; 424.12 lbf / 225 in² = 1.885 psi.
    expect(platenPsiFromGauge(60, clamshell15)).toBeCloseTo(1.885, 3);
  });

  it('reports the force in newtons as well', () => {
    // 424.115 lbf x 4.448 222 N/lbf (NIST SP 811, appendix B.8) = 1886.56 N
    expect(readingAtGauge(60, clamshell15).forceN).toBeCloseTo(1886.56, 1);
    // 60 psi x 6.894 757 kPa/psi (NIST SP 811, appendix B.8) = 413.69 kPa
    expect(readingAtGauge(60, clamshell15).gaugeKPa).toBeCloseTo(413.69, 2);
  });

  it('finds the gauge setting that keeps the platen pressure on a smaller platen', () => {
    // Worked by hand: same bore, so gauge scales with platen area: 60 psi x (15 x 15) / (16 x 20) = 60 x 225 / 320 = 42.19 psi.
    expect(equivalentGaugePsi(60, full16x20, clamshell15)).toBeCloseTo(42.1875, 4);
    // A 5 x 15 in sleeve platen: 60 x 75 / 320 = 14.06 psi.
    expect(equivalentGaugePsi(60, full16x20, { boreIn: 3, platenWidthIn: 5, platenHeightIn: 15 })).toBeCloseTo(14.0625, 4);
  });

  it('finds the gauge setting on another press with a different bore', () => {
    // Worked by hand: a 4 in bore has (4/3)² = 1.778 times the piston area, so the same platen needs 60 / 1.778 = 33.75 psi.
    expect(equivalentGaugePsi(60, clamshell15, { boreIn: 4, platenWidthIn: 15, platenHeightIn: 15 })).toBeCloseTo(33.75, 4);
  });

  it('comes back to the same gauge setting after converting to another press and back', () => {
    const size = fc.double({ min: 0.5, max: 40, noNaN: true });
    const press = fc.record({ boreIn: size, platenWidthIn: size, platenHeightIn: size });
    fc.assert(
      fc.property(fc.double({ min: 0, max: 150, noNaN: true }), press, press, (gauge, from, to) => {
        const there = equivalentGaugePsi(gauge, from, to);
        expect(equivalentGaugePsi(there, to, from)).toBeCloseTo(gauge, 6);
        expect(gaugeForPlatenPsi(platenPsiFromGauge(gauge, from), from)).toBeCloseTo(gauge, 6);
      }),
    );
  });
});

describe('air press: pressure classes (rule of thumb, common practice, no published source)', () => {
  it('gives each heavier class a higher platen pressure, all a few psi', () => {
    const targets = PRESSURE_CLASSES.map((c) => PLATEN_PSI_BY_PRESSURE_CLASS[c]);
    expect([...targets].sort((a, b) => a - b)).toEqual(targets);
    expect(new Set(targets).size).toBe(targets.length);
    for (const psi of targets) expect(psi).toBeGreaterThan(0);
    for (const psi of targets) expect(psi).toBeLessThan(5);
  });

  it('sets medium on a 16 x 20 in press with a 3 in bore to about 45 psi on the gauge', () => {
    // Worked by hand: 1.0 psi x 320 in² / 7.0686 in² = 45.27 psi; force = 320 lbf.
    const medium = readingForPressureClass('medium', full16x20);
    expect(medium.gaugePsi).toBeCloseTo(45.27, 2);
    expect(medium.forceLbf).toBeCloseTo(320, 6);
    // Heavy stays within the 100 psi such a press is commonly rated for: 2.0 x 320 / 7.0686 = 90.54 psi.
    expect(readingForPressureClass('heavy', full16x20).gaugePsi).toBeCloseTo(90.54, 2);
  });
});

describe('air press: impossible inputs', () => {
  it('names zero or negative sizes in a sentence', () => {
    expect(geometryProblems({ boreIn: 0, platenWidthIn: 15, platenHeightIn: 15 })).toEqual(['The cylinder bore of the press must be more than zero.']);
    expect(geometryProblems({ boreIn: 3, platenWidthIn: -1, platenHeightIn: 15 })).toEqual(['The platen width and height of the press must both be more than zero.']);
    expect(geometryProblems(full16x20)).toEqual([]);
  });

  it('refuses a gauge setting above the rated maximum', () => {
    expect(overMaximumProblem(120, full16x20)).toMatch(/120\.0 psi .* above the 100 psi/);
    expect(overMaximumProblem(100, full16x20)).toBeNull();
    expect(overMaximumProblem(500, clamshell15)).toBeNull(); // no rated maximum known
  });
});
