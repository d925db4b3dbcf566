// Runs every *.bench.ts in this folder in turn: `npm run bench`. Benchmarks print their own numbers
// with ratios against a baseline measured in the same run, because machines here are noisy.
import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';

async function main(): Promise<void> {
  const files = readdirSync(__dirname).filter((name) => name.endsWith('.bench.ts')).sort();
  for (const file of files) {
    console.log(`\n== ${file}`);
    await import(pathToFileURL(join(__dirname, file)).href);
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
