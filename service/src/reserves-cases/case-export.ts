import ExcelJS from 'exceljs';
import type { CaseAuditEntryDto, ReservesCaseDto } from './dto/reserves-case.dto.js';
import { INPUT_NAMES, type InputName } from './case-inputs.js';
import { INPUT_LABELS } from './input-labels.js';

/** Cross-check tables written to the case export (filled by the production feature). */
export interface PzTable {
  seriesId: string;
  wellName: string;
  label: string;
  points: { cumGasScf: number; pressurePsia: number; z: number; pOverZ: number }[];
  fit: { intercept: number; slope: number; r2: number } | null;
  drainedGipScf: number | null;
  volumetricGipScf: number | null;
  wellsNeeded: number | null;
  assumptions: string[];
  error: string | null;
}

export interface DeclineTable {
  seriesId: string;
  wellName: string;
  label: string;
  kind: string;
  economicLimit: number;
  rateUnit: string;
  qi: number | null;
  b: number | null;
  diNominalPerYear: number | null;
  diEffectivePerYear: number | null;
  eur: number | null;
  eurUnit: string;
  points: { t: number; rate: number; fitted: number | null }[];
  error: string | null;
}

export interface CrossCheckTables {
  pz: PzTable[];
  decline: DeclineTable[];
}


function heading(ws: ExcelJS.Worksheet, text: string): void {
  const row = ws.addRow([text]);
  row.font = { bold: true, size: 12 };
}

function header(ws: ExcelJS.Worksheet, cells: string[]): void {
  const row = ws.addRow(cells);
  row.font = { bold: true };
}

function v(n: number | null | undefined): number | string {
  return n === null || n === undefined || !Number.isFinite(n) ? '' : n;
}

/**
 * The case as an XLSX workbook: the caution and conventions first, then sources with their
 * provenance, inputs with overrides and reasons, deterministic and probabilistic results,
 * histogram, exceedance curve, tornado, cross-checks and the audit trail.
 */
export async function buildCaseWorkbook(dto: ReservesCaseDto, cross: CrossCheckTables, audit: CaseAuditEntryDto[]): Promise<Buffer> {
  const wb = new ExcelJS.Workbook();
  wb.creator = 'Poreline';
  wb.created = new Date();
  const inputs = dto.inputs;
  const results = dto.resultsCurrent ? dto.results : null;
  const lengthUnit = inputs.lengthUnit;
  const areaUnit = inputs.areaUnit === 'acre' ? 'acre' : 'km2';
  const fvfUnit = inputs.fluid === 'oil' ? 'rb/STB' : 'rcf/scf';
  const unitOf: Record<InputName, string> = { area: areaUnit, netPay: lengthUnit, porosity: 'v/v', sw: 'v/v', bo: fvfUnit, recoveryFactor: 'v/v' };

  // Summary
  const s = wb.addWorksheet('Summary');
  s.columns = [{ width: 34 }, { width: 60 }];
  heading(s, `Reserves case: ${dto.name}`);
  s.addRow(['Caution', dto.caution]);
  s.addRow(['Formation', dto.formationName]);
  s.addRow(['Status', dto.status]);
  s.addRow(['Revision', dto.revision]);
  s.addRow(['Seed', dto.seed]);
  s.addRow(['Fluid', inputs.fluid]);
  s.addRow(['Created by', dto.createdBy?.name ?? '']);
  s.addRow(['Submitted', dto.submittedAt ? `${dto.submittedAt} by ${dto.submittedBy?.name ?? ''}` : '']);
  s.addRow(['Reviewed', dto.reviewedAt ? `${dto.reviewedAt} by ${dto.reviewedBy?.name ?? ''}` : '']);
  s.addRow(['Review comment', dto.reviewComment ?? '']);
  s.addRow(['Results', results ? `run ${results.ranAt} on revision ${results.revision}` : 'not run on the current revision']);
  s.addRow(['Exported', new Date().toISOString()]);
  s.addRow([]);
  heading(s, 'Conventions');
  for (const c of dto.conventions) s.addRow(['', c]);
  s.getColumn(2).alignment = { wrapText: true, vertical: 'top' };

  // Sources
  const src = wb.addWorksheet('Sources');
  header(src, ['Well', 'Interpretation id', 'Version', 'Approved at', 'Newest approved version', 'Stale', 'Depth unit', 'Net pay (depth unit)', 'Net pay (ft)', 'Porosity (v/v)', 'Sw (v/v)', 'Gross (depth unit)']);
  for (const x of dto.sources) {
    src.addRow([x.wellName, x.interpretationId, x.version, x.approvedAt ?? '', v(x.latestApprovedVersion), x.stale ? 'yes' : 'no', x.depthUnit, v(x.netPay), v(x.netPayFt), v(x.porosity), v(x.sw), v(x.gross)]);
  }
  src.columns.forEach((c) => (c.width = 18));

  // Inputs
  const inp = wb.addWorksheet('Inputs');
  inp.columns = [{ width: 30 }, { width: 18 }, { width: 14 }, { width: 50 }, { width: 22 }, { width: 26 }];
  heading(inp, `Per-well values used (weighting: ${inputs.weighting})`);
  header(inp, ['Well', `Net pay (${lengthUnit})`, 'Porosity', 'Sw', `Drainage area (${areaUnit})`, 'Overridden']);
  for (const w of dto.combined?.wells ?? []) inp.addRow([w.wellName, v(w.netPay), v(w.porosity), v(w.sw), v(w.drainageArea), w.overridden.join(', ')]);
  inp.addRow([]);
  heading(inp, 'Overrides (value, reason, who, when)');
  header(inp, ['Input', 'Value', 'Well', 'Reason', 'By', 'At']);
  for (const [key, o] of Object.entries(inputs.overrides)) if (o) inp.addRow([key, o.value, '(case)', o.reason, o.byName ?? '', o.at]);
  for (const [wellId, values] of Object.entries(inputs.wellOverrides)) {
    const name = dto.sources.find((x) => x.wellId === wellId)?.wellName ?? wellId;
    for (const [key, o] of Object.entries(values)) if (o) inp.addRow([key, o.value, name, o.reason, o.byName ?? '', o.at]);
  }
  inp.addRow([]);
  heading(inp, 'Case inputs');
  header(inp, ['Input', 'Deterministic value', 'Unit', 'Distribution']);
  for (const name of INPUT_NAMES) {
    const d = inputs.distributions[name];
    const detValue = results?.deterministic.values[name];
    inp.addRow([INPUT_LABELS[name], v(detValue), unitOf[name], d ? JSON.stringify(d) : 'fixed at the deterministic value']);
  }
  inp.addRow(['Standard pressure', inputs.standard.pressurePsia, 'psia']);
  inp.addRow(['Standard temperature', inputs.standard.temperatureF, 'F']);
  if (inputs.gas) {
    inp.addRow(['Reservoir pressure', inputs.gas.pressurePsia, 'psia']);
    inp.addRow(['Reservoir temperature', inputs.gas.temperatureF, 'F']);
    inp.addRow(['Gas specific gravity', inputs.gas.gasGravity, 'air = 1']);
    inp.addRow(['z-factor method', inputs.gas.zMethod === 'dak' ? 'Dranchuk & Abou-Kassem (1975)' : 'Hall & Yarborough (1973)']);
  }
  inp.addRow(['Trials', inputs.trials]);
  inp.addRow([]);
  heading(inp, 'Rank correlations between inputs (Spearman; none = drawn independently)');
  header(inp, ['Input', 'With', 'Rank correlation asked', 'Rank correlation of the samples']);
  const sampled = results?.probabilistic.correlations ?? [];
  for (const c of inputs.correlations) {
    const got = sampled.find((x) => x.a === c.a && x.b === c.b);
    inp.addRow([INPUT_LABELS[c.a], INPUT_LABELS[c.b], c.rank, got ? got.sampled : 'run the case']);
  }
  if (!inputs.correlations.length) inp.addRow(['(none)']);

  // Deterministic
  const det = wb.addWorksheet('Deterministic');
  det.columns = [{ width: 30 }, { width: 22 }, { width: 12 }, { width: 22 }, { width: 8 }];
  if (results) {
    const d = results.deterministic;
    heading(det, 'Deterministic volumes');
    header(det, ['Volume', 'Field', 'Unit', 'Metric', 'Unit']);
    det.addRow(['In place', d.inPlace.field, d.inPlace.fieldUnit, d.inPlace.m3, 'm3']);
    det.addRow(['Recoverable', d.recoverable.field, d.recoverable.fieldUnit, d.recoverable.m3, 'm3']);
    det.addRow(['Formula', d.formula]);
    if (d.pvt) {
      det.addRow([]);
      heading(det, 'Gas PVT (Sutton 1985 pseudo-criticals)');
      det.addRow(['Tpc (R)', d.pvt.tpcR]);
      det.addRow(['Ppc (psia)', d.pvt.ppcPsia]);
      det.addRow(['Tpr', d.pvt.tpr]);
      det.addRow(['Ppr', d.pvt.ppr]);
      det.addRow([`z (${d.pvt.zMethod})`, d.pvt.z]);
      det.addRow(['Bg (rcf/scf)', d.pvt.bgRcfPerScf]);
    }
  } else det.addRow(['The case has not been run on its current revision.']);

  // Probabilistic
  const pr = wb.addWorksheet('Probabilistic');
  pr.columns = [{ width: 16 }, { width: 20 }, { width: 20 }, { width: 20 }, { width: 20 }];
  if (results) {
    const p = results.probabilistic;
    pr.addRow([`Monte Carlo: ${p.trials} trials, seed ${p.seed}. P90 is the value exceeded with 90% probability (SPE-PRMS 2018).`]);
    header(pr, ['Statistic', `In place (${p.inPlace.fieldUnit})`, 'In place (m3)', `Recoverable (${p.recoverable.fieldUnit})`, 'Recoverable (m3)']);
    for (const k of ['p90', 'p50', 'p10', 'mean'] as const) pr.addRow([k.toUpperCase(), p.inPlace[k], p.inPlace.m3[k], p.recoverable[k], p.recoverable.m3[k]]);
    pr.addRow(['SD', p.inPlace.sd, '', p.recoverable.sd, '']);
    pr.addRow(['Min', p.inPlace.min, '', p.recoverable.min, '']);
    pr.addRow(['Max', p.inPlace.max, '', p.recoverable.max, '']);
    if (Object.keys(p.lognormals).length) {
      pr.addRow([]);
      heading(pr, 'Lognormal inputs in both forms');
      header(pr, ['Input', 'mu', 'sigma', 'mean', 'sd', 'P90', 'P50', 'P10']);
      for (const [name, l] of Object.entries(p.lognormals)) if (l) pr.addRow([name, l.mu, l.sigma, l.mean, l.sd, l.p90, l.p50, l.p10]);
    }
    const h = wb.addWorksheet('Histogram');
    header(h, ['Recoverable from', 'to', 'count', '', 'In place from', 'to', 'count']);
    const hr = p.recoverable.histogram;
    const hi = p.inPlace.histogram;
    for (let i = 0; i < Math.max(hr.counts.length, hi.counts.length); i++) {
      h.addRow([v(hr.edges[i]), v(hr.edges[i + 1]), v(hr.counts[i]), '', v(hi.edges[i]), v(hi.edges[i + 1]), v(hi.counts[i])]);
    }
    const e = wb.addWorksheet('Exceedance');
    header(e, ['Probability of exceeding', 'Recoverable', 'In place']);
    for (let i = 0; i < p.recoverable.exceedance.value.length; i++) e.addRow([p.recoverable.exceedance.exceedance[i], p.recoverable.exceedance.value[i], p.inPlace.exceedance.value[i]]);
    const t = wb.addWorksheet('Tornado');
    t.addRow([p.recoverable.tornado.method]);
    header(t, ['Input', 'Input P90', 'Input P10', 'Recoverable at input P90', 'Recoverable at input P10', 'Swing']);
    for (const r of p.recoverable.tornado.rows) t.addRow([INPUT_LABELS[r.input], r.inputP90, r.inputP10, r.outputAtInputP90, r.outputAtInputP10, r.swing]);
    t.addRow(['Base (deterministic)', '', '', p.recoverable.tornado.baseOutput]);
  } else pr.addRow(['The case has not been run on its current revision.']);

  // Cross-checks
  const x = wb.addWorksheet('Cross-checks');
  x.columns = [{ width: 26 }, { width: 18 }, { width: 18 }, { width: 14 }, { width: 18 }];
  if (!cross.pz.length && !cross.decline.length) x.addRow(['No production data on the wells of this case.']);
  for (const pz of cross.pz) {
    heading(x, `p/z: ${pz.wellName} – ${pz.label}`);
    if (pz.error) {
      x.addRow(['Not computed', pz.error]);
      x.addRow([]);
      continue;
    }
    header(x, ['Cumulative gas (scf)', 'Pressure (psia)', 'z', 'p/z (psia)']);
    for (const p of pz.points) x.addRow([p.cumGasScf, p.pressurePsia, p.z, p.pOverZ]);
    if (pz.fit) x.addRow(['Fit p/z = a + b Gp', `a = ${pz.fit.intercept}`, `b = ${pz.fit.slope}`, `r2 = ${pz.fit.r2}`]);
    x.addRow(['Drained GIP (scf)', v(pz.drainedGipScf)]);
    x.addRow(['Volumetric GIP (scf)', v(pz.volumetricGipScf)]);
    x.addRow(['Wells needed', v(pz.wellsNeeded)]);
    for (const a of pz.assumptions) x.addRow(['Assumption', a]);
    x.addRow([]);
  }
  for (const d of cross.decline) {
    heading(x, `Decline (${d.kind}): ${d.wellName} – ${d.label}`);
    if (d.error) {
      x.addRow(['Not computed', d.error]);
      x.addRow([]);
      continue;
    }
    x.addRow(['qi', v(d.qi), d.rateUnit]);
    x.addRow(['b', v(d.b)]);
    x.addRow(['Di nominal (1/yr, 365.25 d)', v(d.diNominalPerYear)]);
    x.addRow(['Di effective (1/yr)', v(d.diEffectivePerYear)]);
    x.addRow(['Economic limit', d.economicLimit, d.rateUnit]);
    x.addRow(['EUR', v(d.eur), d.eurUnit]);
    header(x, ['t (days)', 'rate', 'fitted']);
    for (const p of d.points) x.addRow([p.t, p.rate, v(p.fitted)]);
    x.addRow([]);
  }

  // Audit trail
  const a = wb.addWorksheet('Audit');
  header(a, ['At', 'User', 'Action', 'Before', 'After']);
  for (const e of audit) a.addRow([e.at, e.user?.name ?? '', e.action, JSON.stringify(e.before ?? null).slice(0, 32000), JSON.stringify(e.after ?? null).slice(0, 32000)]);

  const out = await wb.xlsx.writeBuffer();
  return Buffer.from(out as ArrayBuffer);
}
