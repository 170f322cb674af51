import type { Interpretation } from '@poreline/schema';
import type { AuthUser } from '../auth/auth-user.js';
import { APP_VERSION } from '../common/app-version.js';
import type { InterpretationInputs } from '../interpretations/interpretation-inputs.js';
import type { Provenance } from './table-files.js';

/** Shown wherever exported volumes or net pay travel on. */
export const ESTIMATE_NOTICE =
  'Numbers from Poreline are estimates. Classification and reporting of reserves follow the applicable rules (for example SPE-PRMS or the local regulator) and need sign-off by a qualified evaluator.';

/** Who exported what, when, with which version of the app. */
export function exportProvenance(title: string, user: Pick<AuthUser, 'name' | 'email'>, at: Date): Provenance {
  return [
    ['export', title],
    ['app', `Poreline ${APP_VERSION}`],
    ['exported at', at.toISOString()],
    ['exported by', `${user.name} <${user.email}>`],
    ['notice', ESTIMATE_NOTICE],
  ];
}

/**
 * Where one interpretation version came from: its id, version and status, review, the files
 * (sha256) and bindings it used, the merged index, and the parameter and cutoff snapshot.
 */
export function interpretationProvenance(wellName: string, row: Interpretation, names: ReadonlyMap<string, string>, withParameters: boolean): Provenance {
  const inputs = row.inputs as unknown as InterpretationInputs;
  const p = `${wellName} v${row.version}`;
  const out: Provenance = [
    [`${p} interpretation`, `id ${row.id}, version ${row.version}, status ${row.status}, saved ${row.updatedAt.toISOString()} by ${names.get(row.createdBy ?? '') ?? 'unknown'}`],
  ];
  if (row.reviewedAt) out.push([`${p} review`, `${row.status} ${row.reviewedAt.toISOString()} by ${names.get(row.reviewedBy ?? '') ?? 'unknown'}${row.reviewComment ? ` (${row.reviewComment})` : ''}`]);
  for (const f of inputs.logRuns ?? []) out.push([`${p} file`, `${f.fileName} sha256 ${f.sha256}`]);
  for (const b of inputs.bindings ?? []) out.push([`${p} binding`, `${b.binding} = ${b.mnemonic} [${b.unit}] of ${b.fileName}`]);
  if (inputs.merged) out.push([`${p} depth index`, `${inputs.merged.start} to ${inputs.merged.stop} ${inputs.depthUnit} every ${inputs.merged.step} (${inputs.merged.samples} samples)`]);
  if (inputs.survey) out.push([`${p} survey`, `${inputs.survey.stations.length} stations, TVD by minimum curvature`]);
  if (withParameters) {
    for (const [formation, c] of Object.entries(inputs.cutoffs ?? {})) out.push([`${p} cutoffs ${formation}`, JSON.stringify(c)]);
    for (const z of inputs.zones ?? []) out.push([`${p} parameters ${z.name}`, `${z.top}-${z.base} ${inputs.depthUnit}; ${JSON.stringify(z.params)}`]);
  }
  return out;
}
