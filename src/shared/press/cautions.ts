/** Cautions the press card always shows, whatever the recipe (the cut station has its own blade caution). */
export const PRESS_CAUTIONS: readonly string[] = [
  'Hot platen: it burns on contact. Keep hands, arms and cords clear of the upper platen, and let it cool before cleaning or changing platens.',
  'Pinch point: keep fingers out from between the platens while the press closes, and close it only with both hands on the handle or controls.',
  'Fumes: ventilate the press area when pressing coated, glitter or flock films at high heat, and stop if you smell burning.',
  "This card is a starting point: follow the film supplier's instructions and your local workplace safety rules, and press a test piece when in doubt.",
];

/** The press card's cautions, as a fresh list the caller may extend. */
export function pressCautions(): string[] {
  return [...PRESS_CAUTIONS];
}
