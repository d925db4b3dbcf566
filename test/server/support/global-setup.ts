import { withDatabase } from '../../../server/db/databases';
import { prepareDatabase } from '../../../server/db/prepare';
import { testDatabasePrefixUrl } from './test-database';

// One migrated, seeded database per jest worker, so parallel test files never share rows.
export default async function globalSetup(globalConfig: { maxWorkers: number }): Promise<void> {
  const base = testDatabasePrefixUrl();
  const prefix = new URL(base).pathname.slice(1);
  const workers = Math.max(1, globalConfig.maxWorkers);
  await Promise.all(
    Array.from({ length: workers }, (_, i) => prepareDatabase(withDatabase(base, `${prefix}_w${i + 1}`), () => {}, { seed: 'always' })),
  );
}
