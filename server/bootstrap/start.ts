import os from 'node:os';
import { DEMO_ACCOUNTS } from '../../seeds/data/demo-accounts';
import { readEnv } from '../config/env';
import { prepareDatabase } from '../db/prepare';
import { startHub } from '../hub';
import { buildClient, clientIsStale } from './client-build';
import { databaseServer } from './database-server';

const log = (line: string) => console.log(`[dwell] ${line}`);

function lanAddresses(port: number): string[] {
  return Object.values(os.networkInterfaces())
    .flat()
    .filter((addr) => addr && addr.family === 'IPv4' && !addr.internal)
    .map((addr) => `http://${addr!.address}:${port}`);
}

// npm start: database server, migrations, demo seed, app build, then the hub in the foreground.
async function main(): Promise<void> {
  const env = readEnv();
  const { databaseUrl } = await databaseServer(env.DATABASE_URL, log);
  await prepareDatabase(databaseUrl, log);
  if (clientIsStale()) buildClient(log);
  const hub = await startHub(env, databaseUrl);

  const lines = [
    '',
    `Dwell is running: ${hub.url}`,
    ...(env.HOST === '0.0.0.0' ? lanAddresses(hub.port).map((url) => `  tablets on the shop network: ${url}`) : []),
    '',
    'Demo sign-ins (demo data only; change them before real use):',
    `  owner  ${DEMO_ACCOUNTS.owner.email}  password ${DEMO_ACCOUNTS.owner.password}`,
    `  lead   ${DEMO_ACCOUNTS.lead.email}  password ${DEMO_ACCOUNTS.lead.password}`,
    `  operators (PIN on a station tablet a lead has paired): ${DEMO_ACCOUNTS.operators.map((op) => `${op.name} ${op.pin}`).join(', ')}`,
    '',
    'Ctrl-C stops the hub (MariaDB keeps running for the next start).',
  ];
  console.log(lines.join('\n'));

  const stop = async (signal: string) => {
    log(`${signal}: stopping the hub...`);
    await hub.close();
    process.exit(0);
  };
  process.once('SIGINT', () => void stop('SIGINT'));
  process.once('SIGTERM', () => void stop('SIGTERM'));
}

main().catch((error: unknown) => {
  console.error(`[dwell] ${error instanceof Error ? error.message : String(error)}`);
  process.exit(1);
});
