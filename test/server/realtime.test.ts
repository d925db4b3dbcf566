import { io as connect, type Socket } from 'socket.io-client';
import request from 'supertest';
import type { ClientToServerEvents, ServerToClientEvents } from '../../src/shared/socket-contract';
import { readEnv } from '../../server/config/env';
import { startHub, type RunningHub } from '../../server/hub';
import { DEMO_ACCOUNTS } from '../../seeds/data/demo-accounts';

type ClientSocket = Socket<ServerToClientEvents, ClientToServerEvents>;

let hub: RunningHub;
const sockets: ClientSocket[] = [];

beforeAll(async () => {
  const env = readEnv({ ...process.env, NODE_ENV: 'test', PORT: '0', HOST: '127.0.0.1', LOG_LEVEL: 'silent', SESSION_SECRET: 'x'.repeat(40) });
  hub = await startHub(env, process.env['DATABASE_URL']!);
});
afterAll(async () => {
  sockets.forEach((socket) => socket.disconnect());
  await hub.close();
});

function open(cookie?: string): ClientSocket {
  const socket: ClientSocket = connect(hub.url, { transports: ['websocket'], reconnection: false, extraHeaders: cookie ? { cookie } : {} });
  sockets.push(socket);
  return socket;
}

/** Waits (real time) until `check` holds, or fails after 5 s. */
async function until(check: () => boolean): Promise<void> {
  const end = Date.now() + 5000;
  while (!check()) {
    if (Date.now() > end) throw new Error('Timed out waiting for a condition.');
    await new Promise((resolve) => setTimeout(resolve, 10));
  }
}

const cookieOf = (res: request.Response) => (res.headers['set-cookie'] as unknown as string[])[0]!.split(';')[0]!;

describe('the socket server', () => {
  it('refuses a connection with no session, saying to sign in', async () => {
    const socket = open();
    const error = await new Promise<Error>((resolve) => socket.on('connect_error', resolve));
    expect(error.message).toBe('Sign in first.');
  });

  it('acknowledges an operator\'s ping, records the station as seen and tells the lead', async () => {
    const leadLogin = await request(hub.url).post('/api/auth/login').send({ email: DEMO_ACCOUNTS.lead.email, password: DEMO_ACCOUNTS.lead.password }).expect(200);
    const leadCookie = cookieOf(leadLogin);
    const station = await hub.db('stations').where({ name: 'Pack 1' }).first();
    const paired = await request(hub.url).post(`/api/stations/${station!.id}/pair`).set('Cookie', leadCookie).expect(201);
    const operator = DEMO_ACCOUNTS.operators[0];
    const pinLogin = await request(hub.url).post('/api/auth/pin').send({ deviceToken: paired.body.deviceToken, pin: operator.pin }).expect(200);

    const lead = open(leadCookie);
    await new Promise<void>((resolve) => lead.on('connect', () => resolve()));
    const updates: { stationId: number; lastSeenAt: string }[] = [];
    lead.on('station:seen', (update) => updates.push(update));

    const tablet = open(cookieOf(pinLogin));
    const reply = await tablet.timeout(5000).emitWithAck('presence:ping');
    expect(reply).toMatchObject({ role: 'operator', stationId: station!.id });

    // The connection itself is a sighting too; the ping's own one carries the ping's server time.
    await until(() => updates.some((u) => u.lastSeenAt === reply.serverTime));
    expect(updates.every((u) => u.stationId === station!.id)).toBe(true);
    const stored = await hub.db('stations').where({ id: station!.id }).first();
    expect(stored!.last_seen_at!.toISOString()).toBe(reply.serverTime);
  });

  it('records a station tablet as seen the moment its socket connects and tells the lead, with no ping', async () => {
    const leadLogin = await request(hub.url).post('/api/auth/login').send({ email: DEMO_ACCOUNTS.lead.email, password: DEMO_ACCOUNTS.lead.password }).expect(200);
    const leadCookie = cookieOf(leadLogin);
    const station = (await hub.db('stations').where({ name: 'Weed 2' }).first())!;
    const paired = await request(hub.url).post(`/api/stations/${station.id}/pair`).set('Cookie', leadCookie).expect(201);
    const pinLogin = await request(hub.url).post('/api/auth/pin').send({ deviceToken: paired.body.deviceToken, pin: DEMO_ACCOUNTS.operators[1].pin }).expect(200);
    const longAgo = new Date(Date.now() - 10 * 60 * 1000);
    await hub.db('stations').where({ id: station.id }).update({ last_seen_at: longAgo });

    const lead = open(leadCookie);
    await new Promise<void>((resolve) => lead.on('connect', () => resolve()));
    const seen = new Promise<{ stationId: number; lastSeenAt: string }>((resolve) => lead.on('station:seen', (u) => u.stationId === station.id && resolve(u)));
    const before = Date.now();
    open(cookieOf(pinLogin));

    const update = await seen;
    expect(Date.parse(update.lastSeenAt)).toBeGreaterThanOrEqual(before - 5);
    const stored = (await hub.db('stations').where({ id: station.id }).first())!;
    expect(stored.last_seen_at!.toISOString()).toBe(update.lastSeenAt);
  });
});
