import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { PNG } from 'pngjs';
import { MAX_DESIGN_BYTES } from '../../server/designs/design-intake';
import { signedInPerson, testApp } from './support/test-hub';

const uploads = mkdtempSync(path.join(tmpdir(), 'dwell-uploads-'));
const hub = testApp({ UPLOADS_DIR: uploads });
afterAll(async () => {
  await hub.close();
  rmSync(uploads, { recursive: true, force: true });
});

let lead: Awaited<ReturnType<typeof signedInPerson>>;
beforeAll(async () => {
  lead = await signedInPerson(hub.app, 'lead');
}, 30_000);
jest.setTimeout(30_000);

const upload = (bytes: Buffer, name: string) => lead.post('/api/designs').attach('design', bytes, name);

describe('design uploads', () => {
  it('refuses a Windows executable renamed .png, by its bytes', async () => {
    const exe = Buffer.concat([Buffer.from('MZ'), Buffer.alloc(510, 0)]); // "MZ" DOS header magic (Microsoft PE/COFF specification)
    const res = await upload(exe, 'logo.png');
    expect(res.status).toBe(415);
    expect(res.body.error).toMatch(/not an SVG or PNG design/);
  });

  it('refuses an ELF program renamed .svg', async () => {
    const elf = Buffer.concat([Buffer.from([0x7f, 0x45, 0x4c, 0x46, 2, 1, 1, 0]), Buffer.alloc(120, 0)]); // ELF magic (System V ABI)
    const res = await upload(elf, 'logo.svg');
    expect(res.status).toBe(415);
    expect(res.body.error).toMatch(/not an SVG/);
  });

  it('refuses an SVG with a script and one with an event handler, saying why', async () => {
    for (const svg of [
      '<svg xmlns="http://www.w3.org/2000/svg"><script>alert(1)</script></svg>',
      '<svg xmlns="http://www.w3.org/2000/svg" onload="alert(1)"><rect width="1" height="1"/></svg>',
    ]) {
      const res = await upload(Buffer.from(svg), 'logo.svg');
      expect(res.status).toBe(400);
      expect(res.body.error).toMatch(/contains a script or event handler/);
    }
  });

  it('refuses an empty file', async () => {
    const res = await upload(Buffer.alloc(0), 'empty.svg');
    expect(res.status).toBe(400);
    expect(res.body.error).toMatch(/empty/);
  });

  it('refuses a file over the limit with 413', async () => {
    const res = await upload(Buffer.alloc(MAX_DESIGN_BYTES + 1, 0x20), 'big.svg');
    expect(res.status).toBe(413);
    expect(res.body.error).toMatch(/larger than 5 MB/);
  });

  it('stores an accepted SVG cleaned, under a random name in the uploads folder, and serves it locked down', async () => {
    const svg = `<svg xmlns="http://www.w3.org/2000/svg" xmlns:xlink="http://www.w3.org/1999/xlink" width="120mm" height="60mm" viewBox="0 0 120 60">
      <style>@import url(http://elsewhere.example/x.css);</style>
      <image xlink:href="http://elsewhere.example/track.png" width="5" height="5"/>
      <foreignObject width="10" height="10"><div xmlns="http://www.w3.org/1999/xhtml">hi</div></foreignObject>
      <rect width="120" height="60" fill="#123456"/></svg>`;
    const res = await upload(Buffer.from(svg), 'crest.svg');
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ mime: 'image/svg+xml', widthMm: 120, heightMm: 60, file: expect.stringMatching(/^[a-f0-9]{32}\.svg$/) });
    const stored = path.join(uploads, 'designs', res.body.file);
    expect(existsSync(stored)).toBe(true);
    expect(readdirSync(path.join(uploads, 'designs'))).not.toContain('crest.svg');
    const text = readFileSync(stored, 'utf8');
    expect(text).toContain('<rect');
    for (const gone of ['<script', 'onload', 'foreignObject', 'elsewhere.example', '@import']) expect(text).not.toContain(gone);

    const served = await lead.get(res.body.url).expect(200);
    expect(served.headers['content-security-policy']).toBe("default-src 'none'; style-src 'unsafe-inline'");
    expect(served.headers['x-content-type-options']).toBe('nosniff');
    expect(served.headers['content-type']).toMatch(/image\/svg\+xml/);
  });

  it('reads a PNG size from its pHYs chunk', async () => {
    const png = new PNG({ width: 1181, height: 591 });
    png.data.fill(255);
    const bytes = PNG.sync.write(png);
    const phys = Buffer.alloc(21); // pHYs (ISO/IEC 15948, 11.3.5.3): 11811 px/m is 300 dpi; CRC unchecked here
    phys.writeUInt32BE(9, 0);
    phys.write('pHYs', 4, 'latin1');
    phys.writeUInt32BE(11811, 8);
    phys.writeUInt32BE(11811, 12);
    phys.writeUInt8(1, 16);
    const res = await upload(Buffer.concat([bytes.subarray(0, 33), phys, bytes.subarray(33)]), 'photo.png');
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ mime: 'image/png', widthMm: 100, heightMm: 50 });
  });

  it('refuses a design name that tries to leave the folder', async () => {
    const res = await lead.get('/api/designs/..%2F..%2Fpackage.json').expect(400);
    expect(res.body.error).toMatch(/design file name/);
  });
});
