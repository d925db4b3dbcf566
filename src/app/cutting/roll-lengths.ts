import { MM_PER_INCH, MM_PER_YARD } from '../../shared/cutting/length-units';

/** How the shop reads lengths until a shop settings screen exists: the hub's `units` from the preview, or this. */
export const DEFAULT_SHOP_UNITS: 'imperial' | 'metric' = 'imperial';

/** A length for people: the shop's unit large, millimetres small. */
export interface ShownLength {
  main: string;
  mm: string;
}

/** Film along the roll: yards (or inches under a yard) for an imperial shop, metres for a metric one. */
export function showRollLength(mm: number, units: 'imperial' | 'metric' = DEFAULT_SHOP_UNITS): ShownLength {
  const mmText = `${Math.round(mm).toLocaleString('en')} mm`;
  if (units === 'metric') return { main: `${(mm / 1000).toFixed(2)} m`, mm: mmText };
  if (mm >= MM_PER_YARD) return { main: `${(mm / MM_PER_YARD).toFixed(2)} yd`, mm: mmText };
  return { main: `${(mm / MM_PER_INCH).toFixed(1)} in`, mm: mmText };
}

/** A width across the roll: inches for an imperial shop, millimetres otherwise. */
export function showWidth(mm: number, units: 'imperial' | 'metric' = DEFAULT_SHOP_UNITS): string {
  return units === 'imperial' ? `${Number((mm / MM_PER_INCH).toFixed(1))} in (${Math.round(mm)} mm)` : `${Math.round(mm)} mm`;
}
