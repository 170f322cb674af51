// LAS reading benchmark: readLas against las-js 3.4.2, a plain split-and-parseFloat loop and
// the floor (reading the file's bytes), all measured in the same run, each in its own child
// process so its peak memory (max RSS) is its own.
//
//   npm run bench -w core                          ~45 MB file (200,000 rows x 20 curves + index)
//   LAS_BENCH_BIG=1 npm run bench -w core          also a ~200 MB file, readLas and floor only
//   LAS_BENCH_REPEAT=9 npm run bench -w core       best of 9 for the fast readers (default 5)
//
// Speed goals (not asserted): >= 150 MB/s, within 3x the floor, peak memory increase <= 3x file.
import { spawnSync } from 'node:child_process';
import { closeSync, existsSync, mkdirSync, openSync, readFileSync, statSync, writeFileSync, writeSync } from 'node:fs';
import { cpus, loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { readLas, writeLas, type LasWriteCurve } from '../src/index.js';

type Which = 'floor' | 'readLas' | 'split-parseFloat' | 'las-js';
interface ChildResult {
  which: Which;
  seconds: number;
  cpuSeconds: number;
  rows: number;
  baselineMB: number;
  peakMB: number;
}

const MB = 1e6;
const self = fileURLToPath(import.meta.url);

/** mulberry32: a small seeded PRNG so the generated file is the same every run. */
function prng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function generate(path: string, rows: number, curves: number): void {
  const rand = prng(12345);
  const depth = Array.from({ length: rows }, (_, i) => 1000 + i * 0.1524);
  const list: LasWriteCurve[] = [{ mnemonic: 'DEPT', unit: 'M', values: depth, decimals: 4 }];
  for (let k = 0; k < curves; k++) {
    const base = 1 + 100 * rand();
    const values = new Float64Array(rows);
    for (let i = 0; i < rows; i++) values[i] = rand() < 0.02 ? Number.NaN : base * (0.5 + rand());
    for (let i = 5000 * k; i < 5000 * k + 300 && i < rows; i++) values[i] = Number.NaN; // a null run per curve
    list.push({ mnemonic: `C${String(k + 1).padStart(2, '0')}`, unit: 'UNIT', values, decimals: 6 });
  }
  const text = writeLas({ well: [{ mnemonic: 'WELL', value: 'BENCH WELL 1', description: 'Invented' }], curves: list });
  writeFileSync(path, text);
}

/** The same kind of file written row block by row block, for sizes where one string would not fit. */
function generateStreaming(path: string, rows: number, curves: number): void {
  const rand = prng(12345);
  const head = writeLas({
    well: [{ mnemonic: 'WELL', value: 'BENCH WELL 2', description: 'Invented' }],
    curves: [{ mnemonic: 'DEPT', unit: 'M', values: [1000, 1000 + (rows - 1) * 0.1524], decimals: 4 }, ...Array.from({ length: curves }, (_, k) => ({ mnemonic: `C${k + 1}`, values: [0, 0] }))],
  });
  const fd = openSync(path, 'w');
  writeSync(fd, head.slice(0, head.indexOf('~A')).replace(/STEP\.M\s+\S+/, 'STEP.M              0.1524') + '~A\n');
  const bases = Array.from({ length: curves }, () => 1 + 1000 * rand());
  for (let r0 = 0; r0 < rows; r0 += 10_000) {
    let chunk = '';
    for (let r = r0; r < Math.min(rows, r0 + 10_000); r++) {
      let line = (1000 + r * 0.1524).toFixed(4).padStart(11);
      for (let k = 0; k < curves; k++) line += ' ' + (rand() < 0.02 ? '-999.25' : (bases[k] * (0.5 + rand())).toFixed(6)).padStart(11);
      chunk += line + '\n';
    }
    writeSync(fd, chunk);
  }
  closeSync(fd);
}

function mem(): number {
  return process.memoryUsage().rss / MB;
}

async function child(which: Which, path: string, repeat: number): Promise<void> {
  globalThis.gc?.();
  const baselineMB = mem();
  let best = Infinity;
  let bestCpu = Infinity;
  let rows = 0;
  const runs = which === 'las-js' ? 1 : repeat;
  for (let r = 0; r < runs; r++) {
    const t0 = performance.now();
    const c0 = process.cpuUsage();
    if (which === 'floor') {
      rows = readFileSync(path).length > 0 ? 0 : 0;
    } else if (which === 'readLas') {
      rows = readLas(readFileSync(path)).rowCount;
    } else if (which === 'split-parseFloat') {
      rows = splitParseFloat(readFileSync(path, 'latin1'));
    } else {
      const { Las } = await import('las-js');
      const las = new Las(readFileSync(path, 'utf8'), { loadFile: false });
      const header = await las.header();
      await las.wellParams();
      const data = (await las.data()) as number[][];
      // The columns, as readLas returns them (las-js column() would parse the file again per curve).
      const cols = header.map((_, k) => Float64Array.from(data, (row) => row[k] as number));
      rows = cols[0].length;
    }
    best = Math.min(best, (performance.now() - t0) / 1000);
    const c = process.cpuUsage(c0);
    bestCpu = Math.min(bestCpu, (c.user + c.system) / 1e6);
    globalThis.gc?.();
  }
  const peakMB = (process.resourceUsage().maxRSS * 1024) / MB;
  process.stdout.write(JSON.stringify({ which, seconds: best, cpuSeconds: bestCpu, rows, baselineMB, peakMB } satisfies ChildResult));
}

/** The plain reference loop: split the data into lines and tokens, parseFloat each. */
function splitParseFloat(text: string): number {
  const data = text.slice(text.indexOf('\n', text.indexOf('~A')) + 1);
  const lines = data.split('\n');
  const first = lines[0].trim().split(/\s+/).length;
  const cols = Array.from({ length: first }, () => new Float64Array(lines.length));
  let r = 0;
  for (const line of lines) {
    const t = line.trim();
    if (!t) continue;
    const parts = t.split(/\s+/);
    for (let k = 0; k < first; k++) {
      const v = parseFloat(parts[k]);
      cols[k][r] = v === -999.25 ? Number.NaN : v;
    }
    r++;
  }
  return r;
}

function run(which: Which, path: string, repeat: number, extraFlags: string[] = []): ChildResult {
  const r = spawnSync(process.execPath, ['--expose-gc', ...extraFlags, self, '--child', which, path, String(repeat)], {
    encoding: 'utf8',
    maxBuffer: 1 << 20,
  });
  if (r.status !== 0) throw new Error(`${which} failed (exit ${r.status}): ${r.stderr.slice(0, 2000)}`);
  return JSON.parse(r.stdout) as ChildResult;
}

function table(sizeMB: number, results: ChildResult[]): void {
  const floor = results.find((r) => r.which === 'floor')!;
  const ours = results.find((r) => r.which === 'readLas')!;
  console.log(`file: ${sizeMB.toFixed(1)} MB, ${ours.rows} rows`);
  console.log('reader            seconds   MB/s   x floor  x readLas  cpu s  cpu x floor  peak RSS MB  increase MB  increase/file');
  for (const r of results) {
    const inc = r.peakMB - r.baselineMB;
    console.log(
      [
        r.which.padEnd(16),
        r.seconds.toFixed(3).padStart(8),
        (sizeMB / r.seconds).toFixed(0).padStart(6),
        (r.seconds / floor.seconds).toFixed(2).padStart(9),
        (r.seconds / ours.seconds).toFixed(2).padStart(10),
        r.cpuSeconds.toFixed(3).padStart(6),
        (r.cpuSeconds / floor.cpuSeconds).toFixed(2).padStart(12),
        r.peakMB.toFixed(0).padStart(12),
        inc.toFixed(0).padStart(12),
        (inc / sizeMB).toFixed(2).padStart(14),
      ].join(' '),
    );
  }
}

async function main(): Promise<void> {
  const args = process.argv.slice(2);
  if (args[0] === '--child') return child(args[1] as Which, args[2], Number(args[3]));
  const repeat = Number(process.env.LAS_BENCH_REPEAT ?? 5);
  console.log(`load average ${loadavg().map((l) => l.toFixed(1)).join(' ')} on ${cpus().length} CPUs (other processes slow every figure alike)`);
  const dir = join(tmpdir(), 'poreline-bench');
  mkdirSync(dir, { recursive: true });
  const cases: { rows: number; readers: Which[] }[] = [{ rows: 200_000, readers: ['floor', 'readLas', 'split-parseFloat', 'las-js'] }];
  if (process.env.LAS_BENCH_BIG) cases.push({ rows: 850_000, readers: ['floor', 'readLas'] });
  for (const c of cases) {
    const path = join(dir, `las-${c.rows}x21-v3.las`);
    if (!existsSync(path)) {
      const t0 = performance.now();
      if (c.rows > 200_000) generateStreaming(path, c.rows, 20);
      else generate(path, c.rows, 20);
      console.log(`generated ${path} in ${((performance.now() - t0) / 1000).toFixed(1)} s`);
    }
    const sizeMB = statSync(path).size / MB;
    // The big case runs readLas with Node's default heap limit, to show it needs no raised limit.
    const results = c.readers.map((w) => run(w, path, repeat, []));
    table(sizeMB, results);
  }
  console.log('seconds: wall time, best of runs, file read included; cpu s: user+system CPU time of the best run;');
  console.log('peak RSS: max resident set of the child process; increase: over the child before reading.');
}

await main();
