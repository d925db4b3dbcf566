import { mkdtempSync, readdirSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import exifr from 'exifr';
import sharp from 'sharp';
import request from 'supertest';
import type { RunningHub } from '../../server/hub';
import { freshBag, leadCookie, operatorOn, startTestHub, stationEvent } from './events-fixtures';

const uploads = mkdtempSync(path.join(tmpdir(), 'dwell-photos-'));
let hub: RunningHub;
let press: Awaited<ReturnType<typeof operatorOn>>;

beforeAll(async () => {
  hub = await startTestHub({ UPLOADS_DIR: uploads });
  press = await operatorOn(hub.url, hub.db, 'Press 1', 0);
});
afterAll(() => hub.close());

/** A camera-like JPEG carrying a GPS position in its EXIF. */
function jpegWithGps(): Promise<Buffer> {
  return sharp({ create: { width: 800, height: 600, channels: 3, background: '#b04030' } })
    .jpeg()
    .withExif({ IFD0: { Make: 'Test camera' }, IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '51/1 30/1 0/1', GPSLongitudeRef: 'W', GPSLongitude: '0/1 7/1 0/1' } })
    .toBuffer();
}

async function spoilEvent(): Promise<string> {
  const bag = await freshBag(hub.db, 4);
  const reason = (await hub.db('spoil_reasons').where({ active: true }).first())!;
  const event = stationEvent({ bagId: bag.id, stationId: press.stationId, userId: press.userId }, 'spoil', 1, { stage: 'press', reasonId: reason.id, note: 'Lifted', hasPhoto: true });
  const res = await request(hub.url).post('/api/events').set('Cookie', press.cookie).send({ events: [event] }).expect(200);
  expect(res.body.accepted).toEqual([event.id]);
  return event.id;
}

const upload = (eventId: string, bytes: Buffer, name = 'spoil.jpg') =>
  request(hub.url).post(`/api/spoils/${eventId}/photo`).set('Cookie', press.cookie).attach('photo', bytes, name);

describe('spoil photos', () => {
  it('stores a photo retried after a dropped upload once, without its GPS position, with a thumbnail', async () => {
    const eventId = await spoilEvent();
    const fixture = await jpegWithGps();
    // exifr (an independent EXIF reader) must see the position in the fixture, or the check below proves nothing.
    expect(await exifr.gps(fixture)).toEqual({ latitude: 51.5, longitude: expect.closeTo(-0.11667, 4) });

    const first = await upload(eventId, fixture).expect(201);
    const retry = await upload(eventId, fixture).expect(200);

    expect(retry.body).toEqual(first.body);
    expect(await hub.db('photos').where({ event_id: eventId }).count({ n: '*' }).first()).toEqual({ n: 1 });
    const row = (await hub.db('photos').where({ event_id: eventId }).first())!;
    const files = readdirSync(path.join(uploads, 'photos')).filter((file) => file.startsWith(row.file.slice(0, 32)));
    expect(files.sort()).toEqual([row.file, row.thumb_file].sort());
    expect(readdirSync(path.join(uploads, 'photos'))).toHaveLength(2);

    const stored = readFileSync(path.join(uploads, 'photos', row.file));
    expect(await exifr.gps(stored)).toBeUndefined();
    expect(await exifr.parse(stored, { gps: true })).toBeUndefined();
    const thumb = await sharp(readFileSync(path.join(uploads, 'photos', row.thumb_file))).metadata();
    expect({ format: thumb.format, width: thumb.width }).toEqual({ format: 'jpeg', width: 320 });

    const lead = await leadCookie(hub.url);
    const served = await request(hub.url).get(`/api/spoils/${eventId}/photo/thumb`).set('Cookie', lead).expect(200);
    expect(served.headers['content-type']).toBe('image/jpeg');
  });

  it('answers 404 with a sentence for a photo of an event that is not a spoil or does not exist', async () => {
    const bag = await freshBag(hub.db, 2);
    const scan = stationEvent({ bagId: bag.id, stationId: press.stationId, userId: press.userId }, 'scan', 0);
    await request(hub.url).post('/api/events').set('Cookie', press.cookie).send({ events: [scan] }).expect(200);
    const fixture = await jpegWithGps();
    expect((await upload(scan.id, fixture).expect(404)).body.error).toMatch(/not a spoil/);
    expect((await upload('6f1c1b1e-8a2b-4c1d-9e3f-0a1b2c3d4e5f', fixture).expect(404)).body.error).toMatch(/no spoil event/);
  });

  it('refuses a file that is not an image by its bytes, whatever its name says', async () => {
    const eventId = await spoilEvent();
    const res = await upload(eventId, Buffer.from('%PDF-1.4 not a photo'), 'photo.jpg').expect(415);
    expect(res.body.error).toMatch(/JPEG, PNG or WebP/);
  });
});

describe('spoil reasons', () => {
  it('lets the lead add, rename, reorder and deactivate a reason, and stations read the list', async () => {
    const lead = await leadCookie(hub.url);
    const label = `Ink bled ${Date.now()}`;
    const made = await request(hub.url).post('/api/spoil-reasons').set('Cookie', lead).send({ label }).expect(201);
    expect(made.body).toMatchObject({ label, active: true });

    const changed = await request(hub.url).put(`/api/spoil-reasons/${made.body.id}`).set('Cookie', lead).send({ label: `${label}!`, position: 1, active: false }).expect(200);
    expect(changed.body).toEqual({ id: made.body.id, label: `${label}!`, position: 1, active: false });

    const list = await request(hub.url).get('/api/spoil-reasons').set('Cookie', press.cookie).expect(200);
    expect(list.body[0]).toEqual(changed.body);
    const taken = await request(hub.url).post('/api/spoil-reasons').set('Cookie', lead).send({ label: `${label}!` }).expect(409);
    expect(taken.body.error).toMatch(/already a spoil reason/);
  });
});
