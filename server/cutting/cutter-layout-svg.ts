import type { Placement } from '../../src/shared/cutting/gang-layout-types';

/**
 * The layout as a plain SVG for the cutter's own software: millimetre width and height, a viewBox in
 * millimetres, one rectangle outline per piece at its place on the roll, and nothing else (no text,
 * which a cutter would cut, and no scripts). x runs across the roll, y along it.
 */
export function cutterLayoutSvg(placements: readonly Placement[], rollWidthMm: number, lengthMm: number): string {
  const n = (value: number) => String(Math.round(value * 100) / 100);
  const lines = [
    '<?xml version="1.0" encoding="UTF-8"?>',
    `<svg xmlns="http://www.w3.org/2000/svg" width="${n(rollWidthMm)}mm" height="${n(lengthMm)}mm" viewBox="0 0 ${n(rollWidthMm)} ${n(lengthMm)}">`,
  ];
  placements.forEach((p, i) => {
    const id = `piece-${i + 1}-${p.pieceId.replace(/[^A-Za-z0-9_-]/g, '_')}`;
    lines.push(`  <rect id="${id}" x="${n(p.x)}" y="${n(p.y)}" width="${n(p.width)}" height="${n(p.height)}" fill="none" stroke="#000000" stroke-width="0.1"/>`);
  });
  lines.push('</svg>', '');
  return lines.join('\n');
}
