import { io as connect, type Socket } from 'socket.io-client';
import request from 'supertest';
import { v4 as uuidv4 } from 'uuid';
import type { StationEvent } from '../../src/shared/events-contract';
import { newBagToken } from '../../src/shared/intake/bag-token';
import type { EventKind } from '../../src/shared/names';
import type { ClientToServerEvents, ServerToClientEvents } from '../../src/shared/socket-contract';
import { readEnv } from '../../server/config/env';
import type { Db } from '../../server/db/tables';
import { startHub, type RunningHub } from '../../server/hub';
import { DEMO_ACCOUNTS } from '../../seeds/data/demo-accounts';

/** A socket.io client typed by the shared contract. */
export type ClientSocket = Socket<ServerToClientEvents, ClientToServerEvents>;

/** A hub on port 0 of this worker's database, for HTTP and real socket.io clients. */
export function startTestHub(overrides: Record<string, string> = {}): Promise<RunningHub> {
  const env = readEnv({ ...process.env, NODE_ENV: 'test', PORT: '0', HOST: '127.0.0.1', LOG_LEVEL: 'silent', SESSION_SECRET: 'x'.repeat(40), ...overrides });
  return startHub(env, process.env['DATABASE_URL']!);
}

const cookieOf = (res: request.Response) => (res.headers['set-cookie'] as unknown as string[])[0]!.split(';')[0]!;

/** The lead's session cookie. */
export async function leadCookie(url: string, who: 'lead' | 'owner' = 'lead'): Promise<string> {
  const { email, password } = DEMO_ACCOUNTS[who];
  return cookieOf(await request(url).post('/api/auth/login').send({ email, password }).expect(200));
}

/** Pairs a station and signs an operator in on it; answers the cookie, station and user. */
export async function operatorOn(url: string, db: Db, stationName: string, operatorIndex = 0) {
  const station = (await db('stations').where({ name: stationName }).first())!;
  const paired = await request(url).post(`/api/stations/${station.id}/pair`).set('Cookie', await leadCookie(url)).expect(201);
  const operator = DEMO_ACCOUNTS.operators[operatorIndex]!;
  const user = (await db('users').where({ name: operator.name }).first())!;
  const res = await request(url).post('/api/auth/pin').send({ deviceToken: paired.body.deviceToken, pin: operator.pin, userId: user.id }).expect(200);
  return { cookie: cookieOf(res), stationId: station.id, userId: user.id, pressId: station.press_id };
}

/** A connected socket for a session cookie. */
export async function openSocket(url: string, cookie: string, sockets: ClientSocket[]): Promise<ClientSocket> {
  const socket: ClientSocket = connect(url, { transports: ['websocket'], reconnection: false, extraHeaders: { cookie } });
  sockets.push(socket);
  await new Promise<void>((resolve, reject) => {
    socket.on('connect', () => resolve());
    socket.on('connect_error', reject);
  });
  return socket;
}

/** A fresh bag of the seeded choir crest job (its films have recipes on cotton), so each test counts on its own bag. */
export async function freshBag(db: Db, pieces: number): Promise<{ id: number; code: string; token: string }> {
  const job = (await db('jobs').where({ name: 'Choir crest' }).first())!;
  const code = `T${Math.floor(Math.random() * 1e9)}`;
  const token = newBagToken();
  const [id] = await db('bags').insert({ order_id: job.order_id, job_id: job.id, code, token, sizes: db.raw('?', [JSON.stringify({ M: pieces })]) as never, pieces });
  return { id: id!, code, token };
}

/** A station event with a fresh UUID (from the uuid package, an independent v4 generator). */
export function stationEvent(base: { bagId: number; stationId: number; userId: number }, kind: EventKind, quantity: number, payload: object = {}): StationEvent {
  return { id: uuidv4(), ...base, kind, quantity, clientAt: new Date().toISOString(), payload } as StationEvent;
}
