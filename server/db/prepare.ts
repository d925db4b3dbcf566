import knex from 'knex';
import { knexConfig } from './connection';
import { createDatabase } from './databases';

/** Creates the database if needed, runs every pending migration, and seeds the demo shop into an empty one. */
export async function prepareDatabase(databaseUrl: string, log: (line: string) => void, options: { seed: 'if-empty' | 'always' | 'never' } = { seed: 'if-empty' }): Promise<void> {
  await createDatabase(databaseUrl);
  const db = knex(knexConfig(databaseUrl, 2));
  try {
    const [, applied] = (await db.migrate.latest()) as [number, string[]];
    if (applied.length) log(`Applied ${applied.length} migration(s).`);
    const empty = Number((await db('users').count({ n: '*' }))[0]?.['n'] ?? 0) === 0;
    if (options.seed === 'always' || (options.seed === 'if-empty' && empty)) {
      log('Seeding the demo shop...');
      await db.seed.run();
    }
  } finally {
    await db.destroy();
  }
}
