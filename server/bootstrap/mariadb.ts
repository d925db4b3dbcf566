import { spawn, spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, statSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import mysql from 'mysql2/promise';
import { APP_USER, appPassword, localMariadbPort, mariadbDir } from './local-database-url';

const dataDir = path.join(mariadbDir, 'data');
const pidFile = path.join(mariadbDir, 'mariadbd.pid');
const errorLog = path.join(mariadbDir, 'mariadbd.err');

// A unix socket path over 107 characters aborts mariadbd; fall back to the temp folder for deep clones.
const socketPath = (() => {
  const inProject = path.join(mariadbDir, 'mariadbd.sock');
  return inProject.length < 100 ? inProject : path.join(os.tmpdir(), `dwell-mariadb-${localMariadbPort()}.sock`);
})();

const isRoot = () => typeof process.getuid === 'function' && process.getuid() === 0;

function findBinary(name: string): string | undefined {
  for (const dir of ['/usr/sbin', '/usr/bin', '/usr/local/sbin', '/usr/local/bin']) {
    const candidate = path.join(dir, name);
    if (existsSync(candidate)) return candidate;
  }
  return undefined;
}

function run(command: string, args: string[], env: NodeJS.ProcessEnv = process.env): void {
  const result = spawnSync(command, args, { stdio: 'inherit', env });
  if (result.status !== 0) throw new Error(`${command} ${args.join(' ')} failed (exit ${result.status ?? result.signal}).`);
}

/** Installs Debian's mariadb-server when the server binary is missing (as root), or says how to. */
export function ensureMariadbInstalled(log: (line: string) => void): void {
  if (findBinary('mariadbd') && findBinary('mariadb-install-db')) return;
  if (!isRoot()) {
    throw new Error(
      'MariaDB is not installed. Install it with:\n  sudo apt-get update && sudo apt-get install -y mariadb-server\n' +
        'then run the command again (or set DATABASE_URL to an existing MariaDB server).',
    );
  }
  log('MariaDB is not installed: installing Debian\'s mariadb-server (about a minute)...');
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  run('apt-get', ['update', '-qq'], env);
  run('apt-get', ['install', '-y', '-qq', '--no-install-recommends', 'mariadb-server'], env);
}

async function adminConnection(): Promise<mysql.Connection> {
  return mysql.createConnection({ socketPath, user: 'root', multipleStatements: true });
}

async function answers(): Promise<boolean> {
  try {
    const conn = await adminConnection();
    await conn.query('SELECT 1');
    await conn.end();
    return true;
  } catch {
    return false;
  }
}

function initialiseDataDir(log: (line: string) => void): void {
  if (existsSync(path.join(dataDir, 'mysql'))) return;
  log(`Creating the MariaDB data folder in ${path.relative(process.cwd(), dataDir)}...`);
  mkdirSync(dataDir, { recursive: true });
  const args = ['--no-defaults', `--datadir=${dataDir}`, '--auth-root-authentication-method=normal', '--skip-test-db'];
  if (isRoot()) args.push('--user=root');
  const result = spawnSync(findBinary('mariadb-install-db')!, args, { encoding: 'utf8' });
  if (result.status !== 0) throw new Error(`mariadb-install-db failed:\n${result.stdout}\n${result.stderr}`);
}

/** A server this project started, which the caller may stop again. */
export interface LocalMariadb {
  startedHere: boolean;
  stop(): Promise<void>;
}

/** Starts the project's own MariaDB on 127.0.0.1 (or reuses the running one) and makes the app user. */
export async function ensureLocalMariadb(log: (line: string) => void): Promise<LocalMariadb> {
  ensureMariadbInstalled(log);
  mkdirSync(mariadbDir, { recursive: true });
  let startedHere = false;
  if (!(await answers())) {
    initialiseDataDir(log);
    const args = [
      '--no-defaults',
      `--datadir=${dataDir}`,
      '--bind-address=127.0.0.1',
      `--port=${localMariadbPort()}`,
      `--socket=${socketPath}`,
      `--pid-file=${pidFile}`,
      `--log-error=${errorLog}`,
      '--skip-name-resolve',
      '--character-set-server=utf8mb4',
      '--collation-server=utf8mb4_unicode_ci',
      '--innodb-buffer-pool-size=128M',
    ];
    if (isRoot()) args.push('--user=root');
    const logSizeBefore = existsSync(errorLog) ? statSync(errorLog).size : 0;
    const child = spawn(findBinary('mariadbd')!, args, { detached: true, stdio: 'ignore' });
    child.unref();
    startedHere = true;
    log(`Starting MariaDB on 127.0.0.1:${localMariadbPort()}...`);
    const deadline = Date.now() + 30_000;
    while (!(await answers())) {
      if (portTaken(logSizeBefore)) {
        throw new Error(
          `Port ${localMariadbPort()} on 127.0.0.1 is already in use by another program (perhaps another MariaDB). ` +
            'Set MARIADB_PORT to a free port, or DATABASE_URL to use the server that is running there.',
        );
      }
      if (Date.now() > deadline) {
        const tail = existsSync(errorLog) ? readFileSync(errorLog, 'utf8').split('\n').slice(-15).join('\n') : '';
        throw new Error(`MariaDB did not start within 30 s. Its log says:\n${tail}`);
      }
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
  }
  await ensureAppUser();
  return {
    startedHere,
    async stop() {
      if (!existsSync(pidFile)) return;
      const pid = Number(readFileSync(pidFile, 'utf8').trim());
      try {
        process.kill(pid, 'SIGTERM');
      } catch {
        return;
      }
      const deadline = Date.now() + 20_000;
      while (Date.now() < deadline) {
        try {
          process.kill(pid, 0);
        } catch {
          return;
        }
        await new Promise((resolve) => setTimeout(resolve, 100));
      }
    },
  };
}

/** Whether mariadbd wrote, since the given log size, that its port is taken. */
function portTaken(logSizeBefore: number): boolean {
  return existsSync(errorLog) && /Address already in use/.test(readFileSync(errorLog).subarray(logSizeBefore).toString('utf8'));
}

async function ensureAppUser(): Promise<void> {
  const conn = await adminConnection();
  try {
    const password = appPassword();
    // With --skip-name-resolve a TCP login from 127.0.0.1 does not match 'localhost': create both.
    for (const host of ['localhost', '127.0.0.1']) {
      await conn.query(`CREATE USER IF NOT EXISTS ?@? IDENTIFIED BY ?`, [APP_USER, host, password]);
      await conn.query(`ALTER USER ?@? IDENTIFIED BY ?`, [APP_USER, host, password]);
      // The app user owns every database named dwell...: the main one and the throwaway test ones.
      await conn.query(`GRANT ALL PRIVILEGES ON \`dwell%\`.* TO ?@?`, [APP_USER, host]);
    }
  } finally {
    await conn.end();
  }
}
