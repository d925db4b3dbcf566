import type { PressureClass } from '../names';
import { kpaToPsi, lbfToNewtons, psiToKpa } from './units';

/**
 * Target pressure on the platen (psi, i.e. lbf per square inch of platen) for each pressure class.
 * Rule of thumb: common practice, no published source, from memory.
 *
 * How they were chosen: a heat transfer needs only a few psi on the garment, far below what the
 * air gauge reads, because the cylinder is much smaller than the platen. Shops commonly quote gauge
 * readings of about 20 (light), 40-45 (medium), 60-70 (firm) and 90 (heavy) psi for a full-size
 * 16 x 20 in air press with a 3 in bore cylinder. That press multiplies gauge pressure by
 * (π · 1.5² = 7.07 in²) / (16 · 20 = 320 in²) = 0.0221, so those readings are about 0.5, 1.0, 1.5
 * and 2.0 psi on the platen. A cross-check from the other side: a person leaning on a 15 x 15 in
 * clamshell handle, multiplied by its linkage, puts very roughly 100-450 lbf on 225 in², again
 * about 0.5-2 psi. Even steps of 0.5 psi keep the classes distinct on any gauge with 2 psi marks.
 */
export const PLATEN_PSI_BY_PRESSURE_CLASS: Readonly<Record<PressureClass, number>> = {
  light: 0.5,
  medium: 1.0,
  firm: 1.5,
  heavy: 2.0,
};

/** An air press as the calculation needs it: inches and psi. */
export interface AirPressGeometry {
  boreIn: number;
  platenWidthIn: number;
  platenHeightIn: number;
  /** The gauge's rated maximum, when known. */
  maxGaugePsi?: number | null;
}

/** Gauge setting, platen pressure and force, unrounded. */
export interface AirPressReading {
  gaugePsi: number;
  gaugeKPa: number;
  platenPsi: number;
  forceLbf: number;
  forceN: number;
}

/** Area of the cylinder's piston (in²) from its bore diameter (in): π · (d/2)². */
export function cylinderAreaIn2(boreIn: number): number {
  return Math.PI * (boreIn / 2) ** 2;
}

/** Area of a rectangular platen (in²). */
export function platenAreaIn2(widthIn: number, heightIn: number): number {
  return widthIn * heightIn;
}

/** Force the cylinder puts on the platen (lbf): gauge pressure x piston area. */
export function platenForceLbf(gaugePsi: number, boreIn: number): number {
  return gaugePsi * cylinderAreaIn2(boreIn);
}

/** Pressure on the platen (psi): gauge pressure x bore area / platen area. */
export function platenPsiFromGauge(gaugePsi: number, press: AirPressGeometry): number {
  return platenForceLbf(gaugePsi, press.boreIn) / platenAreaIn2(press.platenWidthIn, press.platenHeightIn);
}

/** The gauge setting (psi) that gives a platen pressure (psi) on this press. */
export function gaugeForPlatenPsi(platenPsi: number, press: AirPressGeometry): number {
  return (platenPsi * platenAreaIn2(press.platenWidthIn, press.platenHeightIn)) / cylinderAreaIn2(press.boreIn);
}

/** The gauge setting on another press or platen that gives the same platen pressure as this one. */
export function equivalentGaugePsi(gaugePsi: number, from: AirPressGeometry, to: AirPressGeometry): number {
  return gaugeForPlatenPsi(platenPsiFromGauge(gaugePsi, from), to);
}

/** Everything the card shows for a gauge setting on this press. */
export function readingAtGauge(gaugePsi: number, press: AirPressGeometry): AirPressReading {
  const forceLbf = platenForceLbf(gaugePsi, press.boreIn);
  return {
    gaugePsi,
    gaugeKPa: psiToKpa(gaugePsi),
    platenPsi: platenPsiFromGauge(gaugePsi, press),
    forceLbf,
    forceN: lbfToNewtons(forceLbf),
  };
}

/** The reading that gives a pressure class's target platen pressure on this press. */
export function readingForPressureClass(pressureClass: PressureClass, press: AirPressGeometry): AirPressReading {
  return readingAtGauge(gaugeForPlatenPsi(PLATEN_PSI_BY_PRESSURE_CLASS[pressureClass], press), press);
}

/** Sentences for sizes that cannot be (zero, negative, not finite); empty when the geometry is usable. */
export function geometryProblems(press: AirPressGeometry, what = 'the press'): string[] {
  const problems: string[] = [];
  const positive = (value: number) => Number.isFinite(value) && value > 0;
  if (!positive(press.boreIn)) problems.push(`The cylinder bore of ${what} must be more than zero.`);
  if (!positive(press.platenWidthIn) || !positive(press.platenHeightIn)) {
    problems.push(`The platen width and height of ${what} must both be more than zero.`);
  }
  if (press.maxGaugePsi !== undefined && press.maxGaugePsi !== null && !positive(press.maxGaugePsi)) {
    problems.push(`The rated maximum gauge pressure of ${what} must be more than zero.`);
  }
  return problems;
}

/** A sentence when a gauge setting is above the press's rated maximum, else null. */
export function overMaximumProblem(gaugePsi: number, press: AirPressGeometry, what = 'the press'): string | null {
  const max = press.maxGaugePsi;
  if (max === undefined || max === null || gaugePsi <= max) return null;
  return `A gauge setting of ${gaugePsi.toFixed(1)} psi (${psiToKpa(gaugePsi).toFixed(0)} kPa) is above the ${max.toFixed(0)} psi (${psiToKpa(max).toFixed(0)} kPa) that ${what} is rated for. Use a smaller platen, a lighter pressure class, or another press.`;
}

/** A rated maximum stored in kPa, as psi. */
export function maxGaugePsiFromKpa(kpa: number | null): number | null {
  return kpa === null ? null : kpaToPsi(kpa);
}
