import jsQR from 'jsqr';
import { PDFDocument } from 'pdf-lib';
import { PNG } from 'pngjs';
import { bagQrPng, bagUrl } from '../../server/labels/bag-qr';
import { toWinAnsi } from '../../server/labels/winansi-text';
import { signedInPerson, testApp } from './support/test-hub';

const hub = testApp({ PUBLIC_URL: 'http://hub.bramble.example:4380' });
let lead: Awaited<ReturnType<typeof signedInPerson>>;
beforeAll(async () => {
  lead = await signedInPerson(hub.app, 'lead');
}, 30_000);
afterAll(() => hub.close());
// Drawing QR PNGs runs about 25 times slower inside jest's sandbox than in the hub itself (1.3 s against 50 ms).
jest.setTimeout(120_000);

/** Decodes a QR code from a PNG with jsQR, a decoder independent of the qrcode encoder (ISO/IEC 18004 is the QR standard). */
function decodeQr(png: Buffer): string | null {
  const image = PNG.sync.read(png);
  return jsQR(new Uint8ClampedArray(image.data), image.width, image.height)?.data ?? null;
}

async function choirOrder() {
  const order = await hub.db('orders').join('customers', 'customers.id', 'orders.customer_id').where('customers.name', 'Hollinford Riverside Choir').first('orders.id', 'orders.code');
  const bags = await hub.db('bags').where({ order_id: order!.id }).orderBy('id');
  return { order: order!, bags };
}

describe('bag labels', () => {
  it('puts a QR on each label that decodes back to the bag URL', async () => {
    const { bags } = await choirOrder();
    const url = bagUrl('http://hub.bramble.example:4380', bags[0]!.token);
    expect(decodeQr(await bagQrPng(url))).toBe(url);
  });

  it('prints one 4 x 6 inch page per bag, and four labels per A4 or Letter sheet', async () => {
    const { order, bags } = await choirOrder();
    const fetchPdf = async (stock: string) => {
      const res = await lead.get(`/api/orders/${order.id}/labels.pdf?stock=${stock}`).buffer(true).parse((r, done) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => done(null, Buffer.concat(chunks)));
      }).expect(200);
      expect(res.headers['content-type']).toBe('application/pdf');
      return PDFDocument.load(res.body as Buffer);
    };
    const label = await fetchPdf('4x6');
    expect(label.getPageCount()).toBe(bags.length);
    // 4 x 6 in at 72 points per inch (PDF 32000-1:2008, 8.3.2.3) = 288 x 432 pt.
    expect(label.getPage(0).getSize()).toEqual({ width: 288, height: 432 });
    const a4 = await fetchPdf('a4');
    expect(a4.getPageCount()).toBe(Math.ceil(bags.length / 4));
    // A4 is 210 x 297 mm (ISO 216) = 595.28 x 841.89 pt.
    expect(a4.getPage(0).getWidth()).toBeCloseTo(595.28, 1);
    expect(a4.getPage(0).getHeight()).toBeCloseTo(841.89, 1);
    await lead.get(`/api/orders/${order.id}/labels.pdf?stock=a3`).expect(400);
  });

  it('gives one bag label as SVG with its code and a QR drawing', async () => {
    const { bags } = await choirOrder();
    const res = await lead.get(`/api/bags/${bags[0]!.id}/label.svg`).buffer(true).expect(200);
    const svg = res.body instanceof Buffer ? res.body.toString('utf8') : String(res.text);
    expect(svg).toContain(bags[0]!.code);
    expect(svg).toMatch(/<path[^>]+d="M/);
  });

  it('prints names outside WinAnsi by dropping their accents, keeping those it has', () => {
    expect(toWinAnsi('Zoë Łucja Dőry Ștefan 李 €')).toBe('Zoë Lucja Dory Stefan ? €');
  });
});
