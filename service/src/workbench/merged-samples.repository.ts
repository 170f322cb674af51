import { Injectable } from '@nestjs/common';
import { curves, logRuns } from '@poreline/schema';
import { and, asc, eq, inArray, or } from 'drizzle-orm';
import { DatabaseService } from '../database/database.module.js';

/** Reads the runs and curve samples a merge needs (index curves and the bound curves only). */
@Injectable()
export class MergedSamplesRepository {
  constructor(private readonly database: DatabaseService) {}

  runs(wellId: string, runIds: string[]) {
    if (!runIds.length) return Promise.resolve([]);
    return this.database.db
      .select({ id: logRuns.id, fileName: logRuns.fileName, sha256: logRuns.sha256, depthUnit: logRuns.depthUnit, step: logRuns.step })
      .from(logRuns)
      .where(and(eq(logRuns.wellId, wellId), inArray(logRuns.id, runIds)));
  }

  /** Every run of the well (for splicing a bound curve with the same class from other runs). */
  allRuns(wellId: string) {
    return this.database.db
      .select({ id: logRuns.id, fileName: logRuns.fileName, sha256: logRuns.sha256, depthUnit: logRuns.depthUnit, step: logRuns.step })
      .from(logRuns)
      .where(eq(logRuns.wellId, wellId))
      .orderBy(asc(logRuns.uploadedAt));
  }

  /**
   * In one query, the curves a merge reads: the index curve of every run, every curve of the
   * given classes (splice sources), and the bound curves by mnemonic in the bound runs; ordered
   * by position.
   */
  curvesForMerge(runIds: string[], boundRunIds: string[], mnemonics: string[], classes: string[]) {
    if (!runIds.length) return Promise.resolve([]);
    const wanted = [eq(curves.position, 0)];
    if (classes.length) wanted.push(inArray(curves.curveClass, classes));
    if (boundRunIds.length && mnemonics.length) wanted.push(and(inArray(curves.logRunId, boundRunIds), inArray(curves.mnemonic, mnemonics))!);
    return this.database.db
      .select({ logRunId: curves.logRunId, position: curves.position, mnemonic: curves.mnemonic, unit: curves.unit, curveClass: curves.curveClass, samples: curves.samples })
      .from(curves)
      .where(and(inArray(curves.logRunId, runIds), or(...wanted)))
      .orderBy(asc(curves.position));
  }
}
