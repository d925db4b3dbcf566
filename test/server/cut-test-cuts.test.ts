import type TestAgent from 'supertest/lib/agent';
import { cutWorld } from './cut-fixtures';
import { signedInOperator, signedInPerson, testApp } from './support/test-hub';

const hub = testApp();
let lead: TestAgent;
let world: Awaited<ReturnType<typeof cutWorld>>;

beforeAll(async () => {
  lead = await signedInPerson(hub.app, 'lead');
  world = await cutWorld(hub.db);
});
afterAll(() => hub.close());

async function previewDue(): Promise<{ due: boolean; reasons: string[] }> {
  await world.roll(world.filmId, 381, 22_860, 22_860);
  const [bagId] = await world.job({ widthMm: 100, heightMm: 50, rotate: true, films: [world.filmId], bagPieces: [1] });
  const res = await lead.post('/api/cut-plans/preview').send({ bagIds: [bagId], filmId: world.filmId, cutterId: world.cutterId }).expect(200);
  return res.body.testCut;
}

describe('test cuts and blade changes', () => {
  it('makes a test cut due after a blade change and sets the blade distance back to zero', async () => {
    expect((await previewDue()).due).toBe(false);
    const res = await lead.post(`/api/cutters/${world.cutterId}/blade-change`).send({});
    expect(res.status).toBe(200);
    expect(res.body.bladeDistanceMm).toBe(0);
    const cutter = (await hub.db('cutters').where({ id: world.cutterId }).first())!;
    expect(Number(cutter.blade_distance_mm)).toBe(0);
    expect(cutter.blade_installed_at!.getTime()).toBeGreaterThan(cutter.last_test_cut_at!.getTime());
    expect(await previewDue()).toEqual({ due: true, reasons: ['The blade was changed after the last test cut.'] });
  });

  it('records a clean test cut at the lightest clean force, remembers it and keeps the shop\'s preset', async () => {
    const { agent: operator } = await signedInOperator(hub.app, hub.db, world.stationName, 3);
    const [bagId] = await world.job({ widthMm: 100, heightMm: 50, rotate: true, films: [world.filmId], bagPieces: [1] });
    // A ladder around the 90 g preset, one 10 g step either side (common practice, no published source).
    const steps = [
      { forceG: 80, cutClean: false, weededClean: false },
      { forceG: 90, cutClean: true, weededClean: true },
      { forceG: 100, cutClean: true, weededClean: true },
    ];
    const res = await operator.post('/api/test-cuts').send({ cutterId: world.cutterId, filmTypeId: world.filmTypeId, bagId, steps });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ passed: true, nextForceG: 90 });
    expect((await previewDue()).due).toBe(false);
    const remembered = await hub.db('cutter_film_forces').where({ cutter_id: world.cutterId, film_type_id: world.filmTypeId }).first();
    expect(remembered?.force_g).toBe(90);
    expect((await hub.db('film_types').where({ id: world.filmTypeId }).first())!.cut_force_g).toBe(90);
    const events = await hub.db('events').where({ bag_id: bagId, kind: 'test_cut' });
    expect(events).toHaveLength(1);
  });

  it('leaves the test due when no force cut and weeded clean, and says what to try next', async () => {
    await lead.post(`/api/cutters/${world.cutterId}/blade-change`).expect(200);
    const steps = [
      { forceG: 80, cutClean: false, weededClean: false },
      { forceG: 90, cutClean: true, weededClean: false },
      { forceG: 100, cutClean: true, weededClean: false },
    ];
    const res = await lead.post('/api/test-cuts').send({ cutterId: world.cutterId, filmTypeId: world.filmTypeId, steps });
    expect(res.status).toBe(201);
    expect(res.body.passed).toBe(false);
    expect(res.body.sentence).toMatch(/test again around 110 g/);
    expect((await previewDue()).due).toBe(true);
  });

  it('refuses a test cut with no forces tried, with a sentence', async () => {
    const res = await lead.post('/api/test-cuts').send({ cutterId: world.cutterId, filmTypeId: world.filmTypeId, steps: [] });
    expect(res.status).toBe(400);
    expect(res.body.error).toMatch(/Tap the force that cut clean/);
  });

  it('refuses a blade change from a weed station', async () => {
    const { agent: weeder } = await signedInOperator(hub.app, hub.db, 'Weed 2', 2);
    const res = await weeder.post(`/api/cutters/${world.cutterId}/blade-change`).send({});
    expect(res.status).toBe(403);
  });

  it('lists cutters with their blade distance since the last test', async () => {
    const res = await lead.get('/api/cutters').expect(200);
    const mine = res.body.find((c: { id: number }) => c.id === world.cutterId);
    expect(mine).toMatchObject({ bladeDistanceMm: 0, sinceTestMm: 0, testCutEveryMm: 500_000 });
  });
});
