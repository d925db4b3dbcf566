import type { BagLabel } from './bag-label';
import { bagQrSvg } from './bag-qr';

const escapeXml = (text: string) =>
  text.replace(/[<>&"']/g, (c) => ({ '<': '&lt;', '>': '&gt;', '&': '&amp;', '"': '&quot;', "'": '&apos;' })[c]!);

/** One bag label as a 4 x 6 inch SVG (units are points: 288 x 432), the QR from qrcode's own SVG. */
export async function labelSvg(label: BagLabel): Promise<string> {
  const qr = await bagQrSvg(label.url);
  const qrInner = /<svg[^>]*viewBox="([^"]+)"[^>]*>([\s\S]*)<\/svg>/.exec(qr);
  const viewBox = qrInner?.[1] ?? '0 0 1 1';
  const lines: [string, number, boolean][] = [
    [label.customerName, 14, true],
    [`Due ${label.due}`, 11, true],
    [label.jobName, 10, false],
    [`Film: ${label.films}`, 10, false],
    [`Fabric: ${label.fabric} (${label.garment})`, 10, false],
    [`Placement: ${label.placement}`, 10, false],
    [`${label.pieces} pieces`, 12, true],
    [label.sizes, 11, false],
    [label.bagOf, 9, false],
  ];
  let y = 250;
  const text = lines
    .map(([content, size, bold]) => {
      y += size * 1.25;
      return `<text x="14" y="${y.toFixed(1)}" font-size="${size}"${bold ? ' font-weight="bold"' : ''}>${escapeXml(content)}</text>`;
    })
    .join('\n  ');
  return `<?xml version="1.0" encoding="UTF-8"?>
<svg xmlns="http://www.w3.org/2000/svg" width="4in" height="6in" viewBox="0 0 288 432" font-family="Helvetica, Arial, sans-serif">
  <rect width="288" height="432" fill="#fff"/>
  <text x="14" y="52" font-size="44" font-weight="bold">${escapeXml(label.code)}</text>
  <svg x="69" y="64" width="150" height="150" viewBox="${viewBox}" shape-rendering="crispEdges">${qrInner?.[2] ?? ''}</svg>
  ${text}
</svg>
`;
}
