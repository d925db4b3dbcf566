import type { OrderStatus, Placement } from '../../shared/intake-contract';
import type { BagStage } from '../../shared/names';

/**
 * The unit the shop measures designs in. There is no shop-settings API yet, so this is fixed to
 * inches (with millimetres beside them) until the owner can choose.
 */
export const SHOP_LENGTH_UNIT = 'in' as const;

// 1 in = 25.4 mm exactly (NIST SP 811, appendix B.8).
const MM_PER_INCH = 25.4;

/** Millimetres as inches. */
export function inchesFromMm(mm: number): number {
  return mm / MM_PER_INCH;
}

/** Inches as millimetres. */
export function mmFromInches(inches: number): number {
  return inches * MM_PER_INCH;
}

/** A length in the shop's unit for display, e.g. "3.50 in". */
export function shopLength(mm: number): string {
  return `${inchesFromMm(mm).toFixed(2)} in`;
}

/** What each placement is called on screen. */
export const PLACEMENT_LABELS: Readonly<Record<Placement, string>> = {
  left_chest: 'Left chest',
  full_front: 'Full front',
  full_back: 'Full back',
  sleeve: 'Sleeve',
  nape: 'Nape',
  custom: 'Custom',
};

/** What each order status is called on screen. */
export const STATUS_LABELS: Readonly<Record<OrderStatus, string>> = {
  open: 'Open',
  ready: 'Ready',
  collected: 'Collected',
  cancelled: 'Cancelled',
};

/** What each bag stage is called on screen. */
export const STAGE_LABELS: Readonly<Record<BagStage, string>> = {
  queued: 'Queued',
  cut: 'Cut',
  weeded: 'Weeded',
  pressed: 'Pressed',
  packed: 'Packed',
};

/** How a due time stands against `now`: past due, due later today, or later. */
export function dueFlag(dueAt: string, now: Date): 'overdue' | 'today' | null {
  const due = new Date(dueAt);
  if (due.getTime() < now.getTime()) return 'overdue';
  const sameDay =
    due.getFullYear() === now.getFullYear() && due.getMonth() === now.getMonth() && due.getDate() === now.getDate();
  return sameDay ? 'today' : null;
}

/**
 * The widest a design usually runs at each placement on an adult garment, for checking roster
 * names (common practice, no published source). A custom placement uses the design's own width.
 */
export const PLACEMENT_MAX_WIDTH_MM: Readonly<Record<Exclude<Placement, 'custom'>, number>> = {
  left_chest: 101.6, // 4 in
  full_front: 304.8, // 12 in
  full_back: 304.8, // 12 in
  sleeve: 88.9, // 3.5 in
  nape: 76.2, // 3 in
};

/** Degrees Celsius as whole degrees Fahrenheit (NIST SP 811, B.8: t/°F = 1.8 t/°C + 32). */
export function fahrenheitFromCelsius(celsius: number): number {
  return Math.round(celsius * 1.8 + 32);
}
