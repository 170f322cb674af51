import { Injectable } from '@nestjs/common';
import { auditLog, curves, logRuns, users, wells, type Curve, type LogRun, type NewAuditEntry, type NewWell, type Well } from '@poreline/schema';
import { and, asc, eq, inArray } from 'drizzle-orm';
import { DatabaseService } from '../database/database.module.js';

/** Log run columns without the original bytes (those are only read for export and audit). */
const logRunColumns = {
  id: logRuns.id,
  wellId: logRuns.wellId,
  fileName: logRuns.fileName,
  sha256: logRuns.sha256,
  sizeBytes: logRuns.sizeBytes,
  lasVersion: logRuns.lasVersion,
  wrapped: logRuns.wrapped,
  diagnostics: logRuns.diagnostics,
  depthUnit: logRuns.depthUnit,
  start: logRuns.start,
  stop: logRuns.stop,
  step: logRuns.step,
  rowCount: logRuns.rowCount,
  curveCount: logRuns.curveCount,
  uploadedBy: logRuns.uploadedBy,
  uploadedByName: users.name,
  uploadedAt: logRuns.uploadedAt,
};
export type LogRunSummary = Omit<LogRun, 'original' | 'header'> & { uploadedByName: string | null };

const curveColumns = {
  id: curves.id,
  logRunId: curves.logRunId,
  position: curves.position,
  mnemonic: curves.mnemonic,
  unit: curves.unit,
  description: curves.description,
  curveClass: curves.curveClass,
  nullCount: curves.nullCount,
  min: curves.min,
  max: curves.max,
};
export type CurveSummary = Omit<Curve, 'samples' | 'originalMnemonic'>;

/** All Drizzle access to wells. */
@Injectable()
export class WellsRepository {
  constructor(private readonly database: DatabaseService) {}

  listByAsset(assetId: string): Promise<Well[]> {
    return this.database.db.select().from(wells).where(eq(wells.assetId, assetId)).orderBy(asc(wells.name));
  }

  async findInAsset(assetId: string, wellId: string): Promise<Well | undefined> {
    const [row] = await this.database.db
      .select()
      .from(wells)
      .where(and(eq(wells.assetId, assetId), eq(wells.id, wellId)));
    return row;
  }

  async findByName(assetId: string, name: string): Promise<Well | undefined> {
    const [row] = await this.database.db
      .select()
      .from(wells)
      .where(and(eq(wells.assetId, assetId), eq(wells.name, name)));
    return row;
  }

  async insert(values: NewWell): Promise<Well> {
    const [row] = await this.database.db.insert(wells).values(values).returning();
    return row;
  }

  /** Applies a patch and writes its audit entry, in one transaction. */
  update(wellId: string, patch: Partial<NewWell>, audit: (row: Well) => Omit<NewAuditEntry, 'id' | 'at'>): Promise<Well> {
    return this.database.db.transaction(async (tx) => {
      const [row] = await tx.update(wells).set(patch).where(eq(wells.id, wellId)).returning();
      await tx.insert(auditLog).values(audit(row));
      return row;
    });
  }

  logRunsOf(wellIds: string[]): Promise<LogRunSummary[]> {
    if (!wellIds.length) return Promise.resolve([]);
    return this.database.db.select(logRunColumns).from(logRuns).leftJoin(users, eq(users.id, logRuns.uploadedBy)).where(inArray(logRuns.wellId, wellIds)).orderBy(asc(logRuns.uploadedAt));
  }

  curvesOf(logRunIds: string[]): Promise<CurveSummary[]> {
    if (!logRunIds.length) return Promise.resolve([]);
    return this.database.db
      .select(curveColumns)
      .from(curves)
      .where(inArray(curves.logRunId, logRunIds))
      .orderBy(asc(curves.logRunId), asc(curves.position));
  }
}
