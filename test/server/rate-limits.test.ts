import request from 'supertest';
import { DEMO_ACCOUNTS } from '../../seeds/data/demo-accounts';
import { pairStation, testApp } from './support/test-hub';

// A low limit keeps the test short; the rule is the same at the default of 10.
const hub = testApp({ LOGIN_ATTEMPTS_PER_15_MIN: 3 });
afterAll(() => hub.close());

describe('rate limits on sign-in', () => {
  it('answers 429 with a sentence after too many wrong passwords for one e-mail', async () => {
    const email = DEMO_ACCOUNTS.owner.email;
    for (let i = 0; i < 3; i++) await request(hub.app).post('/api/auth/login').send({ email, password: 'wrong' }).expect(401);
    const res = await request(hub.app).post('/api/auth/login').send({ email, password: DEMO_ACCOUNTS.owner.password }).expect(429);
    expect(res.body.error).toMatch(/Too many failed sign-ins.*Wait 15 minutes/);
  });

  it('does not count successful sign-ins toward the limit', async () => {
    const { email, password } = DEMO_ACCOUNTS.lead;
    for (let i = 0; i < 5; i++) await request(hub.app).post('/api/auth/login').send({ email, password }).expect(200);
  });

  it('answers 429 after too many wrong PINs on one tablet', async () => {
    const { deviceToken } = await pairStation(hub.app, 'Weed 2', hub.db);
    for (let i = 0; i < 3; i++) await request(hub.app).post('/api/auth/pin').send({ deviceToken, pin: '0000' }).expect(401);
    const res = await request(hub.app).post('/api/auth/pin').send({ deviceToken, pin: DEMO_ACCOUNTS.operators[0].pin }).expect(429);
    expect(res.body.error).toMatch(/Too many wrong PINs/);
  });
});
