import knex from 'knex';
import { pino } from 'pino';
import request from 'supertest';
import { createApp } from '../../../server/app';
import { readEnv, type Env } from '../../../server/config/env';
import { knexConfig } from '../../../server/db/connection';
import type { Db } from '../../../server/db/tables';
import { DEMO_ACCOUNTS } from '../../../seeds/data/demo-accounts';

/** The hub's app on this worker's real MariaDB database, for supertest. */
export function testApp(overrides: Partial<Env> = {}) {
  const env: Env = { ...readEnv({ ...process.env, NODE_ENV: 'test' }), ...overrides };
  const db: Db = knex(knexConfig(process.env['DATABASE_URL']!, 4));
  const { app } = createApp({
    db,
    env,
    logger: pino({ level: 'silent' }),
    sessionSecret: 'a test secret that is long enough to be accepted',
    browserDist: '/nonexistent',
  });
  return { app, db, env, close: () => db.destroy() };
}

/** A supertest agent signed in by e-mail as the demo owner or lead. */
export async function signedInPerson(app: Parameters<typeof request.agent>[0], who: 'owner' | 'lead') {
  const agent = request.agent(app);
  const { email, password } = DEMO_ACCOUNTS[who];
  await agent.post('/api/auth/login').send({ email, password }).expect(200);
  return agent;
}

/** Pairs a station (as the lead) and returns its fresh device token. */
export async function pairStation(app: Parameters<typeof request.agent>[0], stationName: string, db: Db): Promise<{ deviceToken: string; stationId: number }> {
  const station = await db('stations').where({ name: stationName }).first();
  if (!station) throw new Error(`No seeded station named ${stationName}`);
  const lead = await signedInPerson(app, 'lead');
  const res = await lead.post(`/api/stations/${station.id}/pair`).expect(201);
  return { deviceToken: res.body.deviceToken as string, stationId: station.id };
}

/** A supertest agent signed in by PIN as a demo operator on a freshly paired station. */
export async function signedInOperator(app: Parameters<typeof request.agent>[0], db: Db, stationName = 'Press 1', operatorIndex = 0) {
  const { deviceToken, stationId } = await pairStation(app, stationName, db);
  const operator = DEMO_ACCOUNTS.operators[operatorIndex]!;
  const user = await db('users').where({ name: operator.name }).first();
  const agent = request.agent(app);
  await agent.post('/api/auth/pin').send({ deviceToken, pin: operator.pin, userId: user!.id }).expect(200);
  return { agent, deviceToken, stationId, userId: user!.id };
}

/** A supertest agent signed in as a wall display made by the lead. */
export async function signedInDisplay(app: Parameters<typeof request.agent>[0]) {
  const lead = await signedInPerson(app, 'lead');
  const made = await lead.post('/api/displays').send({ name: 'Test wall' }).expect(201);
  const agent = request.agent(app);
  await agent.post('/api/auth/display').send({ deviceToken: made.body.deviceToken }).expect(200);
  return agent;
}
