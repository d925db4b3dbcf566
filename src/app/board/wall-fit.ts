/** Smallest type scale a wall display goes down to: below it the numbers stop reading across a room. */
export const WALL_MIN_SCALE = 0.7;
// A view grows back only when it leaves this share of the screen empty, and then aims to leave half
// of it: a view that has just been fitted never qualifies to grow, so the size settles, never flips.
const SPARE_TO_GROW = 0.12;

/**
 * The next type scale for a wall view whose content is `contentPx` tall in a box `boxPx` tall:
 * smaller in proportion while it overflows, larger again only with clear room to spare.
 * Content does not grow quite in proportion (fixed gaps, chart fonts), so a view may take a second step.
 */
export function nextWallScale(scale: number, contentPx: number, boxPx: number): number {
  // Nothing laid out yet (or no layout engine at all): nothing to go by.
  if (boxPx <= 0 || contentPx <= 0) return scale;
  if (contentPx > boxPx + 1) return Math.max(WALL_MIN_SCALE, roundDown(scale * (boxPx / contentPx)));
  if (scale < 1 && contentPx <= boxPx * (1 - SPARE_TO_GROW)) {
    return Math.min(1, roundDown(scale * ((boxPx * (1 - SPARE_TO_GROW / 2)) / contentPx)));
  }
  return scale;
}

/** Height the children of `box` take, from its top to the lowest child's bottom edge. */
export function contentHeight(box: Element): number {
  const top = box.getBoundingClientRect().top;
  let bottom = top;
  for (const child of Array.from(box.children)) bottom = Math.max(bottom, child.getBoundingClientRect().bottom);
  return bottom - top;
}

// Down, to the hundredth: a scale that just fits must not round up into an overflow.
function roundDown(scale: number): number {
  return Math.floor(scale * 100 + 1e-9) / 100;
}
