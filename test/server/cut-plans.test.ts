import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type TestAgent from 'supertest/lib/agent';
import { cutWorld, saveDesign } from './cut-fixtures';
import { signedInOperator, signedInPerson, testApp } from './support/test-hub';

// A 100 mm x 50 mm rectangle: its cut path is 2 x (100 + 50) = 300 mm, worked by hand (perimeter of a rectangle).
const RECTANGLE_SVG = '<svg xmlns="http://www.w3.org/2000/svg" width="100mm" height="50mm" viewBox="0 0 100 50"><rect x="0" y="0" width="100" height="50"/></svg>';
// 15 in = 381 mm exactly (NIST SP 811, appendix B: 1 in = 25.4 mm).
const FIFTEEN_INCH_MM = 381;

let uploads: string;
let hub: ReturnType<typeof testApp>;
let lead: TestAgent;
let world: Awaited<ReturnType<typeof cutWorld>>;
let designFile: string;

beforeAll(async () => {
  uploads = await mkdtemp(path.join(tmpdir(), 'dwell-cut-'));
  hub = testApp({ UPLOADS_DIR: uploads });
  lead = await signedInPerson(hub.app, 'lead');
  world = await cutWorld(hub.db);
  designFile = await saveDesign(uploads, RECTANGLE_SVG);
});
afterAll(async () => {
  await hub.close();
  await rm(uploads, { recursive: true, force: true });
});

describe('POST /api/cut-plans/preview', () => {
  it('refuses a layout wider than the roll\'s usable width with a sentence', async () => {
    const film = world.secondFilmId;
    const rollId = await world.roll(film, FIFTEEN_INCH_MM, 22_860, 22_860);
    const [bagId] = await world.job({ widthMm: 400, heightMm: 100, rotate: false, films: [film], bagPieces: [3] });
    const res = await lead.post('/api/cut-plans/preview').send({ bagIds: [bagId], filmId: film, rollId, cutterId: world.cutterId });
    expect(res.status).toBe(400);
    // 381 mm less two 10 mm edge margins leaves 361 mm; the piece is 400 + 2 x 3 mm border = 406 mm wide.
    expect(res.body.error).toMatch(/406 mm by 106 mm .* wider than the 361 mm \(14\.21 in\) usable on this roll/);
  });

  it('picks the partly used roll over a new one of the same film and width', async () => {
    const film = world.filmId;
    await world.roll(film, FIFTEEN_INCH_MM, 22_860, 22_860);
    const partly = await world.roll(film, FIFTEEN_INCH_MM, 22_860, 8_230);
    const [bagId] = await world.job({ widthMm: 100, heightMm: 50, rotate: true, films: [film], bagPieces: [10], designFile });
    const res = await lead.post('/api/cut-plans/preview').send({ bagIds: [bagId], filmId: film, cutterId: world.cutterId });
    expect(res.status).toBe(200);
    expect(res.body.rollChoice.kind).toBe('roll');
    expect(res.body.roll.id).toBe(partly);
    expect(res.body.rollChoice.partlyUsed).toBe(true);
    expect(res.body.layout.placements).toHaveLength(10);
    expect(res.body.cutterSvg).toContain(`width="${FIFTEEN_INCH_MM}mm"`);
    expect(res.body.cutterSvg).not.toMatch(/<script|<text/);
    // Ten rectangles of 300 mm plus 1 mm overcut each (perimeter by hand; overcut: common practice, no published source).
    expect(res.body.estimate.cutLengthMm).toBeCloseTo(3010, 6);
    expect(res.body.preset).toMatchObject({ forceG: 90, speedMmS: 300, ladderG: [80, 90, 100] });
  });

  it('says a PNG design has no cut path and approximates it by its box outline', async () => {
    const film = world.filmId;
    const [bagId] = await world.job({ widthMm: 80, heightMm: 40, rotate: true, films: [film], bagPieces: [2], designFile: null });
    const res = await lead.post('/api/cut-plans/preview').send({ bagIds: [bagId], filmId: film, cutterId: world.cutterId });
    expect(res.status).toBe(200);
    expect(res.body.estimate.warnings.join(' ')).toMatch(/no cut path/);
    // Box outline 2 x (80 + 40) = 240 mm plus 1 mm overcut, twice (perimeter worked by hand).
    expect(res.body.estimate.cutLengthMm).toBeCloseTo(482, 6);
  });
});

describe('POST /api/cut-plans/confirm', () => {
  it('takes exactly the shown length plus the test cut from the roll, wears the blade and marks the bags cut once', async () => {
    const film = world.filmId;
    const rollId = await world.roll(film, FIFTEEN_INCH_MM, 22_860, 10_000);
    const bagIds = await world.job({ widthMm: 100, heightMm: 50, rotate: true, films: [film], bagPieces: [6, 4], designFile });
    const preview = await lead.post('/api/cut-plans/preview').send({ bagIds, filmId: film, rollId, cutterId: world.cutterId }).expect(200);
    const lengthMm: number = preview.body.layout.lengthUsedMm;
    const before = (await hub.db('cutters').where({ id: world.cutterId }).first())!;

    const res = await lead.post('/api/cut-plans/confirm').send({ bagIds, filmId: film, rollId, cutterId: world.cutterId, lengthMm, testCutMm: 50 });
    expect(res.status).toBe(200);
    const roll = (await hub.db('rolls').where({ id: rollId }).first())!;
    expect(roll.remaining_mm).toBe(Math.round(10_000 - lengthMm - 50));
    expect(res.body.roll.remainingMm).toBe(roll.remaining_mm);

    const after = (await hub.db('cutters').where({ id: world.cutterId }).first())!;
    // 10 rectangles x (300 mm + 1 mm overcut) x wear factor 1 for wear class 1 (Dwell's weights: common practice, no published source).
    expect(Number(after.blade_distance_mm) - Number(before.blade_distance_mm)).toBe(3010);
    expect(after.last_film_type_id).toBe(world.filmTypeId);

    const movements = await hub.db('roll_movements').where({ roll_id: rollId });
    expect(movements).toHaveLength(1);
    expect(movements[0]).toMatchObject({ kind: 'cut', change_mm: roll.remaining_mm - 10_000, remaining_mm: roll.remaining_mm, test_cut_mm: 50, cutter_id: world.cutterId });

    const events = await hub.db('events').whereIn('bag_id', bagIds).where({ kind: 'cut_done' }).orderBy('bag_id');
    expect(events.map((e) => [e.bag_id, e.quantity])).toEqual([
      [bagIds[0], 6],
      [bagIds[1], 4],
    ]);
    const bags = await hub.db('bags').whereIn('id', bagIds).orderBy('id');
    expect(bags.map((b) => [b.stage, b.qty_cut])).toEqual([
      ['cut', 6],
      ['cut', 4],
    ]);

    const again = await lead.post('/api/cut-plans/confirm').send({ bagIds, filmId: film, rollId, cutterId: world.cutterId, lengthMm, testCutMm: 50 });
    expect(again.status).toBe(409);
    expect(await hub.db('events').whereIn('bag_id', bagIds).where({ kind: 'cut_done' }).count({ n: '*' })).toEqual([{ n: 2 }]);
    expect((await hub.db('rolls').where({ id: rollId }).first())!.remaining_mm).toBe(roll.remaining_mm);
  });

  it('refuses with 409 and leaves everything as it was when the roll no longer has enough film', async () => {
    const film = world.filmId;
    const rollId = await world.roll(film, FIFTEEN_INCH_MM, 22_860, 300);
    const bagIds = await world.job({ widthMm: 100, heightMm: 50, rotate: true, films: [film], bagPieces: [12], designFile });
    const res = await lead.post('/api/cut-plans/confirm').send({ bagIds, filmId: film, rollId, cutterId: world.cutterId, lengthMm: 900 });
    expect(res.status).toBe(409);
    expect(res.body.error).toMatch(/has only 0\.30 m .* left/);
    expect((await hub.db('rolls').where({ id: rollId }).first())!.remaining_mm).toBe(300);
    expect(await hub.db('roll_movements').where({ roll_id: rollId })).toHaveLength(0);
    expect((await hub.db('bags').where({ id: bagIds[0] }).first())!.stage).toBe('queued');
  });

  it('counts a two-layer bag as cut only when its second film is cut, from an operator at the cut station', async () => {
    const { agent: operator } = await signedInOperator(hub.app, hub.db, world.stationName, 1);
    const first = await world.roll(world.filmId, FIFTEEN_INCH_MM, 22_860, 22_860);
    const second = await world.roll(world.secondFilmId, FIFTEEN_INCH_MM, 22_860, 22_860);
    const [bagId] = await world.job({ widthMm: 100, heightMm: 50, rotate: true, films: [world.filmId, world.secondFilmId], bagPieces: [5], designFile });

    const groups = await operator.get('/api/cut-groups').expect(200);
    const inGroups = groups.body.filter((g: { bags: { bagId: number }[] }) => g.bags.some((b) => b.bagId === bagId)).map((g: { filmId: number }) => g.filmId);
    expect(inGroups.sort()).toEqual([world.filmId, world.secondFilmId].sort());

    const one = await operator.post('/api/cut-plans/confirm').send({ bagIds: [bagId], filmId: world.filmId, rollId: first, cutterId: world.cutterId, lengthMm: 400 });
    expect(one.status).toBe(200);
    expect(one.body.waitingBagIds).toEqual([bagId]);
    expect((await hub.db('bags').where({ id: bagId }).first())!.stage).toBe('queued');

    const two = await operator.post('/api/cut-plans/confirm').send({ bagIds: [bagId], filmId: world.secondFilmId, rollId: second, cutterId: world.cutterId, lengthMm: 400 });
    expect(two.status).toBe(200);
    expect(two.body.cutBagIds).toEqual([bagId]);
    const events = await hub.db('events').where({ bag_id: bagId, kind: 'cut_done' });
    expect(events.map((e) => e.quantity)).toEqual([5]);
    expect((await hub.db('bags').where({ id: bagId }).first())!.stage).toBe('cut');
  });

  it('refuses a confirm from an operator at a weed station', async () => {
    const { agent: weeder } = await signedInOperator(hub.app, hub.db, 'Weed 1', 2);
    const rollId = await world.roll(world.filmId, FIFTEEN_INCH_MM, 22_860, 22_860);
    const bagIds = await world.job({ widthMm: 100, heightMm: 50, rotate: true, films: [world.filmId], bagPieces: [2], designFile });
    const res = await weeder.post('/api/cut-plans/confirm').send({ bagIds, filmId: world.filmId, rollId, cutterId: world.cutterId, lengthMm: 200 });
    expect(res.status).toBe(403);
    expect(res.body.error).toMatch(/cut station/);
  });
});
