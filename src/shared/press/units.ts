/**
 * Unit conversions for the press card. Dwell stores mm, °C and s; the card shows the shop's units
 * first and the other system beside them. Factors are the exact NIST SP 811 (2008) values.
 */

/** Millimetres in one inch: exact by definition (NIST SP 811, appendix B.8, "inch"). */
export const MM_PER_INCH = 25.4;
/** Square millimetres in one square inch: 25.4² exactly. */
export const MM2_PER_SQUARE_INCH = MM_PER_INCH * MM_PER_INCH;
/** Kilopascals in one pound-force per square inch (NIST SP 811, appendix B.8: 6.894 757 E+00). */
export const KPA_PER_PSI = 6.894757;
/** Newtons in one pound-force (NIST SP 811, appendix B.8: 4.448 222 E+00). */
export const NEWTONS_PER_LBF = 4.448222;
/** Fahrenheit degrees per Celsius degree: t/°F = 1.8 · t/°C + 32 (NIST SP 811, appendix B.8, "degree Fahrenheit"). */
export const FAHRENHEIT_PER_CELSIUS_DEGREE = 1.8;
/** The Fahrenheit reading at 0 °C. */
export const FAHRENHEIT_AT_ZERO_CELSIUS = 32;

/** The shop's choice of units for what people read (stored values stay metric). */
export type ShopUnits = 'imperial' | 'metric';

/** °C to °F. */
export function celsiusToFahrenheit(celsius: number): number {
  return celsius * FAHRENHEIT_PER_CELSIUS_DEGREE + FAHRENHEIT_AT_ZERO_CELSIUS;
}

/** °F to °C. */
export function fahrenheitToCelsius(fahrenheit: number): number {
  return (fahrenheit - FAHRENHEIT_AT_ZERO_CELSIUS) / FAHRENHEIT_PER_CELSIUS_DEGREE;
}

/** psi to kPa. */
export function psiToKpa(psi: number): number {
  return psi * KPA_PER_PSI;
}

/** kPa to psi. */
export function kpaToPsi(kpa: number): number {
  return kpa / KPA_PER_PSI;
}

/** Pound-force to newtons. */
export function lbfToNewtons(lbf: number): number {
  return lbf * NEWTONS_PER_LBF;
}

/** Newtons to pound-force. */
export function newtonsToLbf(newtons: number): number {
  return newtons / NEWTONS_PER_LBF;
}

/** Inches to millimetres. */
export function inchesToMm(inches: number): number {
  return inches * MM_PER_INCH;
}

/** Millimetres to inches. */
export function mmToInches(mm: number): number {
  return mm / MM_PER_INCH;
}

/** Rounds to a number of decimals for display; computations stay unrounded. */
export function roundTo(value: number, decimals: number): number {
  const factor = 10 ** decimals;
  return Math.round(value * factor) / factor;
}
