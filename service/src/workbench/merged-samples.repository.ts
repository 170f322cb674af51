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

  /** Index curves of the runs and their curves of the given classes. */
  curvesOfClasses(runIds: string[], classes: string[]) {
    if (!runIds.length || !classes.length) return Promise.resolve([]);
    return this.database.db
      .select({ logRunId: curves.logRunId, position: curves.position, mnemonic: curves.mnemonic, unit: curves.unit, curveClass: curves.curveClass, samples: curves.samples })
      .from(curves)
      .where(and(inArray(curves.logRunId, runIds), or(eq(curves.position, 0), inArray(curves.curveClass, classes))))
      .orderBy(asc(curves.position));
  }

  curves(runIds: string[], mnemonics: string[]) {
    if (!runIds.length) return Promise.resolve([]);
    return this.database.db
      .select({ logRunId: curves.logRunId, position: curves.position, mnemonic: curves.mnemonic, unit: curves.unit, samples: curves.samples })
      .from(curves)
      .where(and(inArray(curves.logRunId, runIds), or(eq(curves.position, 0), inArray(curves.mnemonic, mnemonics))));
  }
}
