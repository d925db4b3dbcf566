/** Length units for cutting: Dwell keeps every length in millimetres and converts only for people. */

// NIST SP 811 (2008), appendix B: 1 in = 25.4 mm exactly; 1 yd = 0.9144 m exactly.
export const MM_PER_INCH = 25.4;
export const MM_PER_YARD = 914.4;
export const MM_PER_METRE = 1000;

/** How a person on the floor reads lengths: inches or millimetres. */
export type LengthUnit = 'in' | 'mm';

/** Millimetres to inches. */
export function mmToInches(mm: number): number {
  return mm / MM_PER_INCH;
}

/** Inches to millimetres. */
export function inchesToMm(inches: number): number {
  return inches * MM_PER_INCH;
}

/** A width for a sentence, e.g. "381 mm (15 in)". */
export function describeWidth(mm: number): string {
  return `${Math.round(mm)} mm (${trimNumber(mmToInches(mm), 2)} in)`;
}

/** A roll length for a sentence, e.g. "2.40 m (7.9 ft)". */
export function describeLength(mm: number): string {
  return `${(mm / MM_PER_METRE).toFixed(2)} m (${trimNumber(mmToInches(mm) / 12, 1)} ft)`;
}

function trimNumber(value: number, decimals: number): string {
  return String(Number(value.toFixed(decimals)));
}
