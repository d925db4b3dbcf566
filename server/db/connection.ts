import type { Knex } from 'knex';
import path from 'node:path';
import { projectRoot } from '../config/paths';

/** Knex settings for a MariaDB URL: UTC everywhere, migrations and seeds from the project's folders. */
export function knexConfig(databaseUrl: string, poolMax = 10): Knex.Config {
  return {
    client: 'mysql2',
    connection: {
      uri: databaseUrl,
      // Dates travel as UTC so a tablet in any zone and the hub agree on "now".
      timezone: 'Z',
      dateStrings: false,
      supportBigNumbers: true,
      bigNumberStrings: false,
      charset: 'utf8mb4',
    } as Knex.MySql2ConnectionConfig,
    pool: {
      min: 0,
      max: poolMax,
      afterCreate(conn: { query: (sql: string, cb: (err: Error | null) => void) => void }, done: (err: Error | null, conn: unknown) => void) {
        conn.query("SET time_zone = '+00:00'", (err) => done(err, conn));
      },
    },
    migrations: {
      directory: path.join(projectRoot, 'migrations'),
      tableName: 'knex_migrations',
      loadExtensions: ['.ts'],
    },
    seeds: {
      directory: path.join(projectRoot, 'seeds'),
      loadExtensions: ['.ts'],
    },
  };
}
