import request from 'supertest';
import { DEMO_ACCOUNTS } from '../../seeds/data/demo-accounts';
import { pairStation, signedInPerson, testApp } from './support/test-hub';

const hub = testApp();
afterAll(() => hub.close());

// Each run adds people to this worker's database; names and PINs carry a suffix so runs never clash.
const suffix = Date.now().toString().slice(-5);

describe('the People screen\'s API', () => {
  it('lets the owner add an operator who can then sign in at a station with the PIN', async () => {
    const owner = await signedInPerson(hub.app, 'owner');
    const added = await owner.post('/api/people').send({ role: 'operator', name: `Kit Marlow ${suffix}`, pin: `7${suffix}`.slice(0, 6) }).expect(201);
    expect(added.body).toMatchObject({ role: 'operator', active: true, hasPin: true, hasPassword: false, email: null });
    expect(JSON.stringify(added.body)).not.toMatch(/hash/);

    const { deviceToken } = await pairStation(hub.app, 'Weed 1', hub.db);
    await request(hub.app).post('/api/auth/pin').send({ deviceToken, pin: `7${suffix}`.slice(0, 6), userId: added.body.id }).expect(200);
  });

  it('refuses a PIN another active operator already uses, with a sentence', async () => {
    const owner = await signedInPerson(hub.app, 'owner');
    const res = await owner.post('/api/people').send({ role: 'operator', name: 'Copy Cat', pin: DEMO_ACCOUNTS.operators[0].pin }).expect(409);
    expect(res.body.error).toMatch(/Another operator already uses that PIN/);
  });

  it('adds a lead who signs in by e-mail, and refuses a second person with the same e-mail', async () => {
    const owner = await signedInPerson(hub.app, 'owner');
    const email = `nia.${suffix}@brambleyard.example`;
    await owner.post('/api/people').send({ role: 'lead', name: 'Nia Brook', email, password: 'a-long-enough-secret' }).expect(201);
    await request(hub.app).post('/api/auth/login').send({ email, password: 'a-long-enough-secret' }).expect(200);
    const again = await owner.post('/api/people').send({ role: 'lead', name: 'Nia Again', email: email.toUpperCase(), password: 'another-long-secret' }).expect(409);
    expect(again.body.error).toMatch(/already signs in with/);
  });

  it('refuses a lead without a password and an operator without a PIN, naming the field', async () => {
    const owner = await signedInPerson(hub.app, 'owner');
    const lead = await owner.post('/api/people').send({ role: 'lead', name: 'No Password', email: 'np@brambleyard.example' }).expect(400);
    expect(lead.body.details).toEqual([expect.objectContaining({ path: 'password' })]);
    const operator = await owner.post('/api/people').send({ role: 'operator', name: 'No Pin' }).expect(400);
    expect(operator.body.details).toEqual([expect.objectContaining({ path: 'pin' })]);
  });

  it('ends a deactivated person\'s sessions at once', async () => {
    const owner = await signedInPerson(hub.app, 'owner');
    const email = `temp.${suffix}@brambleyard.example`;
    const added = await owner.post('/api/people').send({ role: 'lead', name: 'Temp Lead', email, password: 'temporary-secret' }).expect(201);
    const temp = request.agent(hub.app);
    await temp.post('/api/auth/login').send({ email, password: 'temporary-secret' }).expect(200);
    await owner.patch(`/api/people/${added.body.id}`).send({ active: false }).expect(200);
    await temp.get('/api/auth/me').expect(401);
    const sessions = await hub.db('web_sessions').whereRaw("JSON_VALUE(sess, '$.principal.userId') = ?", [added.body.id]).count({ n: '*' });
    expect(Number(sessions[0]!['n'])).toBe(0);
  });

  it('never leaves the shop without an active owner', async () => {
    const owner = await signedInPerson(hub.app, 'owner');
    const me = await owner.get('/api/auth/me').expect(200);
    const res = await owner.patch(`/api/people/${me.body.user.id}`).send({ role: 'lead' }).expect(409);
    expect(res.body.error).toMatch(/at least one active owner/);
  });

  it('lets a lead reset an operator\'s PIN but not add people or set passwords', async () => {
    const lead = await signedInPerson(hub.app, 'lead');
    const operator = await hub.db('users').where({ name: DEMO_ACCOUNTS.operators[3].name }).first();
    await lead.post(`/api/people/${operator!.id}/pin`).send({ pin: `9${suffix}`.slice(0, 6) }).expect(200);
    await lead.post('/api/people').send({ role: 'operator', name: 'X', pin: '4321' }).expect(403);
    const owner = await hub.db('users').where({ email: DEMO_ACCOUNTS.owner.email }).first();
    await lead.post(`/api/people/${owner!.id}/password`).send({ password: 'taking-over-the-shop' }).expect(403);
    // Put the demo PIN back for the other tests in this worker.
    await lead.post(`/api/people/${operator!.id}/pin`).send({ pin: DEMO_ACCOUNTS.operators[3].pin }).expect(200);
  });
});
