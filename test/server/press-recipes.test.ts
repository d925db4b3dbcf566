import type TestAgent from 'supertest/lib/agent';
import { signedInOperator, signedInPerson, testApp } from './support/test-hub';

const hub = testApp();
let owner: TestAgent;
let lead: TestAgent;
let operator: TestAgent;

beforeAll(async () => {
  owner = await signedInPerson(hub.app, 'owner');
  lead = await signedInPerson(hub.app, 'lead');
  operator = (await signedInOperator(hub.app, hub.db, 'Press 1', 0)).agent;
});
afterAll(() => hub.close());

async function idOf(table: 'film_types' | 'fabrics', name: string): Promise<number> {
  return (await hub.db(table).where({ name }).first('id'))!.id;
}

async function recipeId(filmType: string, fabric: string): Promise<number> {
  const row = await hub.db('recipes').where({ film_type_id: await idOf('film_types', filmType), fabric_id: await idOf('fabrics', fabric) }).first('id');
  return row!.id;
}

describe('GET /api/recipes', () => {
  it('lists the Recipe book with film type and fabric names, and the floor may read it', async () => {
    const res = await operator.get('/api/recipes').expect(200);
    const standardOnCotton = res.body.find((r: { filmTypeName: string; fabricName: string }) => r.filmTypeName === 'Standard PU 90 µm' && r.fabricName === '100% cotton');
    expect(standardOnCotton).toMatchObject({ tempC: 150, tempF: 302, dwellS: 12, pressureClass: 'medium', peel: 'warm', tackS: 2, secondPressS: 3 });
    expect(standardOnCotton.source).toMatch(/film supplier's instructions/);
  });
});

describe('PUT /api/recipes/:id', () => {
  it('changes the values and keeps the change, with before and after, in the history', async () => {
    const id = await recipeId('Stretch PU 75 µm', 'Cotton canvas');
    const original = (await lead.get('/api/recipes').expect(200)).body.find((r: { id: number }) => r.id === id);
    const values = { tempC: 158, dwellS: 14, pressureClass: 'heavy', peel: 'warm', prePressS: 5, tackS: 3, secondPressS: null, notes: 'Thick canvas: a longer dwell.', source: 'Supplier sheet, test edit' };
    const res = await lead.put(`/api/recipes/${id}`).send(values).expect(200);
    expect(res.body).toMatchObject({ id, ...values, filmTypeName: 'Stretch PU 75 µm', fabricName: 'Cotton canvas' });

    const history = await owner.get(`/api/recipes/${id}/revisions`).expect(200);
    expect(history.body[0]).toMatchObject({ recipeId: id, changedBy: { name: 'Tobias Reyne' } });
    expect(history.body[0].before).toMatchObject({ temp_c: original.tempC, pressure_class: original.pressureClass });
    expect(history.body[0].after).toMatchObject({ temp_c: 158, pressure_class: 'heavy', notes: 'Thick canvas: a longer dwell.' });
    // The seeded first revision stays below it.
    expect(history.body.at(-1).before).toBeNull();

    const { id: _id, filmTypeId: _f, fabricId: _b, filmTypeName: _n, fabricName: _m, tempF: _t, updatedAt: _u, ...restore } = original;
    await owner.put(`/api/recipes/${id}`).send(restore).expect(200);
  });

  it('refuses a temperature outside 80-230 °C with 400 naming the field, and writes no revision', async () => {
    const id = await recipeId('Stretch PU 75 µm', 'Cotton canvas');
    const count = async () => Number((await hub.db('recipe_revisions').where({ recipe_id: id }).count({ n: '*' }))[0]!.n);
    const before = await count();
    const res = await lead.put(`/api/recipes/${id}`).send({ tempC: 260, dwellS: 12, pressureClass: 'firm', peel: 'hot', source: 'x' }).expect(400);
    expect(res.body.error).toMatch(/tempC: tempC must be at most 230 °C/);
    expect(await count()).toBe(before);
  });

  it('refuses a dwell of 0 s with 400 naming the field', async () => {
    const id = await recipeId('Stretch PU 75 µm', 'Cotton canvas');
    const res = await lead.put(`/api/recipes/${id}`).send({ tempC: 150, dwellS: 0, pressureClass: 'firm', peel: 'hot', source: 'x' }).expect(400);
    expect(res.body.details).toEqual([expect.objectContaining({ path: 'dwellS' })]);
  });

  it('answers an unknown recipe with 404 and a sentence', async () => {
    const res = await lead.put('/api/recipes/999999').send({ tempC: 150, dwellS: 10, pressureClass: 'firm', peel: 'hot', source: 'x' }).expect(404);
    expect(res.body.error).toMatch(/There is no recipe 999999/);
  });
});

describe('POST /api/recipes', () => {
  it('adds a missing film x fabric recipe with its first revision, after which the press card resolves', async () => {
    const filmTypeId = await idOf('film_types', 'Flock 450 µm');
    const fabricId = await idOf('fabrics', 'Nylon');
    const created = await owner
      .post('/api/recipes')
      .send({ filmTypeId, fabricId, tempC: 125, dwellS: 10, pressureClass: 'firm', peel: 'cold', source: 'Test sheet' })
      .expect(201);
    try {
      expect(created.body).toMatchObject({ filmTypeName: 'Flock 450 µm', fabricName: 'Nylon', tempC: 125, prePressS: 0, tackS: 0, secondPressS: null, notes: '' });
      const history = await owner.get(`/api/recipes/${created.body.id}/revisions`).expect(200);
      expect(history.body).toEqual([expect.objectContaining({ before: null, after: expect.objectContaining({ temp_c: 125 }) })]);

      const again = await lead.post('/api/recipes').send({ filmTypeId, fabricId, tempC: 120, dwellS: 10, pressureClass: 'firm', peel: 'cold', source: 'Test sheet' }).expect(409);
      expect(again.body.error).toMatch(/already has a recipe for Flock 450 µm on Nylon/);
    } finally {
      await hub.db('recipes').where({ id: created.body.id }).delete();
    }
  });

  it('answers an unknown film type with 400 and a sentence', async () => {
    const res = await owner.post('/api/recipes').send({ filmTypeId: 999999, fabricId: 1, tempC: 125, dwellS: 10, pressureClass: 'firm', peel: 'cold', source: 'Test' }).expect(400);
    expect(res.body.error).toMatch(/There is no film type 999999/);
  });

  it('asks for the source of the values', async () => {
    const res = await owner.post('/api/recipes').send({ filmTypeId: 1, fabricId: 1, tempC: 125, dwellS: 10, pressureClass: 'firm', peel: 'cold' }).expect(400);
    expect(res.body.details).toEqual([expect.objectContaining({ path: 'source' })]);
  });
});
