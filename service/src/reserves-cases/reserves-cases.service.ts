import { BadRequestException, ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import type { Formation, ReservesCase } from '@poreline/schema';
import { randomInt } from 'node:crypto';
import { AuditService } from '../audit/audit.service.js';
import type { AuthUser } from '../auth/auth-user.js';
import { CaseInputError, RESERVES_CAUTION, caseConventions, combineCase, runCase, type CaseResults } from './case-engine.js';
import { CaseCrossChecks } from './case-cross-checks.js';
import { buildCaseWorkbook } from './case-export.js';
import { applyInputsPatch, defaultInputs, parseInputsPatch, readInputs } from './case-inputs.js';
import type {
  ApproveCaseDto,
  CandidateDto,
  CaseAuditEntryDto,
  CreateReservesCaseDto,
  RefreshSourcesDto,
  ReservesCaseDto,
  ReservesCaseSummaryDto,
  ReturnCaseDto,
  SourceDto,
  UpdateReservesCaseDto,
  UserRef,
} from './dto/reserves-case.dto.js';
import type { NoticeAction } from '../mail/review-notice.js';
import { ReviewNoticesService } from '../mail/review-notices.service.js';
import { ReservesCasesRepository, type ApprovedVersion } from './reserves-cases.repository.js';
import { findZoneSummary, normaliseDepthUnit, valuesOfSummary, type SourceSnapshot } from './source-values.js';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const ENTITY = 'reserves-case';

/**
 * Reserves cases: sources from approved interpretations, the engineer's inputs with overrides,
 * runs (deterministic + Monte Carlo, core), review workflow and export. Access (membership and
 * role) is checked by the guards; this service checks that ids belong to the asset and the
 * workflow state.
 */
@Injectable()
export class ReservesCasesService {
  constructor(
    private readonly cases: ReservesCasesRepository,
    private readonly audit: AuditService,
    private readonly crossChecks: CaseCrossChecks,
    private readonly notices: ReviewNoticesService,
  ) {}

  async list(assetId: string): Promise<ReservesCaseSummaryDto[]> {
    const rows = await this.cases.listByAsset(assetId);
    const formations = new Map((await this.cases.formationsOf([...new Set(rows.map((r) => r.formationId))])).map((f) => [f.id, f]));
    const latest = await this.cases.latestApproved([...new Set(rows.flatMap((r) => sourcesOf(r).map((s) => s.wellId)))]);
    const users = await this.cases.userNames(rows.map((r) => r.createdBy));
    return rows.map((r) => {
      const results = r.results as CaseResults | null;
      const sources = sourcesOf(r);
      const current = !!results && results.revision === r.revision;
      return {
        id: r.id,
        name: r.name,
        formationId: r.formationId,
        formationName: formations.get(r.formationId)?.name ?? '',
        status: r.status,
        revision: r.revision,
        fluid: readInputs(r.inputs).fluid,
        wellCount: sources.length,
        staleSources: sources.filter((s) => (latest.get(s.wellId)?.version ?? 0) > s.version).length,
        recoverable: results
          ? {
              deterministic: results.deterministic.recoverable.field,
              p90: results.probabilistic.recoverable.p90,
              p50: results.probabilistic.recoverable.p50,
              p10: results.probabilistic.recoverable.p10,
              unit: results.deterministic.recoverable.fieldUnit,
            }
          : null,
        resultsCurrent: current,
        updatedAt: r.updatedAt.toISOString(),
        createdBy: userRef(users, r.createdBy),
      };
    });
  }

  /** Wells of the asset with an approved interpretation that holds the formation, newest version each. */
  async candidates(assetId: string, formationId: string): Promise<CandidateDto[]> {
    const formation = await this.requireFormation(assetId, formationId, 'formationId');
    const versions = await this.cases.approvedVersions(assetId);
    const units = await this.cases.depthUnits([...new Set(versions.map((v) => v.wellId))]);
    const out: CandidateDto[] = [];
    const seen = new Set<string>();
    for (const v of versions) {
      if (seen.has(v.wellId)) continue;
      seen.add(v.wellId);
      const snap = snapshotOf(v, formation, units.get(v.wellId));
      if (snap) out.push(snap);
    }
    return out;
  }

  async get(assetId: string, caseId: string): Promise<ReservesCaseDto> {
    return this.toDto(await this.require(assetId, caseId));
  }

  async create(assetId: string, body: CreateReservesCaseDto, user: AuthUser): Promise<ReservesCaseDto> {
    const formation = await this.requireFormation(assetId, body.formationId, 'formationId');
    const inputs = applyInputsPatch(defaultInputs(), parseInputsPatch(body.inputs), user);
    const sources = await this.pullSources(assetId, formation, dedupe(body.wellIds ?? []));
    const row = await this.cases.transaction(async (tx) => {
      const created = await this.cases.insert(
        {
          assetId,
          formationId: formation.id,
          name: body.name.trim(),
          sources: sources as unknown as Record<string, unknown>[],
          inputs: inputs as unknown as Record<string, unknown>,
          results: null,
          seed: body.seed ?? randomInt(0, 2 ** 31 - 1),
          createdBy: user.id,
        },
        tx,
      );
      await this.audit.record({ assetId, userId: user.id, action: 'create', entity: ENTITY, entityId: created.id, after: auditView(created) }, tx);
      return created;
    });
    return this.toDto(row);
  }

  async update(assetId: string, caseId: string, body: UpdateReservesCaseDto, user: AuthUser): Promise<ReservesCaseDto> {
    const row = await this.requireEditable(assetId, caseId);
    if (body.expectedRevision !== undefined && body.expectedRevision !== row.revision) {
      throw new ConflictException(`The case has moved on to revision ${row.revision} (you edited revision ${body.expectedRevision}); reload it and apply your change again.`);
    }
    const patch = parseInputsPatch(body.inputs);
    const inputs = applyInputsPatch(readInputs(row.inputs), patch, user);
    let sources = sourcesOf(row);
    if (body.wellIds) {
      const wanted = dedupe(body.wellIds);
      const kept = sources.filter((s) => wanted.includes(s.wellId));
      const added = wanted.filter((id) => !kept.some((s) => s.wellId === id));
      const formation = await this.requireFormation(assetId, row.formationId, 'formationId');
      const pulled = await this.pullSources(assetId, formation, added);
      sources = wanted.map((id) => kept.find((s) => s.wellId === id) ?? pulled.find((s) => s.wellId === id)!);
    }
    const saved = await this.cases.transaction(async (tx) => {
      const next = await this.cases.update(
        row.id,
        {
          name: body.name?.trim() ?? row.name,
          seed: body.seed ?? row.seed,
          inputs: inputs as unknown as Record<string, unknown>,
          sources: sources as unknown as Record<string, unknown>[],
          results: null,
          revision: row.revision + 1,
          status: 'draft',
        },
        tx,
      );
      await this.audit.record({ assetId, userId: user.id, action: 'update', entity: ENTITY, entityId: row.id, before: auditView(row), after: auditView(next) }, tx);
      return next;
    });
    return this.toDto(saved);
  }

  async run(assetId: string, caseId: string, user: AuthUser): Promise<ReservesCaseDto> {
    const row = await this.requireEditable(assetId, caseId);
    let results: CaseResults;
    try {
      results = runCase(sourcesOf(row), readInputs(row.inputs), row.seed, row.revision);
    } catch (error) {
      if (error instanceof CaseInputError) throw new BadRequestException(error.messages);
      if (error instanceof RangeError) throw new BadRequestException(`inputs: ${error.message}`);
      throw error;
    }
    const saved = await this.cases.transaction(async (tx) => {
      const next = await this.cases.update(row.id, { results: results as unknown as Record<string, unknown>, status: row.status === 'returned' ? 'draft' : row.status }, tx);
      await this.audit.record(
        { assetId, userId: user.id, action: 'run', entity: ENTITY, entityId: row.id, before: resultsView(row.results as CaseResults | null), after: resultsView(results) },
        tx,
      );
      return next;
    });
    return this.toDto(saved);
  }

  async refreshSources(assetId: string, caseId: string, body: RefreshSourcesDto, user: AuthUser): Promise<ReservesCaseDto> {
    const row = await this.requireEditable(assetId, caseId);
    const formation = await this.requireFormation(assetId, row.formationId, 'formationId');
    const current = sourcesOf(row);
    const only = body.wellIds ? new Set(body.wellIds) : null;
    const latest = await this.cases.latestApproved(current.map((s) => s.wellId));
    const toRefresh = current.filter((s) => (only ? only.has(s.wellId) : true) && (latest.get(s.wellId)?.version ?? 0) > s.version).map((s) => s.wellId);
    if (!toRefresh.length) throw new ConflictException('No source is stale: every well already uses its newest approved interpretation.');
    const pulled = await this.pullSources(assetId, formation, toRefresh);
    const sources = current.map((s) => pulled.find((p) => p.wellId === s.wellId) ?? s);
    const saved = await this.cases.transaction(async (tx) => {
      const next = await this.cases.update(
        row.id,
        { sources: sources as unknown as Record<string, unknown>[], results: null, revision: row.revision + 1, status: 'draft' },
        tx,
      );
      await this.audit.record(
        {
          assetId,
          userId: user.id,
          action: 'refresh-sources',
          entity: ENTITY,
          entityId: row.id,
          before: current.filter((s) => toRefresh.includes(s.wellId)),
          after: pulled,
        },
        tx,
      );
      return next;
    });
    return this.toDto(saved);
  }

  async copy(assetId: string, caseId: string, user: AuthUser): Promise<ReservesCaseDto> {
    const row = await this.require(assetId, caseId);
    const saved = await this.cases.transaction(async (tx) => {
      const created = await this.cases.insert(
        {
          assetId,
          formationId: row.formationId,
          name: `${row.name} (copy)`.slice(0, 120),
          sources: row.sources,
          inputs: row.inputs,
          results: null,
          seed: row.seed,
          createdBy: user.id,
        },
        tx,
      );
      await this.audit.record({ assetId, userId: user.id, action: 'copy', entity: ENTITY, entityId: created.id, before: { copiedFrom: row.id, revision: row.revision }, after: auditView(created) }, tx);
      return created;
    });
    return this.toDto(saved);
  }

  async submit(assetId: string, caseId: string, user: AuthUser): Promise<ReservesCaseDto> {
    const row = await this.requireEditable(assetId, caseId);
    const results = row.results as CaseResults | null;
    if (!results || results.revision !== row.revision) throw new ConflictException('Run the case before submitting it: the results must belong to the current inputs.');
    const latest = await this.cases.latestApproved(sourcesOf(row).map((s) => s.wellId));
    const stale = sourcesOf(row).filter((s) => (latest.get(s.wellId)?.version ?? 0) > s.version);
    if (stale.length) throw new ConflictException(`Refresh the stale sources first (${stale.map((s) => s.wellName).join(', ')}): a newer approved interpretation exists.`);
    return this.transition(row, { status: 'submitted', submittedBy: user.id, submittedAt: new Date(), reviewedBy: null, reviewedAt: null, reviewComment: null }, 'submit', user);
  }

  async approve(assetId: string, caseId: string, body: ApproveCaseDto, user: AuthUser): Promise<ReservesCaseDto> {
    const row = await this.requireStatus(assetId, caseId, 'submitted', 'approve');
    return this.transition(row, { status: 'approved', reviewedBy: user.id, reviewedAt: new Date(), reviewComment: body.comment?.trim() || null }, 'approve', user);
  }

  async returnCase(assetId: string, caseId: string, body: ReturnCaseDto, user: AuthUser): Promise<ReservesCaseDto> {
    const row = await this.requireStatus(assetId, caseId, 'submitted', 'return');
    return this.transition(row, { status: 'returned', reviewedBy: user.id, reviewedAt: new Date(), reviewComment: body.comment.trim() }, 'return', user);
  }

  async auditTrail(assetId: string, caseId: string): Promise<CaseAuditEntryDto[]> {
    const row = await this.require(assetId, caseId);
    const entries = await this.cases.auditOf(assetId, row.id);
    const users = await this.cases.userNames(entries.map((e) => e.userId));
    return entries.map((e) => ({ id: e.id, at: e.at.toISOString(), user: userRef(users, e.userId), action: e.action, before: e.before, after: e.after }));
  }

  async exportXlsx(assetId: string, caseId: string): Promise<{ fileName: string; bytes: Buffer }> {
    const dto = await this.get(assetId, caseId);
    const row = await this.require(assetId, caseId);
    const tables = await this.crossChecks.tablesFor(assetId, row, dto.inputs, dto.resultsCurrent ? dto.results : null);
    const audit = await this.auditTrail(assetId, caseId);
    const bytes = await buildCaseWorkbook(dto, tables, audit);
    const safe = dto.name.replace(/[^A-Za-z0-9._-]+/g, '_').slice(0, 60) || 'case';
    return { fileName: `${safe}-rev${dto.revision}.xlsx`, bytes };
  }

  // --- helpers ---

  private async transition(row: ReservesCase, values: Partial<ReservesCase>, action: NoticeAction, user: AuthUser): Promise<ReservesCaseDto> {
    const saved = await this.cases.transaction(async (tx) => {
      const next = await this.cases.update(row.id, values, tx);
      await this.audit.record(
        {
          assetId: row.assetId,
          userId: user.id,
          action,
          entity: ENTITY,
          entityId: row.id,
          before: { status: row.status, reviewComment: row.reviewComment },
          after: { status: next.status, reviewComment: next.reviewComment, revision: next.revision },
        },
        tx,
      );
      return next;
    });
    await this.notices.stepTaken({
      assetId: row.assetId,
      action,
      item: { kind: 'reserves-case', caseName: saved.name, revision: saved.revision },
      entity: 'reserves-case',
      entityId: row.id,
      actorId: user.id,
      authorIds: [row.createdBy, saved.submittedBy],
      comment: saved.reviewComment,
      path: `/assets/${row.assetId}/reserves/${row.id}`,
    });
    return this.toDto(saved);
  }

  async require(assetId: string, caseId: string): Promise<ReservesCase> {
    const row = UUID.test(caseId) ? await this.cases.findInAsset(assetId, caseId) : undefined;
    if (!row) throw new NotFoundException('No such reserves case in this asset.');
    return row;
  }

  private async requireEditable(assetId: string, caseId: string): Promise<ReservesCase> {
    const row = await this.require(assetId, caseId);
    if (row.status === 'approved') throw new ConflictException('This case is approved and cannot change; copy it to start a new draft.');
    if (row.status === 'submitted') throw new ConflictException('This case is waiting for review; it cannot change until a reviewer returns it.');
    return row;
  }

  private async requireStatus(assetId: string, caseId: string, status: ReservesCase['status'], action: string): Promise<ReservesCase> {
    const row = await this.require(assetId, caseId);
    if (row.status !== status) throw new ConflictException(`Only a ${status} case can be ${action === 'return' ? 'returned' : `${action}d`}; this one is ${row.status}.`);
    return row;
  }

  private async requireFormation(assetId: string, formationId: string, field: string): Promise<Formation> {
    const f = UUID.test(formationId) ? await this.cases.formationInAsset(assetId, formationId) : undefined;
    if (!f) throw new BadRequestException(`${field}: no such formation in this asset`);
    return f;
  }

  /** Snapshots of the wells' newest approved interpretations for the formation; 400 naming a well that has none. */
  private async pullSources(assetId: string, formation: Formation, wellIds: string[]): Promise<SourceSnapshot[]> {
    if (!wellIds.length) return [];
    const versions = await this.cases.approvedVersions(assetId, wellIds);
    const units = await this.cases.depthUnits(wellIds);
    const problems: string[] = [];
    const out: SourceSnapshot[] = [];
    for (const wellId of wellIds) {
      const newest = versions.find((v) => v.wellId === wellId);
      if (!newest) {
        problems.push(`wellIds: well ${wellId} has no approved interpretation in this asset`);
        continue;
      }
      const snap = snapshotOf(newest, formation, units.get(wellId));
      if (!snap) problems.push(`wellIds: the newest approved interpretation of ${newest.wellName} (version ${newest.version}) has no ${formation.name} zone`);
      else out.push(snap);
    }
    if (problems.length) throw new BadRequestException(problems);
    return out;
  }

  private async toDto(row: ReservesCase): Promise<ReservesCaseDto> {
    const [formation] = await this.cases.formationsOf([row.formationId]);
    const snaps = sourcesOf(row);
    const latest = await this.cases.latestApproved(snaps.map((s) => s.wellId));
    const users = await this.cases.userNames([row.createdBy, row.submittedBy, row.reviewedBy]);
    const inputs = readInputs(row.inputs);
    const sources: SourceDto[] = snaps.map((s) => {
      const l = latest.get(s.wellId);
      return { ...s, latestApprovedVersion: l?.version ?? null, latestInterpretationId: l?.id ?? null, stale: (l?.version ?? 0) > s.version };
    });
    let combined = null;
    let combinedError: string | null = null;
    try {
      combined = combineCase(snaps, inputs);
    } catch (error) {
      combinedError = (error as Error).message;
    }
    const results = row.results as CaseResults | null;
    return {
      id: row.id,
      assetId: row.assetId,
      formationId: row.formationId,
      formationName: formation?.name ?? '',
      name: row.name,
      status: row.status,
      revision: row.revision,
      seed: row.seed,
      sources,
      inputs,
      combined,
      combinedError,
      results,
      resultsCurrent: !!results && results.revision === row.revision,
      staleSources: sources.filter((s) => s.stale).length,
      conventions: caseConventions(inputs),
      caution: RESERVES_CAUTION,
      createdBy: userRef(users, row.createdBy),
      submittedBy: userRef(users, row.submittedBy),
      submittedAt: row.submittedAt?.toISOString() ?? null,
      reviewedBy: userRef(users, row.reviewedBy),
      reviewedAt: row.reviewedAt?.toISOString() ?? null,
      reviewComment: row.reviewComment,
      createdAt: row.createdAt.toISOString(),
      updatedAt: row.updatedAt.toISOString(),
    };
  }
}

function sourcesOf(row: ReservesCase): SourceSnapshot[] {
  return (row.sources ?? []) as unknown as SourceSnapshot[];
}

function dedupe(ids: string[]): string[] {
  return [...new Set(ids)];
}

function userRef(users: Map<string, { id: string; name: string }>, id: string | null): UserRef | null {
  if (!id) return null;
  const u = users.get(id);
  return u ? { id: u.id, name: u.name } : { id, name: 'former user' };
}

function snapshotOf(v: ApprovedVersion, formation: Formation, logDepthUnit: string | undefined): SourceSnapshot | null {
  const summary = findZoneSummary(v.summaries ?? [], formation);
  if (!summary) return null;
  const fallback = normaliseDepthUnit(v.inputs?.depthUnit) ?? normaliseDepthUnit(logDepthUnit) ?? 'ft';
  return {
    wellId: v.wellId,
    wellName: v.wellName,
    interpretationId: v.id,
    version: v.version,
    approvedAt: v.reviewedAt?.toISOString() ?? null,
    formationName: formation.name,
    ...valuesOfSummary(summary, fallback),
  };
}

/** What the audit log keeps of a case edit (inputs in full; results summarised). */
function auditView(row: ReservesCase) {
  return {
    name: row.name,
    status: row.status,
    revision: row.revision,
    seed: row.seed,
    sources: sourcesOf(row).map((s) => ({ wellId: s.wellId, wellName: s.wellName, interpretationId: s.interpretationId, version: s.version })),
    inputs: row.inputs,
  };
}

function resultsView(results: CaseResults | null) {
  if (!results) return null;
  const r = results.probabilistic.recoverable;
  return {
    revision: results.revision,
    seed: results.probabilistic.seed,
    trials: results.probabilistic.trials,
    unit: r.fieldUnit,
    deterministicRecoverable: results.deterministic.recoverable.field,
    p90: r.p90,
    p50: r.p50,
    p10: r.p10,
    mean: r.mean,
  };
}
