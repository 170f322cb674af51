import { BadRequestException, ConflictException, ForbiddenException, Injectable, NotFoundException } from '@nestjs/common';
import type { Interpretation } from '@poreline/schema';
import type { AuthUser } from '../auth/auth-user.js';
import { APP_VERSION } from '../common/app-version.js';
import { isUuid } from '../common/ids.js';
import { ReviewNoticesService } from '../mail/review-notices.service.js';
import { WellsService } from '../wells/wells.service.js';
import { WorkbenchService } from '../workbench/workbench.service.js';
import type { InterpretationDto } from './dto/interpretation.dto.js';
import { EvaluationService } from './evaluation.service.js';
import { snapshotOf, type InterpretationInputs } from './interpretation-inputs.js';
import { interpretationAuditView, toInterpretationDto, userIdsOf } from './interpretations.mapper.js';
import { InterpretationsRepository } from './interpretations.repository.js';
import { planSave, reviewStep, type ReviewAction } from './review-state.js';

/** PostgreSQL unique_violation: another Save created the same version number at the same time. */
const UNIQUE_VIOLATION = '23505';

@Injectable()
export class InterpretationsService {
  constructor(
    private readonly interpretations: InterpretationsRepository,
    private readonly wells: WellsService,
    private readonly workbench: WorkbenchService,
    private readonly evaluation: EvaluationService,
    private readonly notices: ReviewNoticesService,
  ) {}

  async list(assetId: string, wellId: string): Promise<InterpretationDto[]> {
    await this.wells.require(assetId, wellId);
    return this.toDtos(await this.interpretations.listByWell(wellId));
  }

  async get(assetId: string, wellId: string, id: string): Promise<InterpretationDto> {
    return (await this.toDtos([await this.require(assetId, wellId, id)]))[0];
  }

  /**
   * "Save": snapshots the well's working state, evaluates it with core on the merged samples,
   * and stores the summaries. The newest version is updated in place when it is a draft or
   * returned (it becomes a draft); after an approved version (or none) version n+1 starts as a
   * draft; a submitted version is refused with 409. Also used by the demo seed.
   */
  async saveInterpretation(assetId: string, wellId: string, user: Pick<AuthUser, 'id'>): Promise<InterpretationDto> {
    await this.wells.require(assetId, wellId);
    const latest = (await this.interpretations.latest(wellId)) ?? null;
    const plan = planSave(latest?.status ?? null);
    if (plan.kind === 'refuse') throw new ConflictException(`Version ${latest!.version} cannot change: ${plan.reason}.`);
    const state = await this.workbench.state(assetId, wellId);
    if (!state.merged || !state.depthUnit) throw new BadRequestException(`Nothing to evaluate: ${state.notes.join(' ') || 'the well has no merged log data.'}`);
    const inputs = snapshotOf({ ...state, merged: state.merged, depthUnit: state.depthUnit }, APP_VERSION);
    const { summaries, warnings } = await this.evaluation.evaluate(wellId, inputs, state.merged);
    const values = { inputs: inputs as unknown as Record<string, unknown>, summaries, warnings };
    let row: Interpretation | undefined;
    if (plan.kind === 'update') {
      row = await this.interpretations.update(latest!.id, plan.from, { ...values, status: 'draft' }, (updated) => ({
        assetId,
        userId: user.id,
        action: 'save',
        entity: 'interpretation',
        entityId: updated.id,
        before: interpretationAuditView(latest!),
        after: interpretationAuditView(updated),
      }));
      if (!row) throw new ConflictException(`Version ${latest!.version} changed while saving (it was submitted meanwhile); reload and try again.`);
    } else {
      try {
        row = await this.interpretations.insert({ wellId, version: (latest?.version ?? 0) + 1, status: 'draft', createdBy: user.id, ...values }, (created) => ({
          assetId,
          userId: user.id,
          action: 'create',
          entity: 'interpretation',
          entityId: created.id,
          before: latest ? interpretationAuditView(latest) : null,
          after: interpretationAuditView(created),
        }));
      } catch (error) {
        if (causeCode(error) === UNIQUE_VIOLATION) throw new ConflictException('Another save created this version at the same moment; reload and try again.');
        throw error;
      }
    }
    return (await this.toDtos([row]))[0];
  }

  /** PUT on a version: only the newest draft or returned version can be saved again; approved and submitted ones are immutable (409). */
  async saveVersion(assetId: string, wellId: string, id: string, user: Pick<AuthUser, 'id'>): Promise<InterpretationDto> {
    const row = await this.require(assetId, wellId, id);
    if (row.status === 'approved') throw new ConflictException(`Version ${row.version} is approved and immutable; Save starts version ${row.version + 1} as a draft.`);
    if (row.status === 'submitted') throw new ConflictException(`Version ${row.version} is waiting for review and cannot change until a reviewer approves or returns it.`);
    const latest = await this.interpretations.latest(wellId);
    if (latest && latest.id !== row.id) throw new ConflictException(`Version ${row.version} is not the newest (version ${latest.version} is); edit that one.`);
    return this.saveInterpretation(assetId, wellId, user);
  }

  submit(assetId: string, wellId: string, id: string, user: Pick<AuthUser, 'id'>): Promise<InterpretationDto> {
    return this.step(assetId, wellId, id, 'submit', user, null);
  }

  /** Approval needs someone other than the submitter (a second pair of eyes). */
  approve(assetId: string, wellId: string, id: string, user: Pick<AuthUser, 'id'>, comment?: string): Promise<InterpretationDto> {
    return this.step(assetId, wellId, id, 'approve', user, comment?.trim() || null);
  }

  return(assetId: string, wellId: string, id: string, user: Pick<AuthUser, 'id'>, comment: string): Promise<InterpretationDto> {
    return this.step(assetId, wellId, id, 'return', user, comment.trim());
  }

  /** The version of the well (404 for an unknown id or a version of another well). */
  async require(assetId: string, wellId: string, id: string): Promise<Interpretation> {
    return (await this.requireWithWell(assetId, wellId, id)).row;
  }

  private async requireWithWell(assetId: string, wellId: string, id: string) {
    const well = await this.wells.require(assetId, wellId);
    const row = isUuid(id) ? await this.interpretations.find(wellId, id) : undefined;
    if (!row) throw new NotFoundException('No such interpretation version for this well.');
    return { well, row };
  }

  private async step(assetId: string, wellId: string, id: string, action: ReviewAction, user: Pick<AuthUser, 'id'>, comment: string | null): Promise<InterpretationDto> {
    const { well, row } = await this.requireWithWell(assetId, wellId, id);
    const next = reviewStep(row.status, action);
    if (!next.ok) throw new ConflictException(`Version ${row.version}: ${next.reason}.`);
    if (action === 'approve' && row.submittedBy === user.id) throw new ForbiddenException('You submitted this version; another reviewer must approve it.');
    const now = new Date();
    const patch =
      action === 'submit'
        ? { status: next.to, submittedBy: user.id, submittedAt: now }
        : { status: next.to, reviewedBy: user.id, reviewedAt: now, reviewComment: comment };
    const updated = await this.interpretations.update(row.id, [row.status], patch, (after) => ({
      assetId,
      userId: user.id,
      action,
      entity: 'interpretation',
      entityId: row.id,
      before: interpretationAuditView(row),
      after: interpretationAuditView(after),
    }));
    if (!updated) throw new ConflictException(`Version ${row.version} changed meanwhile; reload and try again.`);
    await this.notices.stepTaken({
      assetId,
      action,
      item: { kind: 'interpretation', wellName: well.name, version: row.version },
      entity: 'interpretation',
      entityId: row.id,
      actorId: user.id,
      authorIds: [row.createdBy, updated.submittedBy],
      comment,
      path: `/assets/${assetId}/wells/${wellId}/workbench`,
    });
    return (await this.toDtos([updated]))[0];
  }

  private async toDtos(rows: Interpretation[]): Promise<InterpretationDto[]> {
    const names = await this.interpretations.userNames(userIdsOf(rows));
    return rows.map((r) => toInterpretationDto(r, names));
  }
}

/** The snapshot of a stored version, typed. */
export function inputsOf(row: Interpretation): InterpretationInputs {
  return row.inputs as unknown as InterpretationInputs;
}

function causeCode(error: unknown): string | undefined {
  for (let e: unknown = error; e && typeof e === 'object'; e = (e as { cause?: unknown }).cause) {
    const code = (e as { code?: unknown }).code;
    if (typeof code === 'string') return code;
  }
  return undefined;
}
