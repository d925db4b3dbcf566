import { createServer } from 'node:http';
import type { AddressInfo } from 'node:net';
import knex from 'knex';
import { pino } from 'pino';
import { createApp } from './app';
import type { Env } from './config/env';
import { browserDist } from './config/paths';
import { sessionSecret } from './config/session-secret';
import { knexConfig } from './db/connection';
import type { Db } from './db/tables';
import { attachSocketServer, type Hub } from './realtime/socket-server';

/** A running hub: its address and a clean way to stop it. */
export interface RunningHub {
  url: string;
  port: number;
  db: Db;
  io: Hub;
  close(): Promise<void>;
}

/** Starts the hub: Express and socket.io on one HTTP server, connected to MariaDB. */
export async function startHub(env: Env, databaseUrl: string): Promise<RunningHub> {
  const logger = pino({ level: env.LOG_LEVEL });
  const db = knex(knexConfig(databaseUrl));
  const { app, session } = createApp({ db, env, logger, sessionSecret: sessionSecret(env.SESSION_SECRET), browserDist });
  const httpServer = createServer(app);
  const io = attachSocketServer(httpServer, db, session);

  await new Promise<void>((resolve, reject) => {
    httpServer.once('error', reject);
    httpServer.listen(env.PORT, env.HOST, resolve);
  });
  const { port } = httpServer.address() as AddressInfo;
  const host = env.HOST === '0.0.0.0' || env.HOST === '::' ? '127.0.0.1' : env.HOST;

  return {
    url: `http://${host}:${port}`,
    port,
    db,
    io,
    async close() {
      // socket.io closes the HTTP server too; then the pool, so no query is cut off mid-way.
      await new Promise<void>((resolve) => io.close(() => resolve()));
      await db.destroy();
    },
  };
}
