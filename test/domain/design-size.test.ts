import { PNG } from 'pngjs';
import { pngSizeMm, svgSizeMm } from '../../src/shared/intake/design-size';

const svg = (attributes: string) => `<?xml version="1.0"?><svg xmlns="http://www.w3.org/2000/svg" ${attributes}><rect width="1" height="1"/></svg>`;

/** Inserts a pHYs chunk (ISO/IEC 15948, 11.3.5.3) after IHDR; its CRC is left 0 because the size reader does not check CRCs. */
function withPhys(png: Buffer, perMetreX: number, perMetreY: number, unit: number): Buffer {
  const chunk = Buffer.alloc(21);
  chunk.writeUInt32BE(9, 0);
  chunk.write('pHYs', 4, 'latin1');
  chunk.writeUInt32BE(perMetreX, 8);
  chunk.writeUInt32BE(perMetreY, 12);
  chunk.writeUInt8(unit, 16);
  const ihdrEnd = 8 + 12 + 13;
  return Buffer.concat([png.subarray(0, ihdrEnd), chunk, png.subarray(ihdrEnd)]);
}

describe('reading a design size from an SVG', () => {
  it('reads millimetres, centimetres and inches', () => {
    expect(svgSizeMm(svg('width="120mm" height="8cm"'))).toEqual({ widthMm: 120, heightMm: 80 });
    // 1 in = 25.4 mm exactly (NIST SP 811, appendix B): 10 in = 254 mm, 2.5 in = 63.5 mm.
    expect(svgSizeMm(svg('width="10in" height="2.5in"'))).toEqual({ widthMm: 254, heightMm: 63.5 });
  });

  it('reads px and bare numbers at 96 per inch and pt at 72 per inch', () => {
    // CSS Values and Units Level 3, absolute lengths: 1in = 96px = 72pt. 960 px = 10 in = 254 mm; 144 pt = 2 in = 50.8 mm.
    expect(svgSizeMm(svg('width="960px" height="144pt"'))).toEqual({ widthMm: 254, heightMm: 50.8 });
    expect(svgSizeMm(svg('width="96" height="48"'))).toEqual({ widthMm: 25.4, heightMm: 12.7 });
  });

  it('falls back to the viewBox in user units (px) and fills one missing side from its ratio', () => {
    expect(svgSizeMm(svg('viewBox="0 0 480 240"'))).toEqual({ widthMm: 127, heightMm: 63.5 }); // 480/96 in = 5 in
    expect(svgSizeMm(svg('width="200mm" viewBox="0 0 400 100"'))).toEqual({ widthMm: 200, heightMm: 50 });
    expect(svgSizeMm(svg('width="100%" height="100%" viewBox="0 0 96 96"'))).toEqual({ widthMm: 25.4, heightMm: 25.4 });
  });

  it('answers null when the SVG gives no size', () => {
    expect(svgSizeMm(svg('width="100%"'))).toBeNull();
    expect(svgSizeMm('not an svg')).toBeNull();
  });
});

describe('reading a design size from a PNG', () => {
  const png = PNG.sync.write(new PNG({ width: 1181, height: 591 }));

  it('uses pHYs pixels per metre', () => {
    // 300 dpi = 300 / 0.0254 = 11811.02 px/m; PNG stores whole numbers: 11811. 1181 px / 11811 px/m = 99.99 mm.
    expect(pngSizeMm(withPhys(png, 11811, 11811, 1))).toEqual({ widthMm: 100, heightMm: 50 });
  });

  it('answers null without pHYs or when pHYs gives only an aspect ratio', () => {
    expect(pngSizeMm(png)).toBeNull();
    expect(pngSizeMm(withPhys(png, 1, 1, 0))).toBeNull();
    expect(pngSizeMm(new Uint8Array([1, 2, 3]))).toBeNull();
  });
});
