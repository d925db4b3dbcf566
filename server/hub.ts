import { readFileSync } from 'node:fs';
import { createServer, type Server } from 'node:http';
import { createServer as createTlsServer } from 'node:https';
import type { AddressInfo } from 'node:net';
import knex from 'knex';
import { pino } from 'pino';
import { createApp } from './app';
import type { Env } from './config/env';
import { browserDist } from './config/paths';
import { sessionSecret } from './config/session-secret';
import { knexConfig } from './db/connection';
import type { Db } from './db/tables';
import type { MailOutbox } from './mail/mail-outbox';
import { attachSocketServer, type Hub } from './realtime/socket-server';

/** A running hub: its address and a clean way to stop it. */
export interface RunningHub {
  url: string;
  port: number;
  db: Db;
  io: Hub;
  /** The outbox; its sink holds what was sent when no SMTP_URL is set. */
  mail: MailOutbox;
  close(): Promise<void>;
}

/** Starts the hub: Express and socket.io on one HTTP server, connected to MariaDB. */
export async function startHub(env: Env, databaseUrl: string): Promise<RunningHub> {
  const tls = tlsFiles(env);
  const logger = pino({ level: env.LOG_LEVEL });
  const db = knex(knexConfig(databaseUrl));
  const { app, session, followers, mail, shiftSummary } = createApp({ db, env, logger, sessionSecret: sessionSecret(env.SESSION_SECRET), browserDist });
  const httpServer: Server = tls ? createTlsServer(tls, app) : createServer(app);
  const io = attachSocketServer(httpServer, db, session, followers);

  await new Promise<void>((resolve, reject) => {
    httpServer.once('error', reject);
    httpServer.listen(env.PORT, env.HOST, resolve);
  });
  // Sends what was queued before a restart, and readies any order whose last batch committed just before it.
  await mail.start();
  await followers.readiness?.sweep();
  shiftSummary.start();
  const { port } = httpServer.address() as AddressInfo;
  const host = env.HOST === '0.0.0.0' || env.HOST === '::' ? '127.0.0.1' : env.HOST;

  return {
    url: `${tls ? 'https' : 'http'}://${host}:${port}`,
    port,
    db,
    io,
    mail,
    async close() {
      shiftSummary.stop();
      await mail.close();
      // socket.io closes the HTTP server too; then the pool, so no query is cut off mid-way.
      await new Promise<void>((resolve) => io.close(() => resolve()));
      await db.destroy();
    },
  };
}

/** The certificate and key to serve HTTPS with (needed for the offline app on tablets), or null for plain HTTP. */
function tlsFiles(env: Env): { cert: Buffer; key: Buffer } | null {
  if (Boolean(env.TLS_CERT_FILE) !== Boolean(env.TLS_KEY_FILE)) {
    throw new Error('Set both TLS_CERT_FILE and TLS_KEY_FILE to serve HTTPS, or neither for plain HTTP.');
  }
  if (!env.TLS_CERT_FILE || !env.TLS_KEY_FILE) return null;
  return { cert: readFileSync(env.TLS_CERT_FILE), key: readFileSync(env.TLS_KEY_FILE) };
}
