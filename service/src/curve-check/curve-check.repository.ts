import { Injectable } from '@nestjs/common';
import { curves, logRuns } from '@poreline/schema';
import { asc, eq } from 'drizzle-orm';
import { DatabaseService } from '../database/database.module.js';

/** Reads every curve of a well with its samples, for the curve check. */
@Injectable()
export class CurveCheckRepository {
  constructor(private readonly database: DatabaseService) {}

  curvesWithSamples(wellId: string) {
    return this.database.db
      .select({
        logRunId: curves.logRunId,
        fileName: logRuns.fileName,
        depthUnit: logRuns.depthUnit,
        position: curves.position,
        mnemonic: curves.mnemonic,
        unit: curves.unit,
        curveClass: curves.curveClass,
        samples: curves.samples,
      })
      .from(curves)
      .innerJoin(logRuns, eq(logRuns.id, curves.logRunId))
      .where(eq(logRuns.wellId, wellId))
      .orderBy(asc(logRuns.uploadedAt), asc(curves.logRunId), asc(curves.position));
  }
}
