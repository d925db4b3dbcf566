import { celsiusToFahrenheit, lbfToNewtons, mmToInches, psiToKpa, roundTo, type ShopUnits } from './units';

/** A value as the card shows it: the shop's units large, the other system in smaller type. */
export interface DualReading {
  primary: string;
  secondary: string;
}

function pair(units: ShopUnits, imperial: string, metric: string): DualReading {
  return units === 'imperial' ? { primary: imperial, secondary: metric } : { primary: metric, secondary: imperial };
}

/** A temperature stored in °C, in whole degrees both ways. */
export function temperatureReading(celsius: number, units: ShopUnits): DualReading {
  return pair(units, `${Math.round(celsiusToFahrenheit(celsius))} °F`, `${Math.round(celsius)} °C`);
}

/** A pressure given in psi; kPa get one decimal fewer places than psi since a kPa is about 1/7 psi. */
export function pressureReading(psi: number, units: ShopUnits, psiDecimals = 1): DualReading {
  return pair(units, `${roundTo(psi, psiDecimals)} psi`, `${roundTo(psiToKpa(psi), Math.max(0, psiDecimals - 1))} kPa`);
}

/** A force given in lbf. */
export function forceReading(lbf: number, units: ShopUnits): DualReading {
  return pair(units, `${Math.round(lbf)} lbf`, `${Math.round(lbfToNewtons(lbf))} N`);
}

/** A length stored in mm; inches to a tenth. */
export function lengthReading(mm: number, units: ShopUnits): DualReading {
  return pair(units, `${roundTo(mmToInches(mm), 1)} in`, `${Math.round(mm)} mm`);
}
