import { Injectable } from '@nestjs/common';
import { interpretations, users, wells, type Interpretation, type NewAuditEntry, type NewInterpretation, type ReviewStatus } from '@poreline/schema';
import { and, desc, eq, inArray } from 'drizzle-orm';
import { AuditService } from '../audit/audit.service.js';
import type { Executor } from '../common/db-types.js';
import { DatabaseService } from '../database/database.module.js';

type AuditValues = Omit<NewAuditEntry, 'id' | 'at'>;
export type InterpretationPatch = Partial<Pick<Interpretation, 'status' | 'inputs' | 'summaries' | 'warnings' | 'submittedBy' | 'submittedAt' | 'reviewedBy' | 'reviewedAt' | 'reviewComment'>>;

/** All Drizzle access to interpretation versions. */
@Injectable()
export class InterpretationsRepository {
  constructor(
    private readonly database: DatabaseService,
    private readonly audit: AuditService,
  ) {}

  listByWell(wellId: string): Promise<Interpretation[]> {
    return this.database.db.select().from(interpretations).where(eq(interpretations.wellId, wellId)).orderBy(desc(interpretations.version));
  }

  async find(wellId: string, id: string): Promise<Interpretation | undefined> {
    const [row] = await this.database.db
      .select()
      .from(interpretations)
      .where(and(eq(interpretations.wellId, wellId), eq(interpretations.id, id)));
    return row;
  }

  async latest(wellId: string): Promise<Interpretation | undefined> {
    const [row] = await this.database.db.select().from(interpretations).where(eq(interpretations.wellId, wellId)).orderBy(desc(interpretations.version)).limit(1);
    return row;
  }

  /** The newest version of each well of the asset (optionally the newest approved one), with the well's name. */
  async latestPerWell(assetId: string, approvedOnly: boolean): Promise<{ wellName: string; row: Interpretation }[]> {
    const rows = await this.database.db
      .select({ wellName: wells.name, row: interpretations })
      .from(interpretations)
      .innerJoin(wells, eq(wells.id, interpretations.wellId))
      .where(approvedOnly ? and(eq(wells.assetId, assetId), eq(interpretations.status, 'approved')) : eq(wells.assetId, assetId))
      .orderBy(wells.name, desc(interpretations.version));
    const seen = new Set<string>();
    return rows.filter((r) => !seen.has(r.row.wellId) && seen.add(r.row.wellId));
  }

  async userNames(ids: (string | null)[]): Promise<Map<string, string>> {
    const wanted = [...new Set(ids.filter((x): x is string => !!x))];
    if (!wanted.length) return new Map();
    const rows = await this.database.db.select({ id: users.id, name: users.name }).from(users).where(inArray(users.id, wanted));
    return new Map(rows.map((r) => [r.id, r.name]));
  }

  /** Inserts a version and its audit entry in one transaction. */
  insert(values: NewInterpretation, audit: (row: Interpretation) => AuditValues): Promise<Interpretation> {
    return this.database.db.transaction(async (tx) => {
      const [row] = await tx.insert(interpretations).values(values).returning();
      await this.audit.record(audit(row), tx);
      return row;
    });
  }

  /**
   * Updates a version only while it is still in `expected` status (a concurrent change makes it
   * return undefined), with its audit entry, in one transaction.
   */
  update(id: string, expected: readonly ReviewStatus[], patch: InterpretationPatch, audit: (row: Interpretation) => AuditValues): Promise<Interpretation | undefined> {
    return this.database.db.transaction(async (tx) => {
      const row = await this.updateIn(tx, id, expected, patch);
      if (row) await this.audit.record(audit(row), tx);
      return row;
    });
  }

  /** {@link update} through the caller's transaction, without audit. */
  async updateIn(db: Executor, id: string, expected: readonly ReviewStatus[], patch: InterpretationPatch): Promise<Interpretation | undefined> {
    const [row] = await db
      .update(interpretations)
      .set(patch)
      .where(and(eq(interpretations.id, id), inArray(interpretations.status, [...expected])))
      .returning();
    return row;
  }

  /** Runs `fn` in one transaction (several rows and their audit entries together). */
  transaction<T>(fn: (tx: Executor) => Promise<T>): Promise<T> {
    return this.database.db.transaction(fn);
  }
}
