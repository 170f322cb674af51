import { HttpException, Injectable, NotFoundException } from '@nestjs/common';
import { RESERVES_DISCLAIMER, type ZoneParameters, type ZoneSummary } from '@poreline/core';
import {
  MODEL_CUTOFFS,
  POROSITY_TOLERANCE,
  SW_TOLERANCE,
  VOLUME_TOLERANCE,
  WELLS,
  compareVolumesWithModel,
  compareWithModel,
  demoTops,
  modelTruth,
  zoneParametersFor,
  type ComparisonRow,
  type EvaluatedWell,
} from '@poreline/demo-wells';
import type { Well } from '@poreline/schema';
import { BindingsService } from '../bindings/bindings.service.js';
import { APP_VERSION } from '../common/app-version.js';
import { wellDepthUnit, type DepthUnit } from '../common/well-depth.js';
import { FormationsRepository } from '../formations/formations.repository.js';
import { EvaluationService } from '../interpretations/evaluation.service.js';
import type { InterpretationInputs } from '../interpretations/interpretation-inputs.js';
import { SurveysService, type SurveyStationsInUnit } from '../surveys/surveys.service.js';
import { WellsRepository } from '../wells/wells.repository.js';
import type { EvaluationZoneSpec } from '../workbench/evaluation-zones.js';
import { MergedSamplesService, type MergedSamples } from '../workbench/merged-samples.service.js';
import { demoCheckZones } from './demo-check-zones.js';
import { DemoCheckRepository } from './demo-check.repository.js';
import type { DemoCheckDto, DemoNotEvaluatedDto, DemoVolumeRowDto, DemoZoneRowDto } from './dto/demo-check.dto.js';

const EXPLANATION =
  'The Wrenmoor demo field is generated from a known layered earth model: every layer has a set porosity, shale volume ' +
  'and water saturation, and the LAS files are the logs those layers would give. This check evaluates the stored logs ' +
  "with the model's zone parameters and cutoffs, through the same evaluation a saved interpretation runs, and compares " +
  'each zone with the model: net reservoir and net pay within one sample step, mean porosity within 0.005, mean Sw ' +
  "within 0.02, and in-place volumes from the evaluated fluid zones within 2% of the model's own.";

/** Model vs evaluated for the demo asset (404 for any other asset). */
@Injectable()
export class DemoCheckService {
  constructor(
    private readonly wellRows: WellsRepository,
    private readonly formations: FormationsRepository,
    private readonly bindings: BindingsService,
    private readonly surveys: SurveysService,
    private readonly mergedSamples: MergedSamplesService,
    private readonly evaluation: EvaluationService,
    private readonly assets: DemoCheckRepository,
  ) {}

  async check(assetId: string): Promise<DemoCheckDto> {
    if (!(await this.assets.isDemoAsset(assetId))) throw new NotFoundException('The model-vs-evaluated check exists only for the demo asset.');
    const wells = await this.wellRows.listByAsset(assetId);
    const formationIds = Object.fromEntries((await this.formations.list(assetId)).map((f) => [f.name, f.id]));
    const truth = modelTruth();
    const tops = demoTops();
    const formationRuns: EvaluatedWell[] = [];
    const fluidRuns: EvaluatedWell[] = [];
    const notEvaluated: DemoNotEvaluatedDto[] = [];

    for (const spec of WELLS) {
      const wt = truth.wells.find((w) => w.name === spec.name)!;
      const modelZones = [...wt.zones.map((z) => z.zone), ...wt.fluidZones.map((z) => z.zone)];
      const miss = (reason: string, zones: readonly string[] = modelZones) => zones.forEach((zone) => notEvaluated.push({ well: spec.name, zone, reason }));
      const well = wells.find((w) => w.name === spec.name);
      if (!well) {
        miss('The well is not in the demo asset.');
        continue;
      }
      const prepared = await this.prepare(well);
      if ('reason' in prepared) {
        miss(prepared.reason);
        continue;
      }
      const { depthUnit, merged, survey } = prepared;
      const n = merged.depth.length;
      const zones = demoCheckZones(spec.name, tops, depthUnit, { first: merged.depth[0], last: merged.depth[n - 1] }, zoneParametersFor(spec.name), formationIds);
      try {
        if (zones.formationZones.length) formationRuns.push({ well: spec.name, depthUnit, zones: await this.evaluate(well.id, depthUnit, zones.formationZones, merged, survey) });
        if (zones.fluidZones.length) fluidRuns.push({ well: spec.name, depthUnit, zones: await this.evaluate(well.id, depthUnit, zones.fluidZones, merged, survey) });
      } catch (error) {
        if (!(error instanceof HttpException)) throw error;
        miss(`The evaluation refused the well: ${error.message}`);
        continue;
      }
      const evaluated = new Set([...zones.formationZones, ...zones.fluidZones].map((z) => z.name));
      for (const zone of modelZones.filter((z) => !evaluated.has(z))) {
        miss(zones.notes.find((note) => note.includes(`'${zone}'`)) ?? 'The zone lies outside the evaluated interval.', [zone]);
      }
    }

    const zoneRows = [...compareWithModel(formationRuns).map((r) => zoneRow(r, 'formation')), ...compareWithModel(fluidRuns).map((r) => zoneRow(r, 'fluid'))];
    const volumes = compareVolumesWithModel(fluidRuns).map(
      (v): DemoVolumeRowDto => ({
        accumulation: v.accumulation,
        fluid: v.fluid,
        unit: v.unit,
        model: v.model,
        evaluated: v.evaluated,
        relativeDifference: v.relativeDifference,
        tolerance: v.tolerance,
        pass: v.pass,
        wells: v.modelVolume.wells,
        missingWells: v.missingWells,
        areaAcres: v.modelVolume.areaAcres,
        fvf: v.modelVolume.fvf,
        modelInputs: { netPayFt: v.modelVolume.netPayFt, porosity: v.modelVolume.porosity, sw: v.modelVolume.sw },
        evaluatedInputs: v.evaluatedVolume ? { netPayFt: v.evaluatedVolume.netPayFt, porosity: v.evaluatedVolume.porosity, sw: v.evaluatedVolume.sw } : null,
      }),
    );
    const formationZoneRows = zoneRows.filter((r) => r.zoneKind === 'formation');
    const largest = (q: DemoZoneRowDto['quantity']) => Math.max(0, ...zoneRows.filter((r) => r.quantity === q && r.difference !== null).map((r) => Math.abs(r.difference!)));
    const zonesInModel = truth.wells.reduce((s, w) => s + w.zones.length, 0);
    const zonesEvaluated = new Set(formationZoneRows.map((r) => `${r.well}\u0000${r.zone}`)).size;
    return {
      assetId,
      generatedAt: new Date().toISOString(),
      explanation: EXPLANATION,
      basis: [
        'Logs: the LAS files stored for each well, merged on its curve bindings (as the workbench shows them).',
        "Zones: the model's formation tops, and its fluid zones (each formation cut at the model's gas-oil and oil-water contacts) for the volumes.",
        `Parameters and cutoffs: the model's own zone parameters per well and formation; cutoffs Vsh <= ${MODEL_CUTOFFS['Wren Sand'].vshMax}, porosity >= ${MODEL_CUTOFFS['Wren Sand'].phiMin}, Sw <= ${MODEL_CUTOFFS['Wren Sand'].swMax} in every formation.`,
        'Evaluation: core evaluateWell, the code a saved interpretation runs; TVD thickness through the stored deviation survey where there is one.',
        "Volumes: in place by the volumetric equations with the model's map area, Bg or Bo for each accumulation, from the evaluated fluid zones of the wells the model counts in it.",
      ],
      tolerances: { thickness: 'one sample step (0.5 ft; 0.1 m in the metric well)', porosity: POROSITY_TOLERANCE, sw: SW_TOLERANCE, volumeRelative: VOLUME_TOLERANCE },
      summary: {
        zoneRows: zoneRows.length,
        zoneRowsPassed: zoneRows.filter((r) => r.pass).length,
        volumeRows: volumes.length,
        volumeRowsPassed: volumes.filter((v) => v.pass).length,
        zonesEvaluated,
        zonesInModel,
        allPass: zoneRows.every((r) => r.pass) && volumes.every((v) => v.pass),
        largest: {
          netReservoirFt: largest('net reservoir'),
          netPayFt: largest('net pay'),
          porosity: largest('mean porosity'),
          sw: largest('mean Sw'),
          volumeRelative: Math.max(0, ...volumes.filter((v) => v.relativeDifference !== null).map((v) => Math.abs(v.relativeDifference!))),
        },
      },
      zones: zoneRows,
      volumes,
      notEvaluated,
      caution: RESERVES_DISCLAIMER,
    };
  }

  /** The well's merged samples on its bindings, in its depth unit, and its survey; or why there are none. */
  private async prepare(well: Well): Promise<{ depthUnit: DepthUnit; merged: MergedSamples; survey: SurveyStationsInUnit | null } | { reason: string }> {
    const depthUnit = wellDepthUnit(await this.wellRows.logRunsOf([well.id]));
    const bindings = depthUnit ? await this.bindings.effective(well.id) : [];
    if (!depthUnit || !bindings.length) return { reason: 'The well has no log data bound for evaluation.' };
    try {
      const merged = await this.mergedSamples.merge(well.id, bindings, depthUnit);
      if (!merged.depth.length) return { reason: 'The merged log of the well is empty.' };
      return { depthUnit, merged, survey: await this.surveys.stationsFor(well, depthUnit) };
    } catch (error) {
      if (error instanceof HttpException) return { reason: error.message };
      throw error;
    }
  }

  /** Runs the evaluation service (core evaluateWell) on the zones, as Save would with these inputs. */
  private async evaluate(wellId: string, depthUnit: DepthUnit, zones: EvaluationZoneSpec<ZoneParameters>[], merged: MergedSamples, survey: SurveyStationsInUnit | null): Promise<ZoneSummary[]> {
    const inputs: InterpretationInputs = {
      depthUnit,
      zones: zones.map((z) => ({ formationId: z.formationId, name: z.name, formation: z.formation, top: z.top, base: z.base, params: z.params, isDefault: false })),
      cutoffs: Object.fromEntries(zones.map((z) => [z.formation, { ...MODEL_CUTOFFS[z.formation], permMin: null }])),
      survey: survey ? { stations: survey.stations } : null,
      bindings: merged.entries.map((e) => ({ binding: e.binding, logRunId: e.source.logRunId, fileName: e.source.fileName, mnemonic: e.source.mnemonic, unit: e.source.unit })),
      tops: [],
      logRuns: merged.runs,
      merged: { start: merged.depth[0], stop: merged.depth[merged.depth.length - 1], step: merged.step, samples: merged.depth.length },
      notes: [],
      appVersion: APP_VERSION,
    };
    return (await this.evaluation.evaluate(wellId, inputs, merged)).result.zones;
  }
}

function zoneRow(r: ComparisonRow, zoneKind: 'formation' | 'fluid'): DemoZoneRowDto {
  return {
    well: r.well,
    zone: r.zone,
    zoneKind,
    quantity: r.quantity,
    unit: r.unit,
    model: r.model,
    evaluated: r.evaluated,
    difference: r.evaluated === null ? null : r.evaluated - r.model,
    tolerance: r.tolerance,
    pass: r.pass,
  };
}
