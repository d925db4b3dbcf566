import knex from 'knex';
import { knexConfig } from '../../server/db/connection';
import { createDatabase, dropDatabase, withDatabase } from '../../server/db/databases';
import { testDatabasePrefixUrl } from './support/test-database';

const url = withDatabase(testDatabasePrefixUrl(), `${new URL(testDatabasePrefixUrl()).pathname.slice(1)}_migrations`);
const db = knex(knexConfig(url, 1));

beforeAll(() => createDatabase(url));
afterAll(async () => {
  await db.destroy();
  await dropDatabase(url);
});

const tables = async () => {
  const [rows] = (await db.raw('SHOW TABLES')) as [Record<string, string>[]];
  return rows.map((row) => Object.values(row)[0]).filter((name) => !name!.startsWith('knex_')).sort();
};

describe('migrations', () => {
  it('run up to the full schema, down to nothing, and up again', async () => {
    await db.migrate.latest();
    const full = await tables();
    expect(full).toEqual(expect.arrayContaining(['users', 'stations', 'bags', 'events', 'recipes', 'rolls', 'web_sessions', 'mail_log']));

    await db.migrate.rollback(undefined, true);
    expect(await tables()).toEqual([]);

    await db.migrate.latest();
    expect(await tables()).toEqual(full);
  });

  it('seed the demo shop twice without a duplicate-key error', async () => {
    await db.migrate.latest();
    await db.seed.run();
    await db.seed.run();
    const [{ n }] = (await db('users').count({ n: '*' })) as [{ n: number }];
    expect(Number(n)).toBeGreaterThanOrEqual(6);
  });

  it('number events in arrival order by themselves', async () => {
    await db.migrate.latest();
    // The demo seed stores events of its own; this test looks only at the two it adds.
    await db('spoils').delete();
    await db('events').delete();
    const event = (id: string) => ({ id, kind: 'scan' as const, client_at: new Date(), payload: db.raw('?', ['{}']) });
    await db('events').insert(event('00000000-0000-4000-8000-000000000001'));
    await db('events').insert(event('00000000-0000-4000-8000-000000000002'));
    const rows = await db('events').select('id', 'seq').orderBy('seq');
    expect(rows.map((row) => row.id)).toEqual(['00000000-0000-4000-8000-000000000001', '00000000-0000-4000-8000-000000000002']);
    expect(rows[1]!.seq).toBeGreaterThan(rows[0]!.seq);
    await db('events').delete();
  });
});
