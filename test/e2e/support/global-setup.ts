import { readEnv } from '../../../server/config/env';
import { withDatabase } from '../../../server/db/databases';
import { prepareDatabase } from '../../../server/db/prepare';
import { startHub } from '../../../server/hub';
import { e2ePort } from './e2e-hub';

// A hub of its own on a freshly seeded database; Playwright calls the returned function when done.
export default async function globalSetup(): Promise<() => Promise<void>> {
  const base = process.env['DWELL_TEST_DATABASE_URL'];
  if (!base) throw new Error('Run the journeys through `npm test` (or `npm test -- e2e`), which prepares the database.');
  const databaseUrl = withDatabase(base, `${new URL(base).pathname.slice(1)}_e2e`);
  await prepareDatabase(databaseUrl, () => {}, { seed: 'always' });
  const env = readEnv({ ...process.env, NODE_ENV: 'test', HOST: '127.0.0.1', PORT: String(e2ePort()), LOG_LEVEL: 'silent', SESSION_SECRET: 'e2e-'.repeat(10) });
  const hub = await startHub(env, databaseUrl);
  return () => hub.close();
}
