import { PDFDocument, StandardFonts, rgb, type PDFFont, type PDFImage, type PDFPage } from 'pdf-lib';
import type { BagLabel } from './bag-label';
import { bagQrPng } from './bag-qr';
import { toWinAnsi } from './winansi-text';

/** The label stocks Dwell prints on. */
export const LABEL_STOCKS = ['4x6', 'a4', 'letter'] as const;
export type LabelStock = (typeof LABEL_STOCKS)[number];

const POINTS_PER_INCH = 72; // PDF user space unit (PDF 32000-1:2008, 8.3.2.3)
const MM = POINTS_PER_INCH / 25.4;

// A 4 x 6 inch thermal label holds one; A4 and Letter sheets hold a 2 x 2 grid of about 4 x 6 inches.
const SHEETS: Record<LabelStock, { width: number; height: number; columns: number; rows: number; cutLines: boolean }> = {
  '4x6': { width: 4 * POINTS_PER_INCH, height: 6 * POINTS_PER_INCH, columns: 1, rows: 1, cutLines: false },
  a4: { width: 210 * MM, height: 297 * MM, columns: 2, rows: 2, cutLines: true },
  letter: { width: 8.5 * POINTS_PER_INCH, height: 11 * POINTS_PER_INCH, columns: 2, rows: 2, cutLines: true },
};

interface Fonts {
  regular: PDFFont;
  bold: PDFFont;
}

/** Shortens text with an ellipsis until it fits the width. */
function fit(text: string, font: PDFFont, size: number, width: number): string {
  let out = toWinAnsi(text);
  if (font.widthOfTextAtSize(out, size) <= width) return out;
  while (out.length > 1 && font.widthOfTextAtSize(`${out}…`, size) > width) out = out.slice(0, -1);
  return `${out.trimEnd()}…`;
}

/** Breaks text into at most `maxLines` lines that fit the width; the last one is shortened if needed. */
function wrap(text: string, font: PDFFont, size: number, width: number, maxLines: number): string[] {
  const words = toWinAnsi(text).split(/\s+/).filter(Boolean);
  const lines: string[] = [];
  let line = '';
  for (const word of words) {
    const candidate = line ? `${line} ${word}` : word;
    if (font.widthOfTextAtSize(candidate, size) <= width || !line) line = candidate;
    else {
      lines.push(line);
      line = word;
    }
  }
  if (line) lines.push(line);
  if (lines.length <= maxLines) return lines;
  return [...lines.slice(0, maxLines - 1), fit(lines.slice(maxLines - 1).join(' '), font, size, width)];
}

function drawLabel(page: PDFPage, label: BagLabel, qr: PDFImage, fonts: Fonts, box: { x: number; y: number; width: number; height: number }): void {
  const pad = 14;
  const inner = box.width - 2 * pad;
  const ink = rgb(0, 0, 0);
  let top = box.y + box.height - pad;

  // The bag code, as large as fits: people read it across the floor.
  const codeSize = Math.min(52, (inner / fonts.bold.widthOfTextAtSize(label.code, 10)) * 10);
  top -= codeSize * 0.8;
  page.drawText(toWinAnsi(label.code), { x: box.x + pad, y: top, size: codeSize, font: fonts.bold, color: ink });
  top -= 10;

  const qrSize = Math.min(inner, box.height * 0.4);
  top -= qrSize;
  page.drawImage(qr, { x: box.x + (box.width - qrSize) / 2, y: top, width: qrSize, height: qrSize });
  top -= 6;

  const line = (text: string, size: number, bold = false) => {
    top -= size * 1.2;
    page.drawText(fit(text, bold ? fonts.bold : fonts.regular, size, inner), { x: box.x + pad, y: top, size, font: bold ? fonts.bold : fonts.regular, color: ink });
  };
  line(label.customerName, 14, true);
  line(`Due ${label.due}`, 11, true);
  line(label.jobName, 10);
  line(`Film: ${label.films}`, 10);
  line(`Fabric: ${label.fabric} (${label.garment})`, 10);
  line(`Placement: ${label.placement}`, 10);
  line(`${label.pieces} pieces`, 12, true);
  for (const sizesLine of wrap(label.sizes, fonts.regular, 11, inner, 2)) line(sizesLine, 11);
  line(label.bagOf, 9);
}

/** One PDF with a label per bag: one per page on 4 x 6 in stock, four per sheet on A4 or Letter. */
export async function labelsPdf(labels: BagLabel[], stock: LabelStock): Promise<Uint8Array> {
  const sheet = SHEETS[stock];
  const pdf = await PDFDocument.create();
  pdf.setTitle(labels.length ? `Bag labels ${labels[0]!.code.replace(/-[A-Z]+$/, '')}` : 'Bag labels');
  pdf.setCreator('Dwell');
  const fonts = { regular: await pdf.embedFont(StandardFonts.Helvetica), bold: await pdf.embedFont(StandardFonts.HelveticaBold) };
  const perPage = sheet.columns * sheet.rows;
  const cellWidth = sheet.width / sheet.columns;
  const cellHeight = sheet.height / sheet.rows;
  let page: PDFPage | null = null;
  for (const [i, label] of labels.entries()) {
    const slot = i % perPage;
    if (slot === 0) page = pdf.addPage([sheet.width, sheet.height]);
    const column = slot % sheet.columns;
    const row = Math.floor(slot / sheet.columns);
    const box = { x: column * cellWidth, y: sheet.height - (row + 1) * cellHeight, width: cellWidth, height: cellHeight };
    if (sheet.cutLines) page!.drawRectangle({ ...box, borderColor: rgb(0.7, 0.7, 0.7), borderWidth: 0.5, borderDashArray: [3, 3] });
    drawLabel(page!, label, await pdf.embedPng(await bagQrPng(label.url)), fonts, box);
  }
  if (labels.length === 0) {
    const empty = pdf.addPage([sheet.width, sheet.height]);
    empty.drawText('This order has no bags yet. Split its jobs into bags first.', { x: 20, y: sheet.height - 40, size: 11, font: fonts.regular });
  }
  return pdf.save();
}
