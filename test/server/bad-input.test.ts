import request from 'supertest';
import { JSON_BODY_LIMIT } from '../../server/app';
import { signedInPerson, testApp } from './support/test-hub';

const hub = testApp();
afterAll(() => hub.close());

describe('bad input gets a 4xx with a sentence, never a crash', () => {
  it('answers malformed JSON with 400 and says it is not valid JSON', async () => {
    const res = await request(hub.app).post('/api/auth/login').set('Content-Type', 'application/json').send('{"email": "a@b.example",').expect(400);
    expect(res.body).toEqual({ error: expect.stringMatching(/not valid JSON/) });
  });

  it('answers missing fields with 400 naming the field', async () => {
    const res = await request(hub.app).post('/api/auth/login').send({ email: 'tobias@brambleyard.example' }).expect(400);
    expect(res.body.error).toMatch(/password/);
    expect(res.body.details).toEqual([expect.objectContaining({ path: 'password' })]);
  });

  it('answers wrong types with 400 naming the field', async () => {
    const res = await request(hub.app).post('/api/auth/pin').send({ deviceToken: 'a'.repeat(43), pin: 2468 }).expect(400);
    expect(res.body.details).toEqual([expect.objectContaining({ path: 'pin' })]);
  });

  it(`answers a body over the ${JSON_BODY_LIMIT} limit with 413 and a sentence`, async () => {
    const res = await request(hub.app)
      .post('/api/auth/login')
      .send({ email: 'x@y.example', password: 'p'.repeat(300 * 1024) })
      .expect(413);
    expect(res.body.error).toMatch(/larger than the hub accepts/);
  });

  it('answers a non-numeric station id with 400 rather than a database error', async () => {
    const lead = await signedInPerson(hub.app, 'lead');
    const res = await lead.post('/api/stations/press-one/pair').expect(400);
    expect(res.body.error).toMatch(/id: A station id is a whole number/);
  });

  it('answers an unknown station with 404 and a sentence', async () => {
    const lead = await signedInPerson(hub.app, 'lead');
    const res = await lead.post('/api/stations/999999/pair').expect(404);
    expect(res.body.error).toMatch(/There is no station 999999/);
  });

  it('answers an unknown API path with a JSON 404', async () => {
    const res = await request(hub.app).get('/api/no-such-thing').expect(404);
    expect(res.body.error).toMatch(/There is no GET \/api\/no-such-thing/);
  });

  it('never shows a stack trace when something unexpected fails', async () => {
    const broken = await testAppWithBrokenDatabase();
    const res = await request(broken.app).post('/api/auth/login').send({ email: 'a@b.example', password: 'x' }).expect(500);
    expect(res.body).toEqual({ error: expect.stringMatching(/Something went wrong on the hub/) });
    expect(JSON.stringify(res.body)).not.toMatch(/at .*\.ts/);
    await broken.close();
  });
});

/** The app after its database pool was shut: every query fails, as if MariaDB had gone away. */
async function testAppWithBrokenDatabase() {
  const app = testApp();
  await app.db.destroy();
  return { app: app.app, close: async () => {} };
}
