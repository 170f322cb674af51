import { Injectable } from '@nestjs/common';
import {
  auditLog,
  formations,
  interpretations,
  logRuns,
  reservesCases,
  users,
  wells,
  type Database,
  type Formation,
  type NewReservesCase,
  type ReservesCase,
} from '@poreline/schema';
import { and, asc, desc, eq, inArray } from 'drizzle-orm';
import { DatabaseService } from '../database/database.module.js';

/** A database handle or an open transaction. */
export type Tx = Pick<Database, 'insert' | 'update' | 'select'>;

/** An approved interpretation version, with the well it belongs to. */
export interface ApprovedVersion {
  id: string;
  wellId: string;
  wellName: string;
  version: number;
  reviewedAt: Date | null;
  summaries: Record<string, unknown>[];
  inputs: Record<string, unknown>;
}

/** All Drizzle access for reserves cases. */
@Injectable()
export class ReservesCasesRepository {
  constructor(private readonly database: DatabaseService) {}

  transaction<T>(work: (tx: Tx) => Promise<T>): Promise<T> {
    return this.database.db.transaction((tx) => work(tx));
  }

  listByAsset(assetId: string): Promise<ReservesCase[]> {
    return this.database.db.select().from(reservesCases).where(eq(reservesCases.assetId, assetId)).orderBy(desc(reservesCases.updatedAt));
  }

  async findInAsset(assetId: string, caseId: string): Promise<ReservesCase | undefined> {
    const [row] = await this.database.db
      .select()
      .from(reservesCases)
      .where(and(eq(reservesCases.assetId, assetId), eq(reservesCases.id, caseId)));
    return row;
  }

  async insert(values: NewReservesCase, tx: Tx): Promise<ReservesCase> {
    const [row] = await tx.insert(reservesCases).values(values).returning();
    return row;
  }

  async update(caseId: string, values: Partial<NewReservesCase>, tx: Tx): Promise<ReservesCase> {
    const [row] = await tx
      .update(reservesCases)
      .set({ ...values, updatedAt: new Date() })
      .where(eq(reservesCases.id, caseId))
      .returning();
    return row;
  }

  async formationInAsset(assetId: string, formationId: string): Promise<Formation | undefined> {
    const [row] = await this.database.db
      .select()
      .from(formations)
      .where(and(eq(formations.assetId, assetId), eq(formations.id, formationId)));
    return row;
  }

  formationsOf(ids: string[]): Promise<Formation[]> {
    if (!ids.length) return Promise.resolve([]);
    return this.database.db.select().from(formations).where(inArray(formations.id, ids));
  }

  /** Every approved interpretation version of the asset's wells, newest version first per well. */
  approvedVersions(assetId: string, wellIds?: string[]): Promise<ApprovedVersion[]> {
    const where = [eq(wells.assetId, assetId), eq(interpretations.status, 'approved')];
    if (wellIds) {
      if (!wellIds.length) return Promise.resolve([]);
      where.push(inArray(interpretations.wellId, wellIds));
    }
    return this.database.db
      .select({
        id: interpretations.id,
        wellId: interpretations.wellId,
        wellName: wells.name,
        version: interpretations.version,
        reviewedAt: interpretations.reviewedAt,
        summaries: interpretations.summaries,
        inputs: interpretations.inputs,
      })
      .from(interpretations)
      .innerJoin(wells, eq(wells.id, interpretations.wellId))
      .where(and(...where))
      .orderBy(asc(wells.name), desc(interpretations.version));
  }

  /** Newest approved version number and id per well (for staleness), across the given wells. */
  async latestApproved(wellIds: string[]): Promise<Map<string, { version: number; id: string }>> {
    const out = new Map<string, { version: number; id: string }>();
    if (!wellIds.length) return out;
    const rows = await this.database.db
      .select({ wellId: interpretations.wellId, version: interpretations.version, id: interpretations.id })
      .from(interpretations)
      .where(and(inArray(interpretations.wellId, wellIds), eq(interpretations.status, 'approved')))
      .orderBy(desc(interpretations.version));
    for (const r of rows) if (!out.has(r.wellId)) out.set(r.wellId, { version: r.version, id: r.id });
    return out;
  }

  /** Depth unit of each well's first log run (fallback when a summary does not state it). */
  async depthUnits(wellIds: string[]): Promise<Map<string, string>> {
    const out = new Map<string, string>();
    if (!wellIds.length) return out;
    const rows = await this.database.db
      .select({ wellId: logRuns.wellId, depthUnit: logRuns.depthUnit })
      .from(logRuns)
      .where(inArray(logRuns.wellId, wellIds))
      .orderBy(asc(logRuns.uploadedAt));
    for (const r of rows) if (!out.has(r.wellId)) out.set(r.wellId, r.depthUnit);
    return out;
  }

  async userNames(ids: (string | null)[]): Promise<Map<string, { id: string; name: string; email: string }>> {
    const wanted = [...new Set(ids.filter((i): i is string => !!i))];
    const out = new Map<string, { id: string; name: string; email: string }>();
    if (!wanted.length) return out;
    const rows = await this.database.db.select({ id: users.id, name: users.name, email: users.email }).from(users).where(inArray(users.id, wanted));
    for (const r of rows) out.set(r.id, r);
    return out;
  }

  auditOf(assetId: string, caseId: string) {
    return this.database.db
      .select({ id: auditLog.id, at: auditLog.at, userId: auditLog.userId, action: auditLog.action, before: auditLog.before, after: auditLog.after })
      .from(auditLog)
      .where(and(eq(auditLog.assetId, assetId), eq(auditLog.entity, 'reserves-case'), eq(auditLog.entityId, caseId)))
      .orderBy(asc(auditLog.at), asc(auditLog.id));
  }
}
