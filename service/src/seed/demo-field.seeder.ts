import { Injectable, Logger, type Type } from '@nestjs/common';
import { ModuleRef } from '@nestjs/core';
import { demoFieldFiles, demoSurvey, demoTops, readDemoText, zoneParametersFor } from '@poreline/demo-wells';
import { auditLog, users } from '@poreline/schema';
import { and, eq, inArray } from 'drizzle-orm';
import { AuditService } from '../audit/audit.service.js';
import type { AuthUser } from '../auth/auth-user.js';
import { BindingsService } from '../bindings/bindings.service.js';
import { CutoffsService } from '../cutoffs/cutoffs.service.js';
import { DatabaseService } from '../database/database.module.js';
import type { FormationDto } from '../formations/dto/formation.dto.js';
import { FormationsRepository } from '../formations/formations.repository.js';
import { FormationsService } from '../formations/formations.service.js';
import { InterpretationsService } from '../interpretations/interpretations.service.js';
import { LogRunsService } from '../log-runs/log-runs.service.js';
import { ProductionService } from '../production/production.service.js';
import { ReservesCasesService } from '../reserves-cases/reserves-cases.service.js';
import { SurveysService } from '../surveys/surveys.service.js';
import { TopsService } from '../tops/tops.service.js';
import type { WellRowDto } from '../wells/dto/well.dto.js';
import { WellsService } from '../wells/wells.service.js';
import { ZoneParametersService } from '../zone-parameters/zone-parameters.service.js';
import { BINDING_RUN_FILE, DEMO_CASE, REVIEW_PLAN, demoCaseInputs, demoFormationPlan, demoProductionSeries, demoWellPlan } from './demo-field-plan.js';
import { DEMO_USERS } from './demo-users.js';

/** The audit entry that marks the demo field as loaded (the seed then never touches it again). */
export const DEMO_FIELD_MARKER = { action: 'seed', entity: 'demo-field' } as const;

/** What one run of the field seed did. */
export interface DemoFieldReport {
  loaded: boolean;
  wellsCreated: number;
  logRunsStored: number;
  interpretationSteps: number;
  casesCreated: number;
  seconds: number;
  /** Seconds per phase (start-up cost of the demo). */
  phases: Record<string, number>;
}

type Role = (typeof DEMO_USERS)[number]['role'];

/**
 * Loads the Wrenmoor demo field into the demo asset through the services the API uses
 * (validation, audit entries and evaluation included): formations and cutoffs, wells, LAS
 * files, tops, the model's zone parameters, the WM-7 survey, confirmed bindings, production
 * series, interpretations taken through review, and one reserves case, run.
 *
 * Idempotent: every step adds only what is missing (so a seed interrupted half way resumes),
 * and once the field is complete a marker entry in the audit log makes later starts skip it,
 * so edits users make to the demo asset are never undone.
 */
@Injectable()
export class DemoFieldSeeder {
  private readonly logger = new Logger('DemoSeedService');

  constructor(
    private readonly database: DatabaseService,
    private readonly moduleRef: ModuleRef,
  ) {}

  /** The feature services, resolved from the whole app (their modules do not export them all). */
  private service<T>(type: Type<T>): T {
    return this.moduleRef.get(type, { strict: false });
  }

  async isLoaded(assetId: string): Promise<boolean> {
    const [marker] = await this.database.db
      .select({ id: auditLog.id })
      .from(auditLog)
      .where(and(eq(auditLog.assetId, assetId), eq(auditLog.action, DEMO_FIELD_MARKER.action), eq(auditLog.entity, DEMO_FIELD_MARKER.entity)))
      .limit(1);
    return !!marker;
  }

  async load(assetId: string): Promise<DemoFieldReport> {
    const started = performance.now();
    const report: DemoFieldReport = { loaded: false, wellsCreated: 0, logRunsStored: 0, interpretationSteps: 0, casesCreated: 0, seconds: 0, phases: {} };
    if (await this.isLoaded(assetId)) return report;
    let mark = performance.now();
    const phase = <T>(name: string, value: T): T => {
      const now = performance.now();
      report.phases[name] = Math.round(now - mark) / 1000;
      mark = now;
      return value;
    };
    const who = await this.demoUsers();
    const formations = phase('formations', await this.formations(assetId, who.petrophysicist));
    const wells = phase('wells', await this.wells(assetId, who.petrophysicist, report));
    for (const well of wells) await this.logs(assetId, well, who.petrophysicist, report);
    phase('LAS files', null);
    for (const well of wells) await this.tops(assetId, well, formations, who.petrophysicist);
    phase('tops', null);
    for (const well of wells) await this.zoneParameters(assetId, well, who.petrophysicist);
    phase('zone parameters', null);
    for (const well of wells) await this.surveyAndBindings(assetId, well, who.petrophysicist);
    phase('survey and bindings', null);
    await this.production(assetId, wells, who.engineer);
    phase('production', null);
    for (const well of wells) report.interpretationSteps += await this.review(assetId, well, who);
    phase('interpretations', null);
    report.casesCreated = phase('reserves case', await this.reservesCase(assetId, wells, formations, who.engineer));
    report.seconds = (performance.now() - started) / 1000;
    await this.service(AuditService).record({
      assetId,
      userId: who.admin.id,
      ...DEMO_FIELD_MARKER,
      entityId: assetId,
      after: { wells: wells.length, formations: formations.length, logRunsStored: report.logRunsStored, seconds: Math.round(report.seconds * 10) / 10, phases: report.phases },
    });
    report.loaded = true;
    this.logger.log(`Demo field loaded: ${wells.length} wells, ${report.logRunsStored} LAS files, ${report.interpretationSteps} review steps, ${report.casesCreated} reserves case(s) in ${report.seconds.toFixed(1)} s (${Object.entries(report.phases).map(([k, v]) => `${k} ${v.toFixed(1)} s`).join(', ')}).`);
    return report;
  }

  /** The demo users as the services' AuthUser, by role. */
  private async demoUsers(): Promise<Record<Role, AuthUser>> {
    const rows = await this.database.db
      .select({ id: users.id, email: users.email, name: users.name, organisationId: users.organisationId, isAdmin: users.isAdmin })
      .from(users)
      .where(inArray(users.email, DEMO_USERS.map((u) => u.email)));
    return Object.fromEntries(
      DEMO_USERS.map((u) => {
        const row = rows.find((r) => r.email === u.email);
        if (!row) throw new Error(`Demo seed: the demo user ${u.email} is missing; the demo field needs the demo users.`);
        return [u.role, row];
      }),
    ) as Record<Role, AuthUser>;
  }

  /** Formations in stratigraphic order with palette colours, then the model's cutoffs. */
  private async formations(assetId: string, petro: AuthUser): Promise<FormationDto[]> {
    const service = this.service(FormationsService);
    const plan = demoFormationPlan();
    for (const [i, f] of plan.entries()) {
      const existing = await service.list(assetId);
      if (existing.some((e) => e.name.toLowerCase() === f.name.toLowerCase())) continue;
      await service.create(assetId, { name: f.name, colour: f.colour, lithology: f.lithology, ordinal: i + 1 }, petro);
    }
    const cutoffs = this.service(CutoffsService);
    for (const f of await service.list(assetId)) {
      const want = plan.find((p) => p.name === f.name)?.cutoffs;
      if (!want) continue;
      const same = f.cutoffs.vshMax === want.vshMax && f.cutoffs.phiMin === want.phiMin && f.cutoffs.swMax === want.swMax && f.cutoffs.permMin === want.permMin;
      if (!same) await cutoffs.put(assetId, f.id, want, petro);
    }
    return service.list(assetId);
  }

  private async wells(assetId: string, petro: AuthUser, report: DemoFieldReport): Promise<WellRowDto[]> {
    const service = this.service(WellsService);
    const existing = await service.list(assetId);
    for (const w of demoWellPlan()) {
      if (existing.some((e) => e.name === w.name)) continue;
      await service.create(assetId, { name: w.name, uwi: w.uwi, kbElevation: w.kbElevation, groundElevation: w.groundElevation }, petro);
      report.wellsCreated++;
    }
    const all = await service.list(assetId);
    return demoWellPlan().map((w) => all.find((e) => e.name === w.name)!);
  }

  /** The well's LAS files through the upload path (a file already stored is reported as a duplicate). */
  private async logs(assetId: string, well: WellRowDto, petro: AuthUser, report: DemoFieldReport): Promise<void> {
    const files = demoFieldFiles().filter((f) => f.wellName === well.name);
    const upload = await this.service(LogRunsService).upload(
      assetId,
      well.id,
      files.map((f) => {
        const buffer = Buffer.from(f.bytes);
        return { originalname: f.fileName.split('/').pop()!, buffer, size: buffer.length };
      }),
      petro,
    );
    for (const r of upload.results) {
      if (r.status === 'rejected') throw new Error(`Demo seed: ${well.name} ${r.fileName} was rejected: ${r.message}`);
      if (r.status === 'stored') report.logRunsStored++;
    }
  }

  private async tops(assetId: string, well: WellRowDto, formations: FormationDto[], petro: AuthUser): Promise<void> {
    const service = this.service(TopsService);
    if ((await service.list(assetId, well.id)).length) return;
    const byName = new Map(formations.map((f) => [f.name, f]));
    const own = demoTops().filter((t) => t.well === well.name);
    await service.replace(assetId, well.id, { tops: own.map((t) => ({ formationId: byName.get(t.formation)!.id, md: t.topMd, source: 'import' })) }, petro);
  }

  /** The model's parameters for each zone still on its lithology defaults. */
  private async zoneParameters(assetId: string, well: WellRowDto, petro: AuthUser): Promise<void> {
    const service = this.service(ZoneParametersService);
    const model = zoneParametersFor(well.name);
    const formations = (await this.service(FormationsRepository).list(assetId)).filter((f) => model[f.name]);
    const current = await service.forZones(await this.service(WellsService).require(assetId, well.id), formations);
    for (const [i, f] of formations.entries()) {
      if (!current[i].isDefault) continue;
      await service.put(assetId, well.id, f.id, { params: model[f.name] as unknown as Record<string, unknown> }, petro);
    }
  }

  /** The survey (WM-7) and the bindings, confirmed (WM-4 on its reservoir run, see BINDING_RUN_FILE). */
  private async surveyAndBindings(assetId: string, well: WellRowDto, petro: AuthUser): Promise<void> {
    const survey = demoSurvey(well.name);
    const surveys = this.service(SurveysService);
    if (survey && !(await surveys.stationsFor(await this.service(WellsService).require(assetId, well.id), 'ft'))) {
      const csv = ['md (ft),inclination,azimuth', ...survey.map((s) => `${s.md},${s.inc},${s.azi}`)].join('\n');
      await surveys.upload(assetId, well.id, { originalname: `${well.name}_survey.csv`, buffer: Buffer.from(csv) }, { depthUnit: 'ft' }, petro);
    }

    const bindings = this.service(BindingsService);
    const effective = await bindings.list(assetId, well.id);
    if (effective.some((b) => b.confirmed)) return;
    const runFile = BINDING_RUN_FILE[well.name];
    const detail = await this.service(WellsService).get(assetId, well.id);
    const run = runFile ? detail.logRuns.find((r) => r.fileName === runFile) : undefined;
    const chosen = effective.map((b) => {
      const alt = run?.curves.find((c) => c.mnemonic === b.mnemonic);
      return { binding: b.binding, logRunId: alt ? run!.id : b.logRunId, mnemonic: b.mnemonic };
    });
    await bindings.replace(assetId, well.id, { bindings: chosen }, petro);
  }

  /** WM-1 static pressures and gas rate, WM-4 oil rate. */
  private async production(assetId: string, wells: WellRowDto[], engineer: AuthUser): Promise<void> {
    const service = this.service(ProductionService);
    const series = demoProductionSeries({
      wm1Pressures: readDemoText('production/WM-1_static_pressures.csv'),
      wm1Monthly: readDemoText('production/WM-1_monthly.csv'),
      wm4Monthly: readDemoText('production/WM-4_monthly.csv'),
    });
    for (const s of series) {
      const well = wells.find((w) => w.name === s.well)!;
      const existing = await service.list(assetId, well.id);
      if (existing.some((e) => e.label === s.label)) continue;
      await service.create(assetId, well.id, { kind: s.kind, fluid: s.fluid, units: s.units, points: s.points, label: s.label }, engineer);
    }
  }

  /** Takes the well's newest interpretation one review step at a time to its planned status. */
  private async review(assetId: string, well: WellRowDto, who: Record<Role, AuthUser>): Promise<number> {
    const plan = REVIEW_PLAN[well.name];
    if (!plan) return 0;
    const service = this.service(InterpretationsService);
    let steps = 0;
    for (let guard = 0; guard < 4; guard++) {
      const [latest] = await service.list(assetId, well.id);
      if (!latest) await service.saveInterpretation(assetId, well.id, who.petrophysicist);
      else if (latest.status === plan.status) return steps;
      else if (latest.status === 'draft' && plan.status !== 'draft') await service.submit(assetId, well.id, latest.id, who.petrophysicist);
      else if (latest.status === 'submitted' && plan.status === 'approved') await service.approve(assetId, well.id, latest.id, who.reviewer, plan.comment ?? undefined);
      else if (latest.status === 'submitted' && plan.status === 'returned') await service.return(assetId, well.id, latest.id, who.reviewer, plan.comment ?? 'Returned.');
      else return steps; // a state the plan does not lead to (left as it is)
      steps++;
    }
    return steps;
  }

  /** The Fenna Sand gas case from the approved interpretations of WM-1 to WM-3, run once. */
  private async reservesCase(assetId: string, wells: WellRowDto[], formations: FormationDto[], engineer: AuthUser): Promise<number> {
    const service = this.service(ReservesCasesService);
    const existing = (await service.list(assetId)).find((c) => c.name === DEMO_CASE.name);
    let created = 0;
    let caseId = existing?.id;
    if (!caseId) {
      const formation = formations.find((f) => f.name === DEMO_CASE.formation)!;
      const wellIds = DEMO_CASE.wells.map((n) => wells.find((w) => w.name === n)!.id);
      caseId = (await service.create(assetId, { name: DEMO_CASE.name, formationId: formation.id, wellIds, inputs: demoCaseInputs(), seed: DEMO_CASE.seed }, engineer)).id;
      created = 1;
    }
    const dto = await service.get(assetId, caseId);
    if (!dto.resultsCurrent && (dto.status === 'draft' || dto.status === 'returned')) await service.run(assetId, caseId, engineer);
    return created;
  }
}
