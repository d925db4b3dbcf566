import jsQR from 'jsqr';

/** Reads a QR code drawn by BagQr (its SVG path of modules) with jsQR, an independent decoder, at 4 px per module. */
export function readDrawnQr(svg: SVGSVGElement): string | null {
  const extent = Number(svg.getAttribute('viewBox')!.split(' ')[2]);
  const scale = 4;
  const side = extent * scale;
  const pixels = new Uint8ClampedArray(side * side * 4).fill(255);
  for (const [, x, y] of svg.querySelector('path')!.getAttribute('d')!.matchAll(/M(\d+) (\d+)/g)) {
    for (let dy = 0; dy < scale; dy++) {
      for (let dx = 0; dx < scale; dx++) {
        const offset = ((Number(y) * scale + dy) * side + Number(x) * scale + dx) * 4;
        pixels[offset] = pixels[offset + 1] = pixels[offset + 2] = 0;
      }
    }
  }
  return jsQR(pixels, side, side)?.data ?? null;
}
