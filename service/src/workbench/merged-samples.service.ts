import { BadRequestException, ConflictException, Injectable } from '@nestjs/common';
import { convertDepths, encodeCurveBundle, normaliseCurveUnits } from '@poreline/core';
import { BINDING_CLASSES, type BindingKey } from '../bindings/binding-keys.js';
import { convertDepth, normaliseDepthUnit, type DepthUnit } from '../common/well-depth.js';
import { fromFloat64Bytes } from '../log-runs/curve-stats.js';
import { mergeRuns } from './merge-runs.js';
import { MergedSamplesRepository } from './merged-samples.repository.js';

/** A binding as the merge needs it. */
export interface MergeBinding {
  binding: BindingKey;
  logRunId: string;
  mnemonic: string;
}

export interface MergedEntry {
  binding: BindingKey;
  /** The binding key upper case: GR, RHOB, NPHI, ... */
  mnemonic: string;
  /** Canonical unit of the curve class. */
  unit: string;
  curveClass: string;
  source: { logRunId: string; fileName: string; mnemonic: string; unit: string };
}

export interface MergedSamples {
  depthUnit: DepthUnit;
  depth: Float64Array;
  step: number;
  entries: MergedEntry[];
  values: Float64Array[];
  /** The runs whose curves were used, with their sha256 (provenance). */
  runs: { id: string; fileName: string; sha256: string }[];
}

@Injectable()
export class MergedSamplesService {
  constructor(private readonly repository: MergedSamplesRepository) {}

  /**
   * The bound curves of a well on one depth index (see mergeRuns) in `depthUnit`, each in the
   * canonical unit of its class. 409 when nothing is bound; 400 when a curve's unit does not fit its binding.
   */
  async merge(wellId: string, bindings: readonly MergeBinding[], depthUnit: DepthUnit): Promise<MergedSamples> {
    if (!bindings.length) throw new ConflictException('No curve is bound for this well yet: upload a LAS file with recognised curves or confirm the bindings first.');
    const runIds = [...new Set(bindings.map((b) => b.logRunId))];
    const runs = await this.repository.runs(wellId, runIds);
    const rows = await this.repository.curves(runIds, [...new Set(bindings.map((b) => b.mnemonic))]);
    const inputs = bindings.map((b) => {
      const run = runs.find((r) => r.id === b.logRunId);
      const index = rows.find((c) => c.logRunId === b.logRunId && c.position === 0);
      const curve = rows.find((c) => c.logRunId === b.logRunId && c.position > 0 && c.mnemonic === b.mnemonic);
      if (!run || !index || !curve) throw new ConflictException(`The ${b.binding} binding points at ${b.mnemonic} of a log run that no longer exists: confirm the bindings again.`);
      const runUnit = normaliseDepthUnit(run.depthUnit);
      if (!runUnit) throw new BadRequestException(`Log run ${run.fileName} has a non-depth index (${run.depthUnit}); it cannot be merged on depth.`);
      let normalised;
      try {
        normalised = normaliseCurveUnits(fromFloat64Bytes(curve.samples), curve.unit, BINDING_CLASSES[b.binding]);
      } catch (error) {
        throw new BadRequestException(`Binding ${b.binding} (${b.mnemonic} of ${run.fileName}): ${(error as Error).message.replace(/^normaliseCurveUnits: /, '')}`);
      }
      return {
        run,
        curve,
        normalised,
        depth: convertDepths(fromFloat64Bytes(index.samples), runUnit, depthUnit),
        step: run.step === null ? null : convertDepth(run.step, runUnit, depthUnit),
      };
    });
    const merged = mergeRuns(inputs.map((i) => ({ depth: i.depth, values: i.normalised.values, step: i.step })));
    return {
      depthUnit,
      depth: merged.depth,
      step: merged.step,
      values: merged.values,
      entries: bindings.map((b, k) => ({
        binding: b.binding,
        mnemonic: b.binding.toUpperCase(),
        unit: inputs[k].normalised.unit,
        curveClass: BINDING_CLASSES[b.binding],
        source: { logRunId: b.logRunId, fileName: inputs[k].run.fileName, mnemonic: b.mnemonic, unit: inputs[k].curve.unit },
      })),
      runs: runIds.map((id) => runs.find((r) => r.id === id)!).map((r) => ({ id: r.id, fileName: r.fileName, sha256: r.sha256 })),
    };
  }

  /** The merge as a binary curve bundle: DEPT first, then one entry per binding. */
  static toBundle(m: MergedSamples): Uint8Array {
    return encodeCurveBundle(
      [
        { mnemonic: 'DEPT', unit: m.depthUnit, step: m.step },
        ...m.entries.map((e) => ({ mnemonic: e.mnemonic, unit: e.unit, curveClass: e.curveClass, binding: e.binding, source: e.source })),
      ],
      [m.depth, ...m.values],
    );
  }
}
