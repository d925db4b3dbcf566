/** A design's printed size in millimetres. */
export interface DesignSizeMm {
  widthMm: number;
  heightMm: number;
}

const MM_PER_INCH = 25.4; // exact, by definition of the inch (NIST SP 811, appendix B)
/** Millimetres per unit of an SVG length; CSS fixes 96 px and 72 pt to the inch (CSS Values and Units, absolute lengths). */
const MM_PER_UNIT: Record<string, number> = {
  mm: 1,
  cm: 10,
  q: 0.25,
  in: MM_PER_INCH,
  pt: MM_PER_INCH / 72,
  pc: MM_PER_INCH / 6,
  px: MM_PER_INCH / 96,
  '': MM_PER_INCH / 96, // a bare SVG number is in user units, one CSS px each
};

const round = (mm: number) => Math.round(mm * 10) / 10;

/** An SVG length in mm, or null for a percentage, an unknown unit or nonsense. */
export function svgLengthToMm(value: string | undefined): number | null {
  if (value === undefined) return null;
  const match = /^\s*([+]?(?:\d+\.?\d*|\.\d+)(?:e[+-]?\d+)?)\s*([a-z]*)\s*$/i.exec(value);
  if (!match) return null;
  const perUnit = MM_PER_UNIT[match[2]!.toLowerCase()];
  const number = Number(match[1]);
  return perUnit === undefined || !(number > 0) ? null : number * perUnit;
}

function rootSvgAttributes(svg: string): Record<string, string> | null {
  const tag = /<svg\b([^>]*)>/i.exec(svg);
  if (!tag) return null;
  const attributes: Record<string, string> = {};
  for (const match of tag[1]!.matchAll(/([\w:.-]+)\s*=\s*(?:"([^"]*)"|'([^']*)')/g)) {
    attributes[match[1]!] = match[2] ?? match[3] ?? '';
  }
  return attributes;
}

/**
 * An SVG's size in mm from its root width and height (mm, cm, in, pt, pc, px, bare numbers as px),
 * filling a missing or percentage side from the viewBox's aspect ratio, or from the viewBox alone
 * (user units as px). Null when the file says nothing usable.
 */
export function svgSizeMm(svg: string): DesignSizeMm | null {
  const attributes = rootSvgAttributes(svg);
  if (!attributes) return null;
  const width = svgLengthToMm(attributes['width']);
  const height = svgLengthToMm(attributes['height']);
  const box = (attributes['viewBox'] ?? attributes['viewbox'] ?? '').trim().split(/[\s,]+/).map(Number);
  const boxOk = box.length === 4 && box.every(Number.isFinite) && box[2]! > 0 && box[3]! > 0;
  const boxWidth = boxOk ? box[2]! : null;
  const boxHeight = boxOk ? box[3]! : null;

  if (width !== null && height !== null) return { widthMm: round(width), heightMm: round(height) };
  if (boxWidth !== null && boxHeight !== null) {
    if (width !== null) return { widthMm: round(width), heightMm: round((width * boxHeight) / boxWidth) };
    if (height !== null) return { widthMm: round((height * boxWidth) / boxHeight), heightMm: round(height) };
    return { widthMm: round(boxWidth * MM_PER_UNIT['px']!), heightMm: round(boxHeight * MM_PER_UNIT['px']!) };
  }
  return null;
}

const PNG_SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];

/** A PNG's pixel size from its IHDR chunk (PNG specification, ISO/IEC 15948, 11.2.2), or null if not a PNG. */
export function pngPixelSize(bytes: Uint8Array): { width: number; height: number } | null {
  if (bytes.length < 24 || PNG_SIGNATURE.some((b, i) => bytes[i] !== b)) return null;
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  if (String.fromCharCode(...bytes.subarray(12, 16)) !== 'IHDR') return null;
  return { width: view.getUint32(16), height: view.getUint32(20) };
}

/** Pixels per metre from a PNG's pHYs chunk when its unit is the metre (ISO/IEC 15948, 11.3.5.3), else null. */
export function pngPixelsPerMetre(bytes: Uint8Array): { x: number; y: number } | null {
  if (!pngPixelSize(bytes)) return null;
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  for (let offset = 8; offset + 12 <= bytes.length; ) {
    const length = view.getUint32(offset);
    const type = String.fromCharCode(...bytes.subarray(offset + 4, offset + 8));
    if (type === 'pHYs' && length >= 9 && offset + 17 <= bytes.length) {
      const x = view.getUint32(offset + 8);
      const y = view.getUint32(offset + 12);
      const unitIsMetre = bytes[offset + 16] === 1;
      return unitIsMetre && x > 0 && y > 0 ? { x, y } : null;
    }
    if (type === 'IDAT' || type === 'IEND') return null; // pHYs must come before the image data
    offset += 12 + length;
  }
  return null;
}

/** A PNG's printed size in mm from its pixels and pHYs resolution; null without a pHYs in metres. */
export function pngSizeMm(bytes: Uint8Array): DesignSizeMm | null {
  const pixels = pngPixelSize(bytes);
  const perMetre = pngPixelsPerMetre(bytes);
  if (!pixels || !perMetre) return null;
  return { widthMm: round((pixels.width / perMetre.x) * 1000), heightMm: round((pixels.height / perMetre.y) * 1000) };
}
