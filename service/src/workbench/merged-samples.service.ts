import { BadRequestException, ConflictException, Injectable } from '@nestjs/common';
import { bytesToFloat64, convertDepths, encodeCurveBundle, normaliseCurveUnits } from '@poreline/core';
import { BINDING_CLASSES, type BindingKey } from '../bindings/binding-keys.js';
import { convertDepth, normaliseDepthUnit, type DepthUnit } from '../common/well-depth.js';
import { mergeRuns, spliceOutside } from './merge-runs.js';
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
  /** Other runs whose curve of the same class filled depths outside the bound run's interval. */
  splicedFrom: { logRunId: string; fileName: string; mnemonic: string; unit: string }[];
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
   * canonical unit of its class. Several runs of one well are spliced: outside the bound run's
   * logged interval, the same class of curve from the well's other runs fills in (see
   * spliceOutside; each entry lists the runs it took samples from). 409 when nothing is bound;
   * 400 when a curve's unit does not fit its binding.
   */
  async merge(wellId: string, bindings: readonly MergeBinding[], depthUnit: DepthUnit): Promise<MergedSamples> {
    if (!bindings.length) throw new ConflictException('No curve is bound for this well yet: upload a LAS file with recognised curves or confirm the bindings first.');
    const runIds = [...new Set(bindings.map((b) => b.logRunId))];
    const allRuns = await this.repository.allRuns(wellId);
    const runs = allRuns.filter((r) => runIds.includes(r.id));
    const mnemonics = [...new Set(bindings.map((b) => b.mnemonic))];
    const classes = [...new Set(bindings.map((b) => BINDING_CLASSES[b.binding]))];
    const read = await this.repository.curvesForMerge(
      allRuns.map((r) => r.id),
      runIds,
      mnemonics,
      classes,
    );
    // The bound runs' index and bound curves, and every run's index and curves of the bound classes.
    const rows = read.filter((c) => runIds.includes(c.logRunId) && (c.position === 0 || mnemonics.includes(c.mnemonic)));
    const classRows = read.filter((c) => c.position === 0 || (c.curveClass !== null && (classes as string[]).includes(c.curveClass)));
    const indexOf = (runId: string) => rows.find((c) => c.logRunId === runId && c.position === 0) ?? classRows.find((c) => c.logRunId === runId && c.position === 0);
    const primaries = bindings.map((b) => {
      const run = runs.find((r) => r.id === b.logRunId);
      const index = indexOf(b.logRunId);
      const curve = rows.find((c) => c.logRunId === b.logRunId && c.position > 0 && c.mnemonic === b.mnemonic);
      if (!run || !index || !curve) throw new ConflictException(`The ${b.binding} binding points at ${b.mnemonic} of a log run that no longer exists: confirm the bindings again.`);
      const runUnit = normaliseDepthUnit(run.depthUnit);
      if (!runUnit) throw new BadRequestException(`Log run ${run.fileName} has a non-depth index (${run.depthUnit}); it cannot be merged on depth.`);
      let normalised;
      try {
        normalised = normaliseCurveUnits(bytesToFloat64(curve.samples), curve.unit, BINDING_CLASSES[b.binding]);
      } catch (error) {
        throw new BadRequestException(`Binding ${b.binding} (${b.mnemonic} of ${run.fileName}): ${(error as Error).message.replace(/^normaliseCurveUnits: /, '')}`);
      }
      return { run, curve, normalised, ...this.runDepth(index.samples, run, runUnit, depthUnit) };
    });
    // Splice sources: the same class of curve in the well's other runs (first curve per run, runs in upload order).
    const fallbacks = bindings.map((b) =>
      allRuns
        .filter((r) => r.id !== b.logRunId && normaliseDepthUnit(r.depthUnit))
        .flatMap((run) => {
          const curve = classRows.find((c) => c.logRunId === run.id && c.position > 0 && c.curveClass === BINDING_CLASSES[b.binding]);
          const index = indexOf(run.id);
          if (!curve || !index) return [];
          try {
            const normalised = normaliseCurveUnits(bytesToFloat64(curve.samples), curve.unit, BINDING_CLASSES[b.binding]);
            return [{ run, curve, normalised, ...this.runDepth(index.samples, run, normaliseDepthUnit(run.depthUnit)!, depthUnit) }];
          } catch {
            return []; // a unit that does not fit this class is never spliced in
          }
        }),
    );
    const all = [...primaries, ...fallbacks.flat()];
    const merged = mergeRuns(all.map((i) => ({ depth: i.depth, values: i.normalised.values, step: i.step })));
    let next = primaries.length;
    const spliced = primaries.map((p, k) => {
      const own = fallbacks[k].map(() => merged.values[next++]);
      const [top, base] = finiteRange(p.depth);
      return spliceOutside(merged.depth, merged.values[k], top, base, own);
    });
    return {
      depthUnit,
      depth: merged.depth,
      step: merged.step,
      values: spliced.map((s) => s.values),
      entries: bindings.map((b, k) => ({
        binding: b.binding,
        mnemonic: b.binding.toUpperCase(),
        unit: primaries[k].normalised.unit,
        curveClass: BINDING_CLASSES[b.binding],
        source: { logRunId: b.logRunId, fileName: primaries[k].run.fileName, mnemonic: b.mnemonic, unit: primaries[k].curve.unit },
        splicedFrom: fallbacks[k]
          .filter((_, f) => spliced[k].used[f] > 0)
          .map((f) => ({ logRunId: f.run.id, fileName: f.run.fileName, mnemonic: f.curve.mnemonic, unit: f.curve.unit })),
      })),
      runs: allRuns
        .filter((r) => runIds.includes(r.id) || spliced.some((s, k) => fallbacks[k].some((f, i) => f.run.id === r.id && s.used[i] > 0)))
        .map((r) => ({ id: r.id, fileName: r.fileName, sha256: r.sha256 })),
    };
  }

  private runDepth(indexSamples: Uint8Array, run: { step: number | null }, runUnit: DepthUnit, depthUnit: DepthUnit) {
    return {
      depth: convertDepths(bytesToFloat64(indexSamples), runUnit, depthUnit),
      step: run.step === null ? null : convertDepth(run.step, runUnit, depthUnit),
    };
  }

  /** The merge as a binary curve bundle: DEPT first, then one entry per binding. */
  static toBundle(m: MergedSamples): Uint8Array {
    return encodeCurveBundle(
      [
        { mnemonic: 'DEPT', unit: m.depthUnit, step: m.step },
        ...m.entries.map((e) => ({ mnemonic: e.mnemonic, unit: e.unit, curveClass: e.curveClass, binding: e.binding, source: e.source, splicedFrom: e.splicedFrom })),
      ],
      [m.depth, ...m.values],
    );
  }
}

function finiteRange(depth: Float64Array): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (const d of depth) {
    if (d < lo) lo = d;
    if (d > hi) hi = d;
  }
  return [lo, hi];
}
