import { Injectable } from '@nestjs/common';
import { formations, wells, wellTops, type Formation, type NewAuditEntry, type NewFormation } from '@poreline/schema';
import { and, asc, eq, sql } from 'drizzle-orm';
import { AuditService } from '../audit/audit.service.js';
import type { Executor } from '../common/db-types.js';
import { DatabaseService } from '../database/database.module.js';

export type FormationCutoffs = Pick<Formation, 'vshMax' | 'phiMin' | 'swMax' | 'permMin'>;
type AuditValues = Omit<NewAuditEntry, 'id' | 'at'>;

/** All Drizzle access to formations (names, order, colour, lithology, cutoffs). */
@Injectable()
export class FormationsRepository {
  constructor(
    private readonly database: DatabaseService,
    private readonly audit: AuditService,
  ) {}

  list(assetId: string, db: Executor = this.database.db): Promise<Formation[]> {
    return db.select().from(formations).where(eq(formations.assetId, assetId)).orderBy(asc(formations.ordinal), asc(formations.name));
  }

  async find(assetId: string, formationId: string): Promise<Formation | undefined> {
    const [row] = await this.database.db
      .select()
      .from(formations)
      .where(and(eq(formations.assetId, assetId), eq(formations.id, formationId)));
    return row;
  }

  /** Case-insensitive: "Upper Sand" and "upper sand" are the same formation to a user. */
  async findByName(assetId: string, name: string): Promise<Formation | undefined> {
    const [row] = await this.database.db
      .select()
      .from(formations)
      .where(and(eq(formations.assetId, assetId), eq(sql`lower(${formations.name})`, name.toLowerCase())));
    return row;
  }

  /** Inserts at a 1-based position (others shift down) with its audit entry, in one transaction. */
  create(values: Omit<NewFormation, 'ordinal'>, position: number | undefined, audit: (row: Formation) => AuditValues): Promise<Formation> {
    return this.database.db.transaction(async (tx) => {
      const existing = await this.list(values.assetId, tx);
      const [row] = await tx
        .insert(formations)
        .values({ ...values, ordinal: existing.length + 1 })
        .returning();
      const renumbered = await this.renumber(tx, [...existing, row], row.id, position);
      await this.audit.record(audit(renumbered), tx);
      return renumbered;
    });
  }

  /** Applies a patch and an optional move to a 1-based position, with its audit entry, in one transaction. */
  update(formation: Formation, patch: Partial<Pick<Formation, 'name' | 'colour' | 'lithology'>>, position: number | undefined, audit: (row: Formation) => AuditValues): Promise<Formation> {
    return this.database.db.transaction(async (tx) => {
      let [row] = await tx.update(formations).set(patch).where(eq(formations.id, formation.id)).returning();
      if (position !== undefined) row = await this.renumber(tx, await this.list(formation.assetId, tx), formation.id, position);
      await this.audit.record(audit(row), tx);
      return row;
    });
  }

  /** Writes a formation's cutoffs through `db` (the caller's transaction). */
  async setCutoffs(db: Executor, formationId: string, cutoffs: FormationCutoffs): Promise<Formation> {
    const [row] = await db.update(formations).set(cutoffs).where(eq(formations.id, formationId)).returning();
    return row;
  }

  /** Every top of every well of the asset (to check a new formation order against them). */
  topsOfAsset(assetId: string): Promise<{ wellId: string; wellName: string; formationId: string; md: number }[]> {
    return this.database.db
      .select({ wellId: wellTops.wellId, wellName: wells.name, formationId: wellTops.formationId, md: wellTops.md })
      .from(wellTops)
      .innerJoin(wells, eq(wells.id, wellTops.wellId))
      .where(eq(wells.assetId, assetId));
  }

  /** Moves `id` to `position` (clamped to 1..n) and writes ordinals 1..n; returns the moved row. */
  private async renumber(tx: Executor, ordered: Formation[], id: string, position: number | undefined): Promise<Formation> {
    const order = ordered.filter((f) => f.id !== id);
    const moved = ordered.find((f) => f.id === id)!;
    const at = position === undefined ? order.length : Math.min(Math.max(position - 1, 0), order.length);
    order.splice(at, 0, moved);
    let result = moved;
    for (const [i, f] of order.entries()) {
      if (f.ordinal === i + 1 && f.id !== id) continue;
      const [row] = await tx.update(formations).set({ ordinal: i + 1 }).where(eq(formations.id, f.id)).returning();
      if (f.id === id) result = row;
    }
    return result;
  }
}
