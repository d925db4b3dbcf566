import { readEnv } from './config/env';
import { localDatabaseUrl } from './bootstrap/local-database-url';
import { startHub } from './hub';

// Runs the hub alone against a database that is already migrated (npm start does the set-up first).
async function main(): Promise<void> {
  const env = readEnv();
  const hub = await startHub(env, env.DATABASE_URL ?? localDatabaseUrl());
  console.log(`Dwell hub listening on ${hub.url}`);
  const stop = async (signal: string) => {
    console.log(`\n${signal}: stopping the hub...`);
    await hub.close();
    process.exit(0);
  };
  process.once('SIGINT', () => void stop('SIGINT'));
  process.once('SIGTERM', () => void stop('SIGTERM'));
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
