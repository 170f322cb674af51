// Runs every core benchmark, each in its own Node process so peak memory is its own.
// Usage: npm run bench (from the root or from core/). Each *.bench.ts prints its own table.
import { spawnSync } from 'node:child_process';
import { readdirSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const here = dirname(fileURLToPath(import.meta.url));
const only = process.argv[2];
const files = readdirSync(here)
  .filter((f) => f.endsWith('.bench.ts'))
  .filter((f) => !only || f.includes(only))
  .sort();
let failed = 0;
for (const f of files) {
  console.log(`\n=== ${f} ===`);
  const r = spawnSync(process.execPath, ['--expose-gc', '--max-old-space-size=8192', '--import', 'tsx', join(here, f)], {
    stdio: 'inherit',
    cwd: join(here, '..'),
  });
  if (r.status !== 0) failed++;
}
process.exit(failed ? 1 : 0);
