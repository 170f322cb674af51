import { HttpException, Injectable } from '@nestjs/common';
import { EVALUATION_CONVENTIONS, minimumCurvature, type CutoffSet, type ZoneParameters } from '@poreline/core';
import type { Formation, Well } from '@poreline/schema';
import { BindingsService } from '../bindings/bindings.service.js';
import type { BindingDto } from '../bindings/dto/bindings.dto.js';
import { wellDepthUnit, type DepthUnit } from '../common/well-depth.js';
import { FormationsRepository } from '../formations/formations.repository.js';
import { InterpretationsRepository } from '../interpretations/interpretations.repository.js';
import { toInterpretationDto, userIdsOf } from '../interpretations/interpretations.mapper.js';
import { SurveysService, type SurveyStationsInUnit } from '../surveys/surveys.service.js';
import type { ZoneDto } from '../tops/dto/tops.dto.js';
import { TopsService } from '../tops/tops.service.js';
import { WellsRepository } from '../wells/wells.repository.js';
import { WellsService } from '../wells/wells.service.js';
import { ZoneParametersService } from '../zone-parameters/zone-parameters.service.js';
import type { WorkbenchDto } from './dto/workbench.dto.js';
import { evaluationZones, type EvaluationZoneSpec } from './evaluation-zones.js';
import { MergedSamplesService, type MergedSamples } from './merged-samples.service.js';

/** Everything that goes into evaluating a well as it stands now (the working state). */
export interface WorkingState {
  well: Well;
  depthUnit: DepthUnit | null;
  formations: Formation[];
  /** Zones from the tops (unclipped). */
  zones: ZoneDto[];
  /** The zones evaluateWell runs on, clipped to the merged index, with their parameters. */
  evaluationZones: EvaluationZoneSpec<ZoneParameters>[];
  notes: string[];
  cutoffs: Record<string, CutoffSet & { permMin: number | null }>;
  bindings: BindingDto[];
  survey: SurveyStationsInUnit | null;
  merged: MergedSamples | null;
}

@Injectable()
export class WorkbenchService {
  constructor(
    private readonly wells: WellsService,
    private readonly wellRows: WellsRepository,
    private readonly formations: FormationsRepository,
    private readonly tops: TopsService,
    private readonly zoneParameters: ZoneParametersService,
    private readonly bindings: BindingsService,
    private readonly surveys: SurveysService,
    private readonly mergedSamples: MergedSamplesService,
    private readonly interpretations: InterpretationsRepository,
  ) {}

  /** The working state of a well of the asset (404 for a well of another asset). */
  async state(assetId: string, wellId: string): Promise<WorkingState> {
    const well = await this.wells.require(assetId, wellId);
    const runs = await this.wellRows.logRunsOf([well.id]);
    const depthUnit = wellDepthUnit(runs);
    const formations = await this.formations.list(assetId);
    const zones = await this.tops.zonesOf(well);
    const params = await this.zoneParameters.forZones(well, zones.map((z) => formations.find((f) => f.id === z.formationId)!));
    const bindings = await this.bindings.effective(well.id);
    const survey = depthUnit ? await this.surveys.stationsFor(well, depthUnit) : null;
    const notes: string[] = [];
    let merged: MergedSamples | null = null;
    if (depthUnit && bindings.length) {
      try {
        merged = await this.mergedSamples.merge(well.id, bindings, depthUnit);
      } catch (error) {
        if (!(error instanceof HttpException)) throw error;
        notes.push(error.message);
      }
    } else notes.push(runs.length ? 'No curve is bound: confirm the curve bindings.' : 'No log run is loaded for this well yet.');
    const n = merged?.depth.length ?? 0;
    const clipped = evaluationZones(
      zones.map((z, i) => ({ ...z, params: params[i].params as unknown as ZoneParameters, isDefault: params[i].isDefault })),
      merged && n ? { first: merged.depth[0], last: merged.depth[n - 1] } : null,
    );
    const cutoffs = Object.fromEntries(formations.map((f) => [f.name, { vshMax: f.vshMax, phiMin: f.phiMin, swMax: f.swMax, permMin: f.permMin }]));
    return { well, depthUnit, formations, zones, evaluationZones: clipped.zones, notes: [...notes, ...clipped.notes], cutoffs, bindings, survey, merged };
  }

  /** Everything the browser needs to evaluate the well locally, exactly as the server does on Save. */
  async workbench(assetId: string, wellId: string): Promise<WorkbenchDto> {
    const s = await this.state(assetId, wellId);
    const latest = await this.interpretations.latest(wellId);
    const path = s.survey ? minimumCurvature(s.survey.stations) : null;
    const n = s.merged?.depth.length ?? 0;
    return {
      well: await this.wells.get(assetId, wellId),
      depthUnit: s.depthUnit,
      zones: s.evaluationZones.map((z) => ({ ...z, params: z.params as unknown as Record<string, unknown> })),
      notes: s.notes,
      cutoffs: s.cutoffs,
      bindings: s.bindings,
      survey: s.survey && path ? { depthUnit: s.survey.depthUnit, stations: s.survey.stations, md: Array.from(path.md), tvd: Array.from(path.tvd) } : null,
      merged: s.merged && n ? { start: s.merged.depth[0], stop: s.merged.depth[n - 1], step: s.merged.step, samples: n } : null,
      conventions: EVALUATION_CONVENTIONS.map((c) => ({ key: c.key, statement: c.statement })),
      latest: latest ? toInterpretationDto(latest, await this.interpretations.userNames(userIdsOf([latest]))) : null,
    };
  }

  /** The merged samples of the current bindings as a curve bundle. */
  async mergedBundle(assetId: string, wellId: string): Promise<Uint8Array> {
    const well = await this.wells.require(assetId, wellId);
    const depthUnit = wellDepthUnit(await this.wellRows.logRunsOf([well.id]));
    const bindings = await this.bindings.effective(well.id);
    return MergedSamplesService.toBundle(await this.mergedSamples.merge(well.id, depthUnit ? bindings : [], depthUnit ?? 'ft'));
  }
}
