import { MM_PER_INCH, type LengthUnit } from './length-units';
import type { Placement } from './gang-layout-types';

/** What the preview needs to draw a layout at its real proportions (all mm). */
export interface PreviewInput {
  placements: readonly Placement[];
  rollWidthMm: number;
  lengthUsedMm: number;
  edgeMarginMm: number;
  trailingMarginMm: number;
  weedingBorderMm: number;
  rulerUnit: LengthUnit;
}

/** The ruler's tick spacing: one inch, or 100 mm. */
export function rulerStepMm(unit: LengthUnit): number {
  return unit === 'in' ? MM_PER_INCH : 100;
}

/**
 * An SVG preview in millimetre user units: the roll with its edges, the edge and trailing margins
 * shaded, every piece outlined with its design box dashed inside and its label, and a ruler along
 * the length. The app sizes it with CSS; the viewBox keeps the proportions true.
 */
export function layoutPreviewSvg(input: PreviewInput): string {
  const { rollWidthMm: width, lengthUsedMm: length } = input;
  const rulerBand = Math.max(20, width * 0.08);
  const fontSize = Math.max(4, Math.min(width, length) / 40);
  const parts: string[] = [];
  parts.push(
    `<svg xmlns="http://www.w3.org/2000/svg" viewBox="${n(-rulerBand)} 0 ${n(width + rulerBand)} ${n(length)}" ` +
      `role="img" aria-label="Gang layout: ${input.placements.length} pieces on ${n(length)} mm of film">`,
  );
  parts.push(`<rect class="roll" x="0" y="0" width="${n(width)}" height="${n(length)}" fill="#f6f3ec" stroke="#2b2b2b" stroke-width="0.8"/>`);
  const margin = input.edgeMarginMm;
  const marginStyle = 'fill="#d9d4c7" stroke="none"';
  parts.push(`<rect class="margin" x="0" y="0" width="${n(margin)}" height="${n(length)}" ${marginStyle}/>`);
  parts.push(`<rect class="margin" x="${n(width - margin)}" y="0" width="${n(margin)}" height="${n(length)}" ${marginStyle}/>`);
  parts.push(
    `<rect class="margin" x="0" y="${n(length - input.trailingMarginMm)}" width="${n(width)}" height="${n(input.trailingMarginMm)}" ${marginStyle}/>`,
  );
  for (const p of input.placements) parts.push(pieceMarkup(p, input.weedingBorderMm, fontSize));
  parts.push(rulerMarkup(length, rulerBand, fontSize, input.rulerUnit));
  parts.push('</svg>');
  return parts.join('\n');
}

function pieceMarkup(p: Placement, border: number, fontSize: number): string {
  const label = escapeXml(p.label);
  const designWidth = Math.max(0, p.width - 2 * border);
  const designHeight = Math.max(0, p.height - 2 * border);
  const size = Math.min(fontSize, p.height / 3, p.width / 4);
  return (
    `<g class="piece" data-piece="${escapeXml(p.pieceId)}"><title>${label}${p.rotated ? ' (turned)' : ''}</title>` +
    `<rect x="${n(p.x)}" y="${n(p.y)}" width="${n(p.width)}" height="${n(p.height)}" fill="#ffffff" stroke="#1d4e89" stroke-width="0.6"/>` +
    `<rect x="${n(p.x + border)}" y="${n(p.y + border)}" width="${n(designWidth)}" height="${n(designHeight)}" fill="none" stroke="#1d4e89" stroke-width="0.3" stroke-dasharray="2 1.5"/>` +
    `<text x="${n(p.x + p.width / 2)}" y="${n(p.y + p.height / 2)}" font-size="${n(size)}" text-anchor="middle" dominant-baseline="middle" fill="#111">${label}</text></g>`
  );
}

function rulerMarkup(length: number, band: number, fontSize: number, unit: LengthUnit): string {
  const step = rulerStepMm(unit);
  const ticks: string[] = [`<g class="ruler" stroke="#2b2b2b" stroke-width="0.4" font-size="${n(fontSize * 0.8)}">`];
  ticks.push(`<line x1="${n(-2)}" y1="0" x2="${n(-2)}" y2="${n(length)}"/>`);
  for (let i = 0, y = 0; y <= length + 1e-9; i++, y = i * step) {
    const major = unit === 'mm' || i % 12 === 0; // a longer tick every foot
    ticks.push(`<line x1="${n(major ? -band * 0.45 : -band * 0.3)}" y1="${n(y)}" x2="${n(-2)}" y2="${n(y)}"/>`);
    const text = unit === 'in' ? `${i} in` : `${i * 100}`;
    ticks.push(`<text x="${n(-band * 0.5)}" y="${n(y)}" text-anchor="end" dominant-baseline="middle" stroke="none" fill="#2b2b2b">${text}</text>`);
  }
  ticks.push('</g>');
  return ticks.join('\n');
}

/** Rounds user units to a hundredth of a millimetre so the markup stays short. */
function n(value: number): string {
  return String(Math.round(value * 100) / 100);
}

function escapeXml(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;').replace(/'/g, '&#39;');
}
