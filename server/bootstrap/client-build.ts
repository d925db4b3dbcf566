import { spawnSync } from 'node:child_process';
import { existsSync, readdirSync, statSync } from 'node:fs';
import path from 'node:path';
import { browserDist, projectRoot } from '../config/paths';

const INPUTS = ['src', 'public', 'angular.json', 'ngsw-config.json', 'tsconfig.json', 'tsconfig.app.json', 'package-lock.json'];

function newestChange(target: string): number {
  if (!existsSync(target)) return 0;
  const stat = statSync(target);
  if (!stat.isDirectory()) return target.endsWith('.spec.ts') ? 0 : stat.mtimeMs;
  return readdirSync(target).reduce((newest, entry) => Math.max(newest, newestChange(path.join(target, entry))), stat.mtimeMs);
}

/** True when the built app is missing or older than any of its sources. */
export function clientIsStale(): boolean {
  const built = path.join(browserDist, 'index.html');
  if (!existsSync(built)) return true;
  const builtAt = statSync(built).mtimeMs;
  return INPUTS.some((input) => newestChange(path.join(projectRoot, input)) > builtAt);
}

/** Builds the Angular app for production with the project's own Angular CLI. */
export function buildClient(log: (line: string) => void): void {
  log('Building the app (about 20 s)...');
  const ng = path.join(projectRoot, 'node_modules', '.bin', 'ng');
  const result = spawnSync(ng, ['build', '--configuration', 'production'], {
    cwd: projectRoot,
    stdio: 'inherit',
    env: { ...process.env, NG_CLI_ANALYTICS: 'false' },
  });
  if (result.status !== 0) throw new Error('The app did not build; the messages above say why.');
}
