import QRCode from 'qrcode';

/** The address a bag's QR code holds: the hub's Bag scan page for that token. */
export const bagUrl = (origin: string, token: string) => `${origin.replace(/\/+$/, '')}/bag/${token}`;

// Medium error correction survives a scuffed or creased label (about 15% of the code, ISO/IEC 18004).
const QR_OPTIONS = { errorCorrectionLevel: 'M', margin: 4 } as const;

/** The bag's QR code as a PNG, as the PDF labels embed it. */
export function bagQrPng(url: string): Promise<Buffer> {
  return QRCode.toBuffer(url, { ...QR_OPTIONS, type: 'png', scale: 8 });
}

/** The bag's QR code as an SVG document. */
export function bagQrSvg(url: string): Promise<string> {
  return QRCode.toString(url, { ...QR_OPTIONS, type: 'svg' });
}
