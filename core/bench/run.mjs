// Runs every core benchmark, each in its own Node process so peak memory is its own.
// Usage: npm run bench (from the root or from core/); `npm run bench -w core -- las` runs one.
// The benchmarks and core are first compiled with tsc (tsconfig.bench.json) and run by plain
// Node, as the built service runs them: a TypeScript loader's module wrappers would add a call
// per cross-module function use inside the hot loops and distort the figures.
import { spawnSync } from 'node:child_process';
import { readdirSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const here = dirname(fileURLToPath(import.meta.url));
const root = join(here, '..');
const tsc = createRequire(import.meta.url).resolve('typescript/bin/tsc');
const built = spawnSync(process.execPath, [tsc, '-p', join(root, 'tsconfig.bench.json')], { stdio: 'inherit', cwd: root });
if (built.status !== 0) process.exit(built.status ?? 1);

const only = process.argv[2];
const outDir = join(root, '.bench-out', 'bench');
const files = readdirSync(here)
  .filter((f) => f.endsWith('.bench.ts'))
  .filter((f) => !only || f.includes(only))
  .sort();
let failed = 0;
for (const f of files) {
  console.log(`\n=== ${f} ===`);
  const r = spawnSync(process.execPath, ['--expose-gc', '--max-old-space-size=8192', join(outDir, f.replace(/\.ts$/, '.js'))], {
    stdio: 'inherit',
    cwd: root,
  });
  if (r.status !== 0) failed++;
}
process.exit(failed ? 1 : 0);
