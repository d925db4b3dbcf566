import request from 'supertest';
import type { BoardUpdate } from '../../src/shared/events-contract';
import type { ShopSettings, ShopSettingsInput } from '../../src/shared/shop-contract';
import type { ShopSettingsRow } from '../../server/db/tables';
import type { RunningHub } from '../../server/hub';
import { leadCookie, openSocket, operatorOn, startTestHub, type ClientSocket } from './events-fixtures';
import { DEMO_SHOP } from '../../seeds/data/demo-shop';

let hub: RunningHub;
let owner: string;
let lead: string;
let seeded: ShopSettingsRow;
const sockets: ClientSocket[] = [];

beforeAll(async () => {
  hub = await startTestHub();
  owner = await leadCookie(hub.url, 'owner');
  lead = await leadCookie(hub.url, 'lead');
  seeded = (await hub.db('shop_settings').where({ id: 1 }).first())!;
});
afterAll(async () => {
  sockets.forEach((socket) => socket.disconnect());
  // Later test files on this database expect the demo shop as seeded.
  await hub.db('shop_settings').where({ id: 1 }).update(seeded);
  await hub.close();
});

const read = (cookie: string) => request(hub.url).get('/api/shop').set('Cookie', cookie);
const save = (cookie: string, body: unknown) => request(hub.url).put('/api/shop').set('Cookie', cookie).send(body as object);
const stored = async () => (await hub.db('shop_settings').where({ id: 1 }).first())!;

async function currentInput(): Promise<ShopSettingsInput> {
  const { updatedAt: _updatedAt, ...input } = (await read(owner).expect(200)).body as ShopSettings;
  return input;
}

// The demo shop as seeds/02_shop_and_people.ts writes it (seeds/data/demo-shop.ts). Weekdays are numbered as ISO 8601
// numbers them, 1 = Monday to 7 = Sunday (ISO 8601-1:2019, calendar week day numbering; from memory).

describe('reading the shop settings', () => {
  it('shows the lead and the owner the demo shop, its hours in HH:MM and its days Monday to Friday', async () => {
    for (const cookie of [lead, owner]) {
      const res = await read(cookie).expect(200);
      expect(res.body).toEqual({ ...DEMO_SHOP, updatedAt: seeded.updated_at.toISOString() });
    }
  });

  it('refuses the settings to an operator at a station with a 403 sentence', async () => {
    const operator = await operatorOn(hub.url, hub.db, 'Weed 2', 2);
    const res = await read(operator.cookie);
    expect(res.status).toBe(403);
    expect(res.body.error).toMatch(/role may not/);
  });
});

describe('changing the shop settings', () => {
  afterEach(async () => {
    await hub.db('shop_settings').where({ id: 1 }).update(seeded);
  });

  it('stores the owner\'s new hours, working days and rate, trims the text and reads them back for the lead', async () => {
    const before = Date.now();
    const change = {
      ...(await currentInput()),
      shopName: '  Bramble Yard Apparel  ',
      shiftStart: '07:30',
      shiftEnd: '16:00',
      workingDays: [6, 1, 2, 3, 4, 5],
      standardRates: { cut: 150, weed: 25, press: 55, pack: 100 },
    };

    const res = await save(owner, change).expect(200);

    const expected = { ...DEMO_SHOP, shiftStart: '07:30', shiftEnd: '16:00', workingDays: [1, 2, 3, 4, 5, 6], standardRates: { cut: 150, weed: 25, press: 55, pack: 100 } };
    expect(res.body).toEqual({ ...expected, updatedAt: expect.any(String) });
    expect(Date.parse(res.body.updatedAt)).toBeGreaterThanOrEqual(before - 1000);
    expect((await read(lead).expect(200)).body).toEqual(res.body);
    expect(await stored()).toMatchObject({ shop_name: 'Bramble Yard Apparel', shift_start: '07:30:00', shift_end: '16:00:00', working_days: '1,2,3,4,5,6', standard_weed_per_hour: 25, standard_pack_per_hour: 100 });
  });

  it('keeps the closed days in date order with their notes trimmed, and an empty list empties them', async () => {
    const closedDays = [
      { date: '2027-04-02', note: '  Stocktake  ' },
      { date: '2027-01-01', note: "New Year's Day" },
    ];
    const res = await save(owner, { ...(await currentInput()), closedDays }).expect(200);
    expect(res.body.closedDays).toEqual([
      { date: '2027-01-01', note: "New Year's Day" },
      { date: '2027-04-02', note: 'Stocktake' },
    ]);
    expect(JSON.parse((await stored()).closed_days)).toEqual(res.body.closedDays);

    const emptied = await save(owner, { ...(await currentInput()), closedDays: [] }).expect(200);
    expect(emptied.body.closedDays).toEqual([]);
  });

  it('accepts a shift that ends after midnight and spells a time zone the way the tz database does', async () => {
    const res = await save(owner, { ...(await currentInput()), shiftStart: '22:00', shiftEnd: '06:00', timeZone: 'america/new_york', units: 'metric' }).expect(200);
    // America/New_York is the IANA tz database's name for US Eastern time.
    expect(res.body).toMatchObject({ shiftStart: '22:00', shiftEnd: '06:00', timeZone: 'America/New_York', units: 'metric' });
    expect(await stored()).toMatchObject({ shift_start: '22:00:00', shift_end: '06:00:00', time_zone: 'America/New_York' });
  });

  it('ignores fields it does not keep, such as updatedAt sent back from a read, as the other routes do', async () => {
    const input = await currentInput();
    const res = await save(owner, { ...input, updatedAt: '2001-01-01T00:00:00.000Z', id: 7, colour: 'teal' }).expect(200);
    expect(res.body).toEqual({ ...input, updatedAt: expect.any(String) });
    expect(res.body.updatedAt).not.toBe('2001-01-01T00:00:00.000Z');
    expect((await stored()).id).toBe(1);
  });

  it('refuses a lead\'s change with a 403 and leaves the settings as they were', async () => {
    const res = await save(lead, { ...(await currentInput()), standardRates: { cut: 99, weed: 99, press: 99, pack: 99 } });
    expect(res.status).toBe(403);
    expect(res.body.error).toMatch(/role may not/);
    expect((await stored()).standard_weed_per_hour).toBe(seeded.standard_weed_per_hour);
  });

  // Mars/Olympus is no zone in the IANA tz database; 25:00 is no hour of a 24-hour clock (ISO 8601 allows 00 to 23, and 24:00 only as the end of a day).
  it.each([
    ['timeZone', { timeZone: 'Mars/Olympus' }, /"Mars\/Olympus" is not a known time zone: use an IANA name such as Europe\/London/],
    ['shiftStart', { shiftStart: '25:00' }, /shift start "25:00" is not a time of day: write it as HH:MM/],
    ['shiftEnd', { shiftEnd: '15.30' }, /shift end "15.30" is not a time of day/],
    ['workingDays', { workingDays: [] }, /Tick at least one working day/],
    ['workingDays', { workingDays: [1, 3, 3] }, /Wednesday is there twice/],
    ['workingDays.0', { workingDays: [0, 1] }, /ISO weekday numbers from 1 \(Monday\) to 7 \(Sunday\)/],
    ['standardRates.weed', { standardRates: { cut: 120, weed: 0, press: 45, pack: 90 } }, /standard rate at weed is a whole number from 1 to 2000/],
    ['standardRates', { standardRates: 40 }, /Give a standard rate for each stage: cut, weed, press and pack/],
    ['bagMaxPieces', { bagMaxPieces: 12.5 }, /most pieces in one bag is a whole number from 1 to 500/],
    ['heatExposureLimitS', { heatExposureLimitS: 601 }, /heat exposure limit in seconds is a whole number from 5 to 600/],
    ['email', { email: 'hello at bramble yard' }, /Enter the shop's e-mail like hello@shop.example, or leave it empty/],
    ['shiftEnd', { shiftStart: '07:00', shiftEnd: '07:00' }, /shift cannot end when it starts \(07:00\)/],
    ['shopName', { shopName: '   ' }, /Enter the shop's name/],
    ['units', { units: 'cubits' }, /Choose imperial .* or metric/],
    ['closedDays.0.date', { closedDays: [{ date: '2026-02-30', note: '' }] }, /A closed day is a date that exists, written YYYY-MM-DD/],
    ['closedDays', { closedDays: [{ date: '2026-12-25', note: 'Christmas Day' }, { date: '2026-12-25', note: 'Again' }] }, /Each closed day is listed once: 2026-12-25 is there twice/],
  ] as const)('answers 400 naming %s in a sentence for %j, and stores nothing', async (path, bad, sentence) => {
    const res = await save(owner, { ...(await currentInput()), ...bad });
    expect(res.status).toBe(400);
    expect(res.body.error).toMatch(new RegExp(`\\(${path.replace('.', '\\.')}: `));
    expect(res.body.error).toMatch(sentence);
    expect(res.body.details).toEqual([{ path, message: expect.stringMatching(sentence) }]);
    expect(await stored()).toEqual(seeded);
  });

  it('answers 400 listing every missing field when the body is empty', async () => {
    const res = await save(owner, {});
    expect(res.status).toBe(400);
    expect(res.body.details.map((detail: { path: string }) => detail.path)).toEqual(Object.keys(DEMO_SHOP));
  });
});

describe('the live board after a change', () => {
  afterEach(async () => {
    await hub.db('shop_settings').where({ id: 1 }).update(seeded);
  });

  it('tells a signed-in board socket to refetch after the owner saves, and says nothing after a refused change', async () => {
    const board = await openSocket(hub.url, lead, sockets);
    const updates: BoardUpdate[] = [];
    board.on('board:update', (update) => updates.push(update));
    const heard = new Promise<BoardUpdate>((resolve) => board.once('board:update', resolve));

    await save(owner, { ...(await currentInput()), bagMaxPieces: 0 }).expect(400);
    // A broadcast sent for the refused change would have arrived by now.
    await new Promise((resolve) => setTimeout(resolve, 200));
    expect(updates).toEqual([]);

    await save(owner, { ...(await currentInput()), shiftEnd: '16:30' }).expect(200);
    expect(await heard).toEqual({ bagIds: [], at: expect.any(String) });
  });
});
