import Papa from 'papaparse';
import request from 'supertest';
import type { FloorReport } from '../../src/shared/reports-contract';
import type { RunningHub } from '../../server/hub';
import { csvField } from '../../server/reports/report-csv';
import { freshBag, leadCookie, operatorOn, startTestHub, stationEvent } from './events-fixtures';

let hub: RunningHub;
let lead: string;
let pack: Awaited<ReturnType<typeof operatorOn>>;
// A station of this file's own, so its rows hold exactly this file's events; the comma and quotes test the CSV.
const stationName = `Pack, "Yard" bench ${Math.floor(Math.random() * 1e6)}`;

beforeAll(async () => {
  hub = await startTestHub();
  lead = await leadCookie(hub.url);
  await hub.db('stations').insert({ name: stationName, kind: 'pack' });
  pack = await operatorOn(hub.url, hub.db, stationName, 2);
});
afterAll(() => hub.close());

/** Today's date in the demo shop's time zone, from Node's own Intl data. */
const londonToday = () => new Intl.DateTimeFormat('en-CA', { timeZone: 'Europe/London' }).format(new Date());
const report = (query: string) => request(hub.url).get(`/api/reports/floor?${query}`).set('Cookie', lead);
const csv = (query: string) => request(hub.url).get(`/api/reports/floor.csv?${query}`).set('Cookie', lead);

describe('GET /api/reports/floor', () => {
  it('puts events pushed today on today\'s row for the station, with exact counts', async () => {
    const bag = await freshBag(hub.db, 10);
    await hub.db('bags').where({ id: bag.id }).update({ qty_cut: 10, qty_weeded: 10, qty_pressed: 10, stage: 'pressed' });
    const reason = (await hub.db('spoil_reasons').where({ label: 'Garment flaw' }).first())!;
    const today = londonToday();
    const before = (await report(`from=${today}&to=${today}`).expect(200)).body as FloorReport;

    const at = { bagId: bag.id, stationId: pack.stationId, userId: pack.userId };
    const res = await request(hub.url).post('/api/events').set('Cookie', pack.cookie).send({
      events: [
        stationEvent(at, 'pack_done', 4),
        stationEvent(at, 'pack_done', 3),
        stationEvent(at, 'spoil', 2, { stage: 'pack', reasonId: reason.id, note: 'Hole by the seam', hasPhoto: false }),
        stationEvent(at, 'scan', 0),
      ],
    }).expect(200);
    expect(res.body.rejected).toEqual([]);
    const after = (await report(`from=${today}&to=${today}`).expect(200)).body as FloorReport;

    // By hand: good pieces 4 + 3 = 7, spoiled 2; a scan counts nothing.
    expect(after.timeZone).toBe('Europe/London');
    expect(after.days).toEqual([today]);
    expect(after.rows.filter((row) => row.stationId === pack.stationId)).toEqual([
      { date: today, stationId: pack.stationId, stationName, kind: 'pack', pieces: 7, spoiled: 2 },
    ]);
    expect(after.stations).toContainEqual({ id: pack.stationId, name: stationName, kind: 'pack' });
    expect(after.totals.pieces - before.totals.pieces).toBe(7);
    expect(after.totals.spoiled - before.totals.spoiled).toBe(2);
    const flaw = (r: FloorReport) => r.spoilReasons.find((s) => s.reason === 'Garment flaw')?.pieces ?? 0;
    expect(flaw(after) - flaw(before)).toBe(2);
  });

  it('answers an empty range with every day listed, no rows, zero totals and no spoil rate', async () => {
    const res = await report('from=2001-01-01&to=2001-01-31').expect(200);
    const body = res.body as FloorReport;
    expect(body.days).toHaveLength(31);
    expect(body.days[0]).toBe('2001-01-01');
    expect(body.days[30]).toBe('2001-01-31');
    expect(body.rows).toEqual([]);
    expect(body.totals).toEqual({ pieces: 0, spoiled: 0, spoilRate: null });
    expect(body.spoilReasons).toEqual([]);
    expect(body.stations.length).toBeGreaterThanOrEqual(6);
  });

  it('refuses a bad range with a 400 sentence saying what to change', async () => {
    const missing = await report('from=2026-11-01');
    expect(missing.status).toBe(400);
    expect(missing.body.error).toMatch(/Give the last day of the report as to=YYYY-MM-DD/);

    const notADay = await report('from=2026-02-30&to=2026-03-02');
    expect(notADay.status).toBe(400);
    expect(notADay.body.error).toMatch(/The first day is not on the calendar/);

    const badFormat = await report('from=1/11/2026&to=2026-11-30');
    expect(badFormat.body.error).toMatch(/Write the first day as YYYY-MM-DD/);

    const backwards = await report('from=2026-11-30&to=2026-11-01');
    expect(backwards.status).toBe(400);
    expect(backwards.body.error).toMatch(/The last day \(2026-11-01\) is before the first day \(2026-11-30\): swap them/);

    // 2025-01-01 to 2026-01-02 is 365 + 2 = 367 days; 2024 is a leap year, so 2024-01-01 to 2024-12-31 is exactly 366.
    const tooLong = await report('from=2025-01-01&to=2026-01-02');
    expect(tooLong.status).toBe(400);
    expect(tooLong.body.error).toMatch(/at most 366 days and this range has 367/);
    await report('from=2024-01-01&to=2024-12-31').expect(200);

    const csvToo = await csv('from=2026-11-30&to=2026-11-01');
    expect(csvToo.status).toBe(400);
    expect(csvToo.body.error).toMatch(/swap them/);
  });

  it('gives the same rows as CSV, which an independent reader parses back to the same numbers', async () => {
    const bag = await freshBag(hub.db, 2);
    await hub.db('bags').where({ id: bag.id }).update({ qty_cut: 2, qty_weeded: 2, qty_pressed: 2, stage: 'pressed' });
    await request(hub.url).post('/api/events').set('Cookie', pack.cookie)
      .send({ events: [stationEvent({ bagId: bag.id, stationId: pack.stationId, userId: pack.userId }, 'pack_done', 2)] }).expect(200);
    const today = londonToday();
    const query = `from=${today}&to=${today}`;
    const json = (await report(query).expect(200)).body as FloorReport;
    const mine = json.rows.find((row) => row.stationId === pack.stationId)!;
    const res = await csv(query).expect(200);

    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    // RFC 6266: the file name may be sent as a token or as a quoted string.
    expect(res.headers['content-disposition']).toMatch(new RegExp(`^attachment; filename="?dwell-floor-${today}-to-${today}\\.csv"?$`));
    // RFC 4180, section 2: records end in CRLF; a field with a comma or a double quote is enclosed in double quotes,
    // and a double quote inside it is written twice.
    expect(res.text.startsWith('date,station,kind,pieces,spoiled\r\n')).toBe(true);
    expect(res.text.endsWith('\r\n')).toBe(true);
    expect(res.text).toContain(`${today},"${stationName.replaceAll('"', '""')}",pack,${mine.pieces},${mine.spoiled}\r\n`);

    // papaparse is the independent RFC 4180 reader.
    const parsed = Papa.parse<Record<string, string>>(res.text, { header: true, skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    expect(parsed.meta.fields).toEqual(['date', 'station', 'kind', 'pieces', 'spoiled']);
    expect(parsed.data).toEqual(json.rows.map((row) => ({ date: row.date, station: row.stationName, kind: row.kind, pieces: String(row.pieces), spoiled: String(row.spoiled) })));
    expect(parsed.data.reduce((sum, row) => sum + Number(row['pieces']), 0)).toBe(json.totals.pieces);
    expect(parsed.data.find((row) => row['station'] === stationName)).toEqual({ date: today, station: stationName, kind: 'pack', pieces: String(mine.pieces), spoiled: String(mine.spoiled) });
  });

  it('keeps a station name that a spreadsheet would run as a formula as text', () => {
    // OWASP "CSV Injection": a cell starting with =, +, - or @ is read as a formula; a leading apostrophe keeps it text.
    expect(csvField('=HYPERLINK("x")')).toBe(`"'=HYPERLINK(""x"")"`);
    expect(csvField('@Press')).toBe("'@Press");
    expect(csvField('Press 1')).toBe('Press 1');
  });

  it('refuses an operator with a 403 sentence', async () => {
    const res = await request(hub.url).get('/api/reports/floor?from=2026-11-01&to=2026-11-30').set('Cookie', pack.cookie);
    expect(res.status).toBe(403);
    expect(res.body.error).toMatch(/role/);
  });
});
