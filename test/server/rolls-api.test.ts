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

describe('the Roll rack API', () => {
  it('puts a roll on the rack with a received movement and flags it low below its reorder length', async () => {
    const res = await lead.post('/api/rolls').send({ filmId: world.filmId, label: `N${world.tag}`, widthMm: 381, lengthMm: 22_860, remainingMm: 2_000, reorderMm: 2_743, rackSlot: 'C1' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ label: `N${world.tag}`, remainingMm: 2_000, low: true, rackSlot: 'C1' });
    const history = await lead.get(`/api/rolls/${res.body.id}/movements`).expect(200);
    expect(history.body).toEqual([expect.objectContaining({ kind: 'received', changeMm: 2_000, remainingMm: 2_000 })]);
    const list = await lead.get('/api/rolls').expect(200);
    expect(list.body.some((r: { id: number }) => r.id === res.body.id)).toBe(true);
  });

  it('refuses a roll with more left than when new, a missing label or a taken label, each with a sentence', async () => {
    const more = await lead.post('/api/rolls').send({ filmId: world.filmId, label: `M${world.tag}`, widthMm: 381, lengthMm: 1_000, remainingMm: 2_000, reorderMm: 0 });
    expect(more.status).toBe(400);
    expect(more.body.error).toMatch(/more film left than it had when new/);
    const noLabel = await lead.post('/api/rolls').send({ filmId: world.filmId, label: ' ', widthMm: 381, lengthMm: 1_000, reorderMm: 0 });
    expect(noLabel.status).toBe(400);
    expect(noLabel.body.details).toEqual([expect.objectContaining({ path: 'label' })]);
    await lead.post('/api/rolls').send({ filmId: world.filmId, label: `D${world.tag}`, widthMm: 381, lengthMm: 1_000, reorderMm: 0 }).expect(201);
    const taken = await lead.post('/api/rolls').send({ filmId: world.filmId, label: `D${world.tag}`, widthMm: 381, lengthMm: 1_000, reorderMm: 0 });
    expect(taken.status).toBe(409);
    expect(taken.body.error).toMatch(/already on the rack/);
  });

  it('records a physical measure from the cut station as a movement of the difference', async () => {
    const rollId = await world.roll(world.filmId, 381, 22_860, 9_000);
    const { agent: cutter } = await signedInOperator(hub.app, hub.db, world.stationName, 0);
    const res = await cutter.post(`/api/rolls/${rollId}/measure`).send({ remainingMm: 8_400, note: 'Measured on the bench' });
    expect(res.status).toBe(200);
    expect(res.body.remainingMm).toBe(8_400);
    const history = await lead.get(`/api/rolls/${rollId}/movements`).expect(200);
    expect(history.body[0]).toMatchObject({ kind: 'measure', changeMm: -600, remainingMm: 8_400, note: 'Measured on the bench' });
  });

  it('refuses a measure longer than the roll was when new, or negative', async () => {
    const rollId = await world.roll(world.filmId, 381, 5_000, 4_000);
    const longer = await lead.post(`/api/rolls/${rollId}/measure`).send({ remainingMm: 6_000 });
    expect(longer.status).toBe(400);
    expect(longer.body.error).toMatch(/held 5000 mm when new/);
    const negative = await lead.post(`/api/rolls/${rollId}/measure`).send({ remainingMm: -1 });
    expect(negative.status).toBe(400);
    expect(negative.body.error).toMatch(/cannot be negative/);
  });

  it('answers 404 with a sentence for a roll that does not exist', async () => {
    const res = await lead.get('/api/rolls/999999/movements');
    expect(res.status).toBe(404);
    expect(res.body.error).toMatch(/no roll 999999/);
  });
});
