import knex from 'knex';
import { localDatabaseUrl } from '../bootstrap/local-database-url';
import { knexConfig } from './connection';

// `npm run migrate -- latest|rollback|status`: Knex's migrator on the configured database.
async function main(action: string): Promise<void> {
  const db = knex(knexConfig(process.env['DATABASE_URL'] ?? localDatabaseUrl(), 1));
  try {
    if (action === 'latest') console.log(await db.migrate.latest());
    else if (action === 'rollback') console.log(await db.migrate.rollback());
    else if (action === 'status') console.log(await db.migrate.list());
    else throw new Error(`Unknown action "${action}": use latest, rollback or status.`);
  } finally {
    await db.destroy();
  }
}

main(process.argv[2] ?? 'status').catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
