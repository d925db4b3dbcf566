import request from 'supertest';
import { DEMO_ACCOUNTS } from '../../seeds/data/demo-accounts';
import { pairStation, signedInOperator, signedInPerson, testApp } from './support/test-hub';

const hub = testApp();
afterAll(() => hub.close());

describe('signing in by e-mail and password', () => {
  it('answers the lead with their user and a session cookie that is HttpOnly and SameSite=Strict', async () => {
    const { email, password, name } = DEMO_ACCOUNTS.lead;
    const res = await request(hub.app).post('/api/auth/login').send({ email, password }).expect(200);
    expect(res.body).toEqual({ user: { id: expect.any(Number), name, email, role: 'lead' }, station: null });
    const cookie = res.headers['set-cookie']?.[0] ?? '';
    expect(cookie).toMatch(/^dwell\.sid=/);
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Strict/);
    expect(cookie).toMatch(/Expires=/);
  });

  it('accepts the e-mail in any letter case', async () => {
    const { email, password } = DEMO_ACCOUNTS.owner;
    const res = await request(hub.app).post('/api/auth/login').send({ email: email.toUpperCase(), password }).expect(200);
    expect(res.body.user.role).toBe('owner');
  });

  it('refuses a wrong password with 401 and a sentence, and sets no session', async () => {
    const res = await request(hub.app)
      .post('/api/auth/login')
      .send({ email: DEMO_ACCOUNTS.lead.email, password: 'not-the-password' })
      .expect(401);
    expect(res.body.error).toMatch(/do not match/);
    expect(res.headers['set-cookie']).toBeUndefined();
  });

  it('refuses an unknown e-mail with the same sentence as a wrong password', async () => {
    const unknown = await request(hub.app).post('/api/auth/login').send({ email: 'nobody@brambleyard.example', password: 'x' }).expect(401);
    const wrong = await request(hub.app).post('/api/auth/login').send({ email: DEMO_ACCOUNTS.lead.email, password: 'x' }).expect(401);
    expect(unknown.body.error).toBe(wrong.body.error);
  });

  it('lets /api/auth/me tell who is signed in, and answers 401 after logout', async () => {
    const agent = await signedInPerson(hub.app, 'owner');
    const me = await agent.get('/api/auth/me').expect(200);
    expect(me.body.user.email).toBe(DEMO_ACCOUNTS.owner.email);
    await agent.post('/api/auth/logout').expect(204);
    const after = await agent.get('/api/auth/me').expect(401);
    expect(after.body.error).toMatch(/Sign in/);
  });

  it('keeps no session for a deactivated person even if their cookie is still held', async () => {
    const agent = await signedInPerson(hub.app, 'lead');
    const lead = await hub.db('users').where({ email: DEMO_ACCOUNTS.lead.email }).first();
    await hub.db('users').where({ id: lead!.id }).update({ active: false });
    try {
      await agent.get('/api/auth/me').expect(401);
    } finally {
      await hub.db('users').where({ id: lead!.id }).update({ active: true });
    }
  });
});

describe('signing in with a PIN on a paired station tablet', () => {
  it('shows a paired tablet its station and the operators who may sign in there', async () => {
    const { deviceToken } = await pairStation(hub.app, 'Weed 1', hub.db);
    const res = await request(hub.app).post('/api/auth/device').send({ deviceToken }).expect(200);
    expect(res.body.station).toEqual({ id: expect.any(Number), name: 'Weed 1', kind: 'weed' });
    const names = res.body.operators.map((op: { name: string }) => op.name);
    for (const operator of DEMO_ACCOUNTS.operators) expect(names).toContain(operator.name);
  });

  it('signs the operator in to the station with the right PIN, with or without picking their name', async () => {
    const { deviceToken } = await pairStation(hub.app, 'Press 1', hub.db);
    const operator = DEMO_ACCOUNTS.operators[1];
    const res = await request(hub.app).post('/api/auth/pin').send({ deviceToken, pin: operator.pin }).expect(200);
    expect(res.body.user).toMatchObject({ name: operator.name, role: 'operator' });
    expect(res.body.station).toMatchObject({ name: 'Press 1', kind: 'press' });
  });

  it('refuses a wrong PIN with 401 and a sentence', async () => {
    const { deviceToken } = await pairStation(hub.app, 'Press 1', hub.db);
    const res = await request(hub.app).post('/api/auth/pin').send({ deviceToken, pin: '0000' }).expect(401);
    expect(res.body.error).toMatch(/PIN is not right/);
  });

  it('refuses a PIN on a tablet that is not paired', async () => {
    const res = await request(hub.app).post('/api/auth/pin').send({ deviceToken: 'x'.repeat(43), pin: DEMO_ACCOUNTS.operators[0].pin }).expect(401);
    expect(res.body.error).toMatch(/not paired/);
  });

  it('does not let an inactive operator in, even with their PIN', async () => {
    const { deviceToken } = await pairStation(hub.app, 'Pack 1', hub.db);
    const inactive = await hub.db('users').where({ role: 'operator', active: false }).first();
    expect(inactive).toBeDefined();
    await request(hub.app).post('/api/auth/pin').send({ deviceToken, pin: '9999', userId: inactive!.id }).expect(401);
  });

  it('ends operator sessions on a tablet when the station is paired with another tablet', async () => {
    const { agent } = await signedInOperator(hub.app, hub.db, 'Press 2');
    await agent.get('/api/auth/me').expect(200);
    await pairStation(hub.app, 'Press 2', hub.db);
    await agent.get('/api/auth/me').expect(401);
  });

  it('refuses a PIN that is not 4 to 6 digits with 400 naming the field', async () => {
    const { deviceToken } = await pairStation(hub.app, 'Cut 1', hub.db);
    const res = await request(hub.app).post('/api/auth/pin').send({ deviceToken, pin: '123' }).expect(400);
    expect(res.body.error).toMatch(/pin: A PIN is 4 to 6 digits/);
  });
});

describe('wall displays', () => {
  it('signs a display in with its token as the display role, and refuses it once revoked', async () => {
    const lead = await signedInPerson(hub.app, 'lead');
    const made = await lead.post('/api/displays').send({ name: 'Wall by the presses' }).expect(201);
    const display = request.agent(hub.app);
    const res = await display.post('/api/auth/display').send({ deviceToken: made.body.deviceToken }).expect(200);
    expect(res.body.user).toMatchObject({ name: 'Wall by the presses', role: 'display', email: null });
    await lead.delete(`/api/displays/${made.body.id}`).expect(204);
    await display.get('/api/auth/me').expect(401);
    await request(hub.app).post('/api/auth/display').send({ deviceToken: made.body.deviceToken }).expect(401);
  });
});

describe('cross-site requests', () => {
  it('refuses a state-changing request whose Origin is another site', async () => {
    const res = await request(hub.app)
      .post('/api/auth/login')
      .set('Origin', 'http://elsewhere.example')
      .send({ email: DEMO_ACCOUNTS.lead.email, password: DEMO_ACCOUNTS.lead.password })
      .expect(403);
    expect(res.body.error).toMatch(/not accepted/);
  });

  it('accepts a request whose Origin is the hub itself', async () => {
    await request(hub.app)
      .post('/api/auth/login')
      .set('Host', 'hub.local:4380')
      .set('Origin', 'http://hub.local:4380')
      .send({ email: DEMO_ACCOUNTS.lead.email, password: DEMO_ACCOUNTS.lead.password })
      .expect(200);
  });

  it('refuses a request a browser marks as cross-site even without an Origin', async () => {
    await request(hub.app).post('/api/auth/logout').set('Sec-Fetch-Site', 'cross-site').expect(403);
  });
});
