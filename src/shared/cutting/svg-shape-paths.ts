import type { SvgElement } from './svg-element-tree';

/** The SVG shapes that carry cut lines. */
export const CUT_SHAPES = ['path', 'rect', 'circle', 'ellipse', 'line', 'polyline', 'polygon'] as const;

/**
 * Path data for a basic shape, following the equivalent paths of W3C SVG 1.1 section 9
 * ("Basic shapes"); undefined for a shape that draws nothing (zero size, too few points).
 */
export function shapeToPathData(element: SvgElement): string | undefined {
  const a = element.attributes;
  const num = (name: string, fallback = 0) => parseNumber(a[name], fallback);
  switch (element.name) {
    case 'path':
      return a['d']?.trim() || undefined;
    case 'rect':
      return rectPath(num('x'), num('y'), num('width'), num('height'), a['rx'], a['ry']);
    case 'circle':
      return ellipsePath(num('cx'), num('cy'), num('r'), num('r'));
    case 'ellipse':
      return ellipsePath(num('cx'), num('cy'), num('rx'), num('ry'));
    case 'line':
      return `M ${num('x1')} ${num('y1')} L ${num('x2')} ${num('y2')}`;
    case 'polyline':
    case 'polygon': {
      const values = (a['points'] ?? '').match(/[-+]?(?:\d+\.?\d*|\.\d+)(?:e[-+]?\d+)?/gi)?.map(Number) ?? [];
      if (values.length < 4) return undefined;
      const pairs: string[] = [];
      for (let i = 0; i + 1 < values.length; i += 2) pairs.push(`${values[i]} ${values[i + 1]}`);
      return `M ${pairs.join(' L ')}${element.name === 'polygon' ? ' Z' : ''}`;
    }
    default:
      return undefined;
  }
}

function rectPath(x: number, y: number, w: number, h: number, rxText?: string, ryText?: string): string | undefined {
  if (!(w > 0 && h > 0)) return undefined;
  // SVG 1.1 section 9.2: a missing rx takes ry and the other way round; each is capped at half the side.
  let rx = parseNumber(rxText ?? ryText, 0);
  let ry = parseNumber(ryText ?? rxText, 0);
  rx = Math.min(Math.max(rx, 0), w / 2);
  ry = Math.min(Math.max(ry, 0), h / 2);
  if (rx === 0 || ry === 0) return `M ${x} ${y} H ${x + w} V ${y + h} H ${x} Z`;
  return (
    `M ${x + rx} ${y} H ${x + w - rx} A ${rx} ${ry} 0 0 1 ${x + w} ${y + ry} V ${y + h - ry} ` +
    `A ${rx} ${ry} 0 0 1 ${x + w - rx} ${y + h} H ${x + rx} A ${rx} ${ry} 0 0 1 ${x} ${y + h - ry} ` +
    `V ${y + ry} A ${rx} ${ry} 0 0 1 ${x + rx} ${y} Z`
  );
}

function ellipsePath(cx: number, cy: number, rx: number, ry: number): string | undefined {
  if (!(rx > 0 && ry > 0)) return undefined;
  // Two half-ellipse arcs: a single arc cannot end where it starts.
  return `M ${cx - rx} ${cy} A ${rx} ${ry} 0 1 0 ${cx + rx} ${cy} A ${rx} ${ry} 0 1 0 ${cx - rx} ${cy} Z`;
}

function parseNumber(text: string | undefined, fallback: number): number {
  const value = text === undefined ? NaN : parseFloat(text);
  return Number.isFinite(value) ? value : fallback;
}
