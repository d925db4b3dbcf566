import fc from 'fast-check';
import {
  celsiusToFahrenheit,
  fahrenheitToCelsius,
  inchesToMm,
  KPA_PER_PSI,
  kpaToPsi,
  lbfToNewtons,
  MM_PER_INCH,
  mmToInches,
  NEWTONS_PER_LBF,
  newtonsToLbf,
  psiToKpa,
} from '../../src/shared/press/units';
import { temperatureReading } from '../../src/shared/press/dual-units';

describe('unit conversions against NIST SP 811 (2008)', () => {
  it('converts temperatures with t/°F = 1.8 · t/°C + 32', () => {
    // NIST SP 811 (2008), appendix B.8 ("degree Fahrenheit") and B.9 (temperature): t/°C = (t/°F − 32)/1.8
    expect(celsiusToFahrenheit(0)).toBe(32);
    expect(celsiusToFahrenheit(100)).toBe(212);
    expect(celsiusToFahrenheit(-40)).toBe(-40); // the one reading the two scales share
    expect(celsiusToFahrenheit(150)).toBe(302); // 150 · 1.8 = 270, + 32 = 302
    expect(fahrenheitToCelsius(320)).toBeCloseTo(160, 10); // (320 − 32) / 1.8 = 288 / 1.8 = 160
  });

  it('uses 1 psi = 6.894 757 kPa and agrees with the definition of the psi', () => {
    // NIST SP 811 (2008), appendix B.8: pound-force per square inch (psi) to kilopascal (kPa), 6.894 757 E+00
    expect(KPA_PER_PSI).toBe(6.894757);
    expect(psiToKpa(1)).toBe(6.894757);
    // Independent derivation from exact definitions (NIST SP 811 B.8: lb = 0.453 592 37 kg, standard
    // acceleration of gravity 9.806 65 m/s², in = 0.0254 m): 1 lbf/in² = 4.448 221 615 N / 0.000 645 16 m² = 6894.757 Pa.
    const pascalsPerPsi = (0.45359237 * 9.80665) / 0.0254 ** 2;
    expect(psiToKpa(1)).toBeCloseTo(pascalsPerPsi / 1000, 6);
    // NIST SP 811 (2008), appendix B.8: standard atmosphere = 101.325 kPa exactly, which is 14.695 95 psi.
    expect(kpaToPsi(101.325)).toBeCloseTo(14.69595, 4);
  });

  it('uses 1 lbf = 4.448 222 N and agrees with the definition of the pound-force', () => {
    // NIST SP 811 (2008), appendix B.8: pound-force (lbf) to newton (N), 4.448 222 E+00
    expect(NEWTONS_PER_LBF).toBe(4.448222);
    expect(lbfToNewtons(1)).toBe(4.448222);
    // Independent derivation: 1 lbf = 0.453 592 37 kg x 9.806 65 m/s² = 4.448 221 615 N (both exact, NIST SP 811 B.8).
    expect(lbfToNewtons(1)).toBeCloseTo(0.45359237 * 9.80665, 6);
    expect(newtonsToLbf(9.80665)).toBeCloseTo(2.204623, 5); // 1 kgf in lbf, 1 / 0.453 592 37
  });

  it('uses 1 in = 25.4 mm exactly', () => {
    // NIST SP 811 (2008), appendix B.8: inch (in) to meter (m), 2.54 E-02 exactly
    expect(MM_PER_INCH).toBe(25.4);
    expect(inchesToMm(15)).toBeCloseTo(381, 10);
    expect(mmToInches(406.4)).toBeCloseTo(16, 10);
  });

  it('comes back to where it started after converting there and back', () => {
    const finite = fc.double({ min: -1e6, max: 1e6, noNaN: true });
    fc.assert(
      fc.property(finite, (x) => {
        expect(fahrenheitToCelsius(celsiusToFahrenheit(x))).toBeCloseTo(x, 6);
        expect(kpaToPsi(psiToKpa(x))).toBeCloseTo(x, 6);
        expect(newtonsToLbf(lbfToNewtons(x))).toBeCloseTo(x, 6);
        expect(mmToInches(inchesToMm(x))).toBeCloseTo(x, 6);
      }),
    );
  });

  it("shows the shop's units first and the other system second", () => {
    expect(temperatureReading(150, 'imperial')).toEqual({ primary: '302 °F', secondary: '150 °C' });
    expect(temperatureReading(150, 'metric')).toEqual({ primary: '150 °C', secondary: '302 °F' });
  });
});
