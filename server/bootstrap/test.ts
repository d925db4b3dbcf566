import { spawn } from 'node:child_process';
import { existsSync, readdirSync } from 'node:fs';
import path from 'node:path';
import { readEnv } from '../config/env';
import { projectRoot } from '../config/paths';
import { dropDatabasesStartingWith, withDatabase } from '../db/databases';
import { buildClient, clientIsStale } from './client-build';
import { databaseServer } from './database-server';

const log = (line: string) => console.log(`[dwell test] ${line}`);

function run(command: string, args: string[], env: NodeJS.ProcessEnv): Promise<number> {
  return new Promise((resolve) => {
    const child = spawn(path.join(projectRoot, 'node_modules', '.bin', command), args, { cwd: projectRoot, stdio: 'inherit', env });
    child.on('error', (error) => {
      log(`Could not run ${command}: ${error.message}`);
      resolve(1);
    });
    child.on('exit', (code, signal) => resolve(code ?? (signal ? 1 : 0)));
  });
}

const hasJourneys = () => {
  const dir = path.join(projectRoot, 'test', 'e2e');
  return existsSync(dir) && readdirSync(dir).some((file) => file.endsWith('.spec.ts'));
};

// npm test [unit|e2e]: type-check, a throwaway database on the project's MariaDB, every jest suite, the journeys.
async function main(): Promise<number> {
  const only = process.argv[2];
  const env = readEnv({ ...process.env, NODE_ENV: 'test' });
  // Jest's transforms do not type-check, so tsc checks the hub and the app (with its specs) first.
  const typecheck = only
    ? Promise.resolve(0)
    : Promise.all(['tsconfig.server.json', 'tsconfig.spec.json'].map((project) => run('tsc', ['--noEmit', '-p', project], process.env))).then((codes) => {
        const failed = codes.some((code) => code !== 0);
        if (failed) log('Type-check failed.');
        else log('Type-check passed (hub and app).');
        return failed ? 1 : 0;
      });
  const { databaseUrl, local } = await databaseServer(env.DATABASE_URL, log);
  const prefix = `dwell_test_${Date.now().toString(36)}${process.pid.toString(36)}`;
  const testEnv: NodeJS.ProcessEnv = {
    ...process.env,
    NODE_ENV: 'test',
    LOG_LEVEL: process.env['LOG_LEVEL'] ?? 'silent',
    DWELL_TEST_DATABASE_URL: withDatabase(databaseUrl, prefix),
  };
  log(`Throwaway databases: ${prefix}_*`);
  const failures: string[] = [];
  try {
    if ((await typecheck) !== 0) failures.push('type-check');
    if (only !== 'e2e') {
      // --forceExit: a failed test can leave a request or pool behind, and CI must then end, not hang.
      if ((await run('jest', ['--ci', '--forceExit'], testEnv)) !== 0) failures.push('jest');
    }
    if (only !== 'unit' && hasJourneys()) {
      if (clientIsStale()) buildClient(log);
      if ((await run('playwright', ['test'], testEnv)) !== 0) failures.push('browser journeys');
    }
  } finally {
    const dropped = await dropDatabasesStartingWith(databaseUrl, prefix);
    log(`Dropped ${dropped.length} throwaway database(s).`);
    if (local?.startedHere) await local.stop();
  }
  if (failures.length) log(`Failed: ${failures.join(', ')}.`);
  else log('Everything passed.');
  return failures.length ? 1 : 0;
}

main().then(
  (code) => process.exit(code),
  (error: unknown) => {
    console.error(`[dwell test] ${error instanceof Error ? error.message : String(error)}`);
    process.exit(1);
  },
);
