import { ConflictException, HttpException, Injectable } from '@nestjs/common';
import type { Formation, Interpretation } from '@poreline/schema';
import { AuditService } from '../audit/audit.service.js';
import type { AuthUser } from '../auth/auth-user.js';
import type { PutCutoffsDto } from '../formations/dto/formation.dto.js';
import { toFormationDto } from '../formations/formations.mapper.js';
import { FormationsRepository, type FormationCutoffs } from '../formations/formations.repository.js';
import { FormationsService } from '../formations/formations.service.js';
import { EvaluationService } from '../interpretations/evaluation.service.js';
import type { InterpretationInputs } from '../interpretations/interpretation-inputs.js';
import { interpretationAuditView } from '../interpretations/interpretations.mapper.js';
import { InterpretationsRepository } from '../interpretations/interpretations.repository.js';
import { inputsOf } from '../interpretations/interpretations.service.js';
import type { CutoffsResultDto, RecomputedWellDto } from './dto/cutoffs.dto.js';

interface PendingWrite {
  row: Interpretation;
  inputs: InterpretationInputs;
  summaries: Record<string, unknown>[];
  warnings: Record<string, unknown>[];
}

type Summary = { formation?: unknown; netPay?: { thickness?: { md?: number } } };

/** Net pay (MD) of the formation's zones in a version's summaries. */
function netPayOf(summaries: readonly Record<string, unknown>[], formation: string): number | null {
  const own = (summaries as Summary[]).filter((s) => s.formation === formation);
  return own.length ? own.reduce((sum, s) => sum + (s.netPay?.thickness?.md ?? 0), 0) : null;
}

const cutoffsView = (f: FormationCutoffs) => ({ vshMax: f.vshMax, phiMin: f.phiMin, swMax: f.swMax, permMin: f.permMin });

@Injectable()
export class CutoffsService {
  constructor(
    private readonly formations: FormationsService,
    private readonly formationRows: FormationsRepository,
    private readonly interpretations: InterpretationsRepository,
    private readonly evaluation: EvaluationService,
    private readonly audit: AuditService,
  ) {}

  /**
   * Sets a formation's cutoffs and recomputes, with the same core code, the newest version of
   * every well of the asset with a top of this formation when that version is a draft or
   * returned. The cutoffs, every recomputed version and their audit entries are written in
   * one transaction.
   */
  async put(assetId: string, formationId: string, body: PutCutoffsDto, user: Pick<AuthUser, 'id'>): Promise<CutoffsResultDto> {
    const formation = await this.formations.require(assetId, formationId);
    const cutoffs: FormationCutoffs = { vshMax: body.vshMax, phiMin: body.phiMin, swMax: body.swMax, permMin: body.permMin ?? null };
    const tops = (await this.formationRows.topsOfAsset(assetId)).filter((t) => t.formationId === formation.id);
    const report: RecomputedWellDto[] = [];
    const writes: PendingWrite[] = [];
    for (const top of [...tops].sort((a, b) => a.wellName.localeCompare(b.wellName))) {
      const entry = await this.recompute(top.wellId, top.wellName, formation, cutoffs);
      report.push(entry.report);
      if (entry.write) writes.push(entry.write);
    }
    const updated = await this.interpretations.transaction(async (tx) => {
      const row = await this.formationRows.setCutoffs(tx, formation.id, cutoffs);
      await this.audit.record({ assetId, userId: user.id, action: 'update', entity: 'formation_cutoffs', entityId: formation.id, before: { formation: formation.name, ...cutoffsView(formation) }, after: { formation: formation.name, ...cutoffsView(cutoffs) } }, tx);
      for (const w of writes) {
        const after = await this.interpretations.updateIn(tx, w.row.id, [w.row.status], { inputs: w.inputs as unknown as Record<string, unknown>, summaries: w.summaries, warnings: w.warnings });
        if (!after) throw new ConflictException(`Version ${w.row.version} of a well changed while recomputing; nothing was saved. Try again.`);
        await this.audit.record({ assetId, userId: user.id, action: 'recompute', entity: 'interpretation', entityId: w.row.id, before: interpretationAuditView(w.row), after: { ...interpretationAuditView(after), reason: `cutoffs of ${formation.name} changed` } }, tx);
      }
      return row;
    });
    return { formation: toFormationDto(updated), recomputed: report };
  }

  private async recompute(wellId: string, wellName: string, formation: Formation, cutoffs: FormationCutoffs): Promise<{ report: RecomputedWellDto; write?: PendingWrite }> {
    const latest = await this.interpretations.latest(wellId);
    const base = { wellId, wellName, interpretationId: latest?.id ?? null, version: latest?.version ?? null, status: latest?.status ?? null };
    if (!latest) return { report: { ...base, netPayBefore: null, netPayAfter: null, changed: false, recomputed: false } };
    const inputs = inputsOf(latest);
    const zone = inputs.zones.find((z) => z.formationId === formation.id);
    const before = zone ? netPayOf(latest.summaries, zone.formation) : null;
    const unchanged = { report: { ...base, netPayBefore: before, netPayAfter: before, changed: false, recomputed: false } };
    if (latest.status === 'approved' || latest.status === 'submitted' || !zone) return unchanged;
    const next: InterpretationInputs = { ...inputs, cutoffs: { ...inputs.cutoffs, [zone.formation]: cutoffs } };
    try {
      const { summaries, warnings } = await this.evaluation.evaluate(wellId, next);
      const own = (s: readonly Record<string, unknown>[]) => JSON.stringify(s.filter((x) => x.formation === zone.formation));
      return {
        report: { ...base, netPayBefore: before, netPayAfter: netPayOf(summaries, zone.formation), changed: own(summaries) !== own(latest.summaries), recomputed: true },
        write: { row: latest, inputs: next, summaries, warnings },
      };
    } catch (error) {
      if (!(error instanceof HttpException)) throw error;
      return { report: { ...unchanged.report, error: error.message } };
    }
  }
}
