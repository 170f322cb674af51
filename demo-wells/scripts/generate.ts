/**
 * Writes the demo field's generated files to demo-wells/data/.
 * Run from the repository root: `npm run generate -w demo-wells`
 * (or `npx tsx --conditions=source demo-wells/scripts/generate.ts`).
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { generateDemoField } from '../src/generate.js';

const dataDir = join(dirname(fileURLToPath(import.meta.url)), '..', 'data');
let bytes = 0;
for (const f of generateDemoField()) {
  const path = join(dataDir, ...f.path.split('/'));
  mkdirSync(dirname(path), { recursive: true });
  writeFileSync(path, f.content);
  bytes += Buffer.byteLength(f.content);
  console.log(`wrote data/${f.path}`);
}
console.log(`${(bytes / 1e6).toFixed(2)} MB in total`);
