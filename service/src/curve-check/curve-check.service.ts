import { Injectable } from '@nestjs/common';
import { bytesToFloat64, CURVE_CLASSES, normaliseCurveUnits, type CurveClass } from '@poreline/core';
import { WellsService } from '../wells/wells.service.js';
import { checkCurve } from './check-curve.js';
import { CurveCheckRepository } from './curve-check.repository.js';
import type { CurveCheckDto } from './dto/curve-check.dto.js';
import { EXPECTED_RANGES } from './expected-ranges.js';

const isCurveClass = (c: string | null): c is CurveClass => CURVE_CLASSES.some((k) => k.curveClass === c);

/** The plausible range of the class converted to the curve's own unit; null when the class or unit is unknown. */
function expectedInUnit(curveClass: string | null, unit: string): { min: number; max: number } | null {
  if (!isCurveClass(curveClass)) return null;
  let factor: number;
  try {
    factor = normaliseCurveUnits([], unit, curveClass).factor;
  } catch {
    return null;
  }
  const r = EXPECTED_RANGES[curveClass];
  return { min: r.min / factor, max: r.max / factor };
}

@Injectable()
export class CurveCheckService {
  constructor(
    private readonly repository: CurveCheckRepository,
    private readonly wells: WellsService,
  ) {}

  /** Coverage, gaps and range violations of every curve of every run of the well (index curves left out). */
  async check(assetId: string, wellId: string): Promise<CurveCheckDto[]> {
    await this.wells.require(assetId, wellId);
    const rows = await this.repository.curvesWithSamples(wellId);
    const depthOf = new Map(rows.filter((r) => r.position === 0).map((r) => [r.logRunId, bytesToFloat64(r.samples)]));
    return rows
      .filter((r) => r.position > 0)
      .map((r) => ({
        logRunId: r.logRunId,
        fileName: r.fileName,
        depthUnit: r.depthUnit,
        mnemonic: r.mnemonic,
        unit: r.unit,
        curveClass: r.curveClass,
        ...checkCurve(depthOf.get(r.logRunId)!, bytesToFloat64(r.samples), expectedInUnit(r.curveClass, r.unit)),
      }));
  }
}
