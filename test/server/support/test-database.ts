/** The throwaway database prefix URL that `npm test` hands to jest. */
export function testDatabasePrefixUrl(): string {
  const url = process.env['DWELL_TEST_DATABASE_URL'];
  if (!url) {
    throw new Error('DWELL_TEST_DATABASE_URL is not set: run the tests with `npm test` (or `npm run test:unit`), which prepares the databases.');
  }
  return url;
}

/** This jest worker's own migrated and seeded database. */
export function workerDatabaseUrl(): string {
  const base = new URL(testDatabasePrefixUrl());
  base.pathname = `${base.pathname}_w${process.env['JEST_WORKER_ID'] ?? '1'}`;
  return base.toString();
}
