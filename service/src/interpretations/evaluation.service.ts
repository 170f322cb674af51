import { BadRequestException, Injectable } from '@nestjs/common';
import { EvaluationInputError, evaluateWell, formatIssue, type EvaluateWellResult, type WellCurves } from '@poreline/core';
import { MergedSamplesService, type MergedSamples } from '../workbench/merged-samples.service.js';
import type { InterpretationInputs } from './interpretation-inputs.js';

/** Curves evaluateWell reads (the other bindings are for display only). */
const EVALUATED = ['gr', 'rhob', 'nphi', 'dt', 'rt', 'sp'] as const;

export interface Evaluation {
  result: EvaluateWellResult;
  merged: MergedSamples;
  summaries: Record<string, unknown>[];
  warnings: Record<string, unknown>[];
}

/** Runs core's evaluateWell on an interpretation snapshot: the one place the server evaluates. */
@Injectable()
export class EvaluationService {
  constructor(private readonly mergedSamples: MergedSamplesService) {}

  /**
   * Evaluates a snapshot on the merged samples of its bindings (merged again from the stored
   * log runs unless given). 400 listing every issue, each naming the zone and field.
   */
  async evaluate(wellId: string, inputs: InterpretationInputs, merged?: MergedSamples): Promise<Evaluation> {
    const m = merged ?? (await this.mergedSamples.merge(wellId, inputs.bindings, inputs.depthUnit));
    if (!inputs.zones.length) throw new BadRequestException('Nothing to evaluate: no zone lies inside the logged interval. Pick formation tops first.');
    const curves: WellCurves = {};
    m.entries.forEach((e, i) => {
      if ((EVALUATED as readonly string[]).includes(e.binding)) curves[e.binding as (typeof EVALUATED)[number]] = m.values[i];
    });
    let result: EvaluateWellResult;
    try {
      result = evaluateWell({
        depth: m.depth,
        depthUnit: inputs.depthUnit,
        curves,
        zones: inputs.zones.map((z) => ({ name: z.name, formation: z.formation, top: z.top, base: z.base, params: z.params })),
        cutoffs: inputs.cutoffs,
        survey: inputs.survey?.stations,
      });
    } catch (error) {
      if (error instanceof EvaluationInputError) throw new BadRequestException({ statusCode: 400, error: 'Bad Request', message: error.issues.map(formatIssue), issues: error.issues });
      if (error instanceof RangeError) throw new BadRequestException(error.message);
      throw error;
    }
    const notes = inputs.notes.map((message) => ({ zone: null, message }));
    return {
      result,
      merged: m,
      summaries: result.zones as unknown as Record<string, unknown>[],
      warnings: [...notes, ...result.warnings] as unknown as Record<string, unknown>[],
    };
  }
}
