// Benchmark: evaluateWell on a synthetic 1,000,000-sample well against a memory-bound floor
// (a plain loop that reads the same input arrays, writes the same output arrays and reads
// the outputs back once, as the summary pass does), measured in the same run.
// Run: npm run bench -w core -- pipeline (compiled by tsc, run by plain Node; see run.mjs)
import { defaultZoneParameters } from '../src/evaluation/zone-parameters.js';
import { type EvaluateWellInput, evaluateWell } from '../src/evaluation/pipeline.js';
import type { ZoneParameters } from '../src/evaluation/zone-parameters.js';
import { summariseZones } from '../src/evaluation/zone-summary.js';

const N = 1_000_000;
const ZONES = 20;
const depth = new Float64Array(N);
const gr = new Float64Array(N), rhob = new Float64Array(N), nphi = new Float64Array(N), rt = new Float64Array(N);
let seed = 12345;
const rand = () => ((seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648);
for (let i = 0; i < N; i++) {
  depth[i] = 1000 + 0.5 * i;
  const layer = Math.floor(i / 400) % 3; // 200 ft beds: sand, shaly sand, shale
  const phi = layer === 2 ? 0.06 : 0.12 + 0.12 * rand();
  gr[i] = layer === 0 ? 25 + 10 * rand() : layer === 1 ? 55 + 10 * rand() : 110 + 10 * rand();
  rhob[i] = 2.65 - 1.65 * phi;
  nphi[i] = phi + 0.02 * (rand() - 0.5);
  rt[i] = layer === 2 ? 2 + rand() : 2 + 80 * rand();
}
const top = depth[0], base = depth[N - 1];
const step = (base - top) / ZONES;

function makeInput(params: ZoneParameters, survey = false): EvaluateWellInput {
  const zones = Array.from({ length: ZONES }, (_, k) => ({
    name: `Z${k}`,
    formation: `F${k % 4}`,
    top: top + k * step,
    base: k === ZONES - 1 ? base : top + (k + 1) * step,
    params,
  }));
  const cutoffs = Object.fromEntries([0, 1, 2, 3].map((f) => [`F${f}`, { vshMax: 0.4, phiMin: 0.08, swMax: 0.6 }]));
  return {
    depth,
    depthUnit: 'ft',
    curves: { gr, rhob, nphi, rt },
    zones,
    cutoffs,
    survey: survey
      ? Array.from({ length: 200 }, (_, k) => ({ md: k * 3000, inc: Math.min(60, k * 2), azi: 30 + k * 0.5 }))
      : undefined,
  };
}

const gc = (globalThis as { gc?: () => void }).gc;
// CPU time of this process (user + system, ms) as well as wall time: on a shared, busy
// machine the CPU time is the steadier figure (waiting for a core is not counted).
function once(fn: () => unknown): [number, number] {
  gc?.();
  const c0 = process.cpuUsage();
  const t0 = performance.now();
  fn();
  const wall = performance.now() - t0;
  const c = process.cpuUsage(c0);
  return [wall, (c.user + c.system) / 1000];
}
const median = (t: number[]) => [...t].sort((a, b) => a - b)[Math.floor(t.length / 2)];

let sink = 0;
function floor(): void {
  const n = N;
  const a = new Float64Array(n), b = new Float64Array(n), c = new Float64Array(n), d = new Float64Array(n);
  const e = new Float64Array(n), f = new Float64Array(n), g = new Float64Array(n), q = new Uint8Array(n);
  for (let i = 0; i < n; i++) {
    const x = gr[i], y = rhob[i], z = rt[i], w = depth[i];
    a[i] = x; b[i] = y; c[i] = y; d[i] = z; e[i] = y * z; f[i] = w; g[i] = x; q[i] = 0;
  }
  let s = 0;
  for (let i = 0; i < n; i++) s += a[i] + c[i] + d[i] + depth[i];
  sink += s;
}

// The same floor writing into arrays allocated once (what a caller that reuses its output does).
const reusedOut = Array.from({ length: 7 }, () => new Float64Array(N));
const reusedQc = new Uint8Array(N);
function floorReused(): void {
  const n = N;
  const [a, b, c, d, e, f, g] = reusedOut;
  const q = reusedQc;
  for (let i = 0; i < n; i++) {
    const x = gr[i], y = rhob[i], z = rt[i], w = depth[i];
    a[i] = x; b[i] = y; c[i] = y; d[i] = z; e[i] = y * z; f[i] = w; g[i] = x; q[i] = 0;
  }
  let s = 0;
  for (let i = 0; i < n; i++) s += a[i] + c[i] + d[i] + depth[i];
  sink += s;
}

const base0 = { ...defaultZoneParameters('sandstone'), grClean: 20, grShale: 120, phiShale: 0.1 };
const cases: [string, EvaluateWellInput][] = [
  ['density + Archie (m = n = 2), linear Vsh', makeInput(base0)],
  ['neutron-density + Simandoux n = 2, Larionov tertiary', makeInput({ ...base0, porosityMethod: 'neutron_density', swModel: 'simandoux', rsh: 2, vshMethod: 'larionov_tertiary' })],
  ['density + Indonesia n = 2, Steiber', makeInput({ ...base0, swModel: 'indonesia', rsh: 2, vshMethod: 'steiber' })],
  ['density + Archie m = 2.15, n = 2.3 (pow path)', makeInput({ ...base0, m: 2.15, n: 2.3, a: 0.62 })],
  ['density + Simandoux n = 2.5 (iterative)', makeInput({ ...base0, swModel: 'simandoux', rsh: 2, n: 2.5 })],
  ['density + Archie, with a 200-station survey (TVD, TVT)', makeInput(base0, true)],
];

// Interleaved rounds: the floor and every case run once per round, so a busy machine slows
// them alike; we report the median and the best of the rounds.
const ROUNDS = 15;
const jobs: [string, () => unknown][] = [['floor: read inputs, write outputs, read back', floor], ...cases.map(([name, inp]) => [name, () => evaluateWell(inp)] as [string, () => unknown])];
// What the browser re-runs while a cutoff slider moves: summaries on the computed curves.
const done = evaluateWell(cases[0][1]);
// Re-evaluation into the previous result's arrays (options.output), against the reused floor.
const reuseInput: EvaluateWellInput = { ...cases[0][1], options: { output: { ...done.curves, qc: done.qc } } };
jobs.push(['floor, output arrays reused', floorReused]);
jobs.push(['density + Archie, output arrays reused (options.output)', () => evaluateWell(reuseInput)]);
jobs.push(['summariseZones only (cutoff slider move)', () => summariseZones({ depth, curves: { VSH: done.curves.VSH, PHIE: done.curves.PHIE, SW: done.curves.SW }, qc: done.qc, zones: cases[0][1].zones, cutoffs: cases[0][1].cutoffs })]);
for (const [, fn] of jobs) for (let w = 0; w < 3; w++) fn();
const wall = jobs.map(() => [] as number[]);
const cpu = jobs.map(() => [] as number[]);
for (let r = 0; r < ROUNDS; r++) {
  jobs.forEach(([, fn], j) => {
    const [w, c] = once(fn);
    wall[j].push(w);
    cpu[j].push(c);
  });
}
const fw = median(wall[0]), fc = median(cpu[0]);
const rows: string[][] = [['case', 'wall ms', 'Msamples/s', 'x floor', 'cpu ms', 'Msamples/s', 'x floor']];
jobs.forEach(([name], j) => {
  const w = median(wall[j]), c = median(cpu[j]);
  // Reused-output rows compare with the reused floor; the others with the allocating floor.
  const reusedRow = name.includes('reused');
  const refW = reusedRow ? median(wall[jobs.findIndex(([n]) => n === 'floor, output arrays reused')]) : fw;
  const refC = reusedRow ? median(cpu[jobs.findIndex(([n]) => n === 'floor, output arrays reused')]) : fc;
  rows.push([name, w.toFixed(1), (N / w / 1000).toFixed(1), (w / refW).toFixed(2), c.toFixed(1), (N / c / 1000).toFixed(1), (c / refC).toFixed(2)]);
});
const width = rows[0].map((_, j) => Math.max(...rows.map((r) => r[j].length)));
console.log(`evaluateWell on ${N.toLocaleString('en-US')} samples, ${ZONES} zones; medians of ${ROUNDS} interleaved rounds (goal >= 50 Msamples/s and <= 3x floor)`);
console.log(`load average at the end: ${(await import('node:os')).loadavg().map((x) => x.toFixed(2)).join(' ')} on ${(await import('node:os')).availableParallelism()} cores`);
for (const r of rows) console.log(r.map((c, j) => (j === 0 ? c.padEnd(width[j]) : c.padStart(width[j]))).join('  '));
if (sink === 42) console.log('');
