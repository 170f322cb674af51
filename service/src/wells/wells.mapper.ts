import type { Well } from '@poreline/schema';
import type { CurveDto, LogRunDetailDto, LogRunDto } from '../log-runs/dto/log-run.dto.js';
import type { WellRowDto } from './dto/well.dto.js';
import type { CurveSummary, LogRunSummary } from './wells.repository.js';

export function toLogRunDto(run: LogRunSummary): LogRunDto {
  return {
    id: run.id,
    wellId: run.wellId,
    fileName: run.fileName,
    sha256: run.sha256,
    sizeBytes: run.sizeBytes,
    lasVersion: run.lasVersion,
    wrapped: run.wrapped,
    depthUnit: run.depthUnit,
    start: run.start,
    stop: run.stop,
    step: run.step,
    rowCount: run.rowCount,
    curveCount: run.curveCount,
    uploadedAt: run.uploadedAt.toISOString(),
    uploadedBy: run.uploadedBy,
    uploadedByName: run.uploadedByName,
  };
}

export function toCurveDto(c: CurveSummary): CurveDto {
  return {
    id: c.id,
    mnemonic: c.mnemonic,
    unit: c.unit,
    description: c.description,
    curveClass: c.curveClass,
    nullCount: c.nullCount,
    min: c.min,
    max: c.max,
  };
}

export function toLogRunDetailDto(run: LogRunSummary, curves: CurveSummary[]): LogRunDetailDto {
  return { ...toLogRunDto(run), curves: curves.map(toCurveDto), diagnostics: run.diagnostics };
}

/** A well with its runs; curves count excludes each run's index curve. */
export function toWellRowDto<R extends LogRunDto>(well: Well, runs: R[]): WellRowDto & { logRuns: R[] } {
  const tops = runs.map((r) => Math.min(r.start, r.stop));
  const bases = runs.map((r) => Math.max(r.start, r.stop));
  return {
    id: well.id,
    name: well.name,
    uwi: well.uwi,
    latitude: well.latitude,
    longitude: well.longitude,
    kbElevation: well.kbElevation,
    groundElevation: well.groundElevation,
    depthReference: well.depthReference,
    logRunCount: runs.length,
    curveCount: runs.reduce((n, r) => n + Math.max(0, r.curveCount - 1), 0),
    top: runs.length ? Math.min(...tops) : null,
    base: runs.length ? Math.max(...bases) : null,
    depthUnit: runs[0]?.depthUnit ?? null,
    logRuns: runs,
  };
}
