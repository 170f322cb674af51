import { Injectable } from '@nestjs/common';
import { curves, logRuns, type NewCurve, type NewLogRun } from '@poreline/schema';
import { and, asc, eq } from 'drizzle-orm';
import { AuditService } from '../audit/audit.service.js';
import { DatabaseService } from '../database/database.module.js';

/** All Drizzle access to log runs and their curve samples. */
@Injectable()
export class LogRunsRepository {
  constructor(
    private readonly database: DatabaseService,
    private readonly audit: AuditService,
  ) {}

  async findBySha(wellId: string, sha256: string): Promise<{ id: string; fileName: string } | undefined> {
    const [row] = await this.database.db
      .select({ id: logRuns.id, fileName: logRuns.fileName })
      .from(logRuns)
      .where(and(eq(logRuns.wellId, wellId), eq(logRuns.sha256, sha256)));
    return row;
  }

  /** Stores a run and all its curves in one transaction: whole or not at all. */
  async insertWithCurves(run: NewLogRun, curveRows: Omit<NewCurve, 'logRunId'>[], audit: { assetId: string; userId: string }): Promise<string> {
    return this.database.db.transaction(async (tx) => {
      const [inserted] = await tx.insert(logRuns).values(run).returning({ id: logRuns.id });
      if (curveRows.length) await tx.insert(curves).values(curveRows.map((c) => ({ ...c, logRunId: inserted.id })));
      await this.audit.record(
        {
          assetId: audit.assetId,
          userId: audit.userId,
          action: 'upload',
          entity: 'log_run',
          entityId: inserted.id,
          after: { fileName: run.fileName, sha256: run.sha256, curves: curveRows.map((c) => c.mnemonic) },
        },
        tx,
      );
      return inserted.id;
    });
  }

  async findRun(wellId: string, runId: string) {
    const [row] = await this.database.db
      .select({ id: logRuns.id, fileName: logRuns.fileName, depthUnit: logRuns.depthUnit })
      .from(logRuns)
      .where(and(eq(logRuns.wellId, wellId), eq(logRuns.id, runId)));
    return row;
  }

  samplesOf(runId: string) {
    return this.database.db
      .select({ mnemonic: curves.mnemonic, unit: curves.unit, description: curves.description, curveClass: curves.curveClass, samples: curves.samples })
      .from(curves)
      .where(eq(curves.logRunId, runId))
      .orderBy(asc(curves.position));
  }
}
