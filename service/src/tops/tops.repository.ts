import { Injectable } from '@nestjs/common';
import { formations, wellTops, type NewAuditEntry, type NewWellTop } from '@poreline/schema';
import { asc, eq } from 'drizzle-orm';
import { AuditService } from '../audit/audit.service.js';
import { DatabaseService } from '../database/database.module.js';

export interface TopRow {
  formationId: string;
  formationName: string;
  colour: string;
  ordinal: number;
  md: number;
  source: string;
}

/** All Drizzle access to formation tops of wells. */
@Injectable()
export class TopsRepository {
  constructor(
    private readonly database: DatabaseService,
    private readonly audit: AuditService,
  ) {}

  listByWell(wellId: string): Promise<TopRow[]> {
    return this.database.db
      .select({ formationId: wellTops.formationId, formationName: formations.name, colour: formations.colour, ordinal: formations.ordinal, md: wellTops.md, source: wellTops.source })
      .from(wellTops)
      .innerJoin(formations, eq(formations.id, wellTops.formationId))
      .where(eq(wellTops.wellId, wellId))
      .orderBy(asc(wellTops.md));
  }

  /** Replaces every top of the well and writes the audit entry, in one transaction. */
  async replace(wellId: string, rows: Omit<NewWellTop, 'wellId'>[], audit: Omit<NewAuditEntry, 'id' | 'at'>): Promise<void> {
    await this.database.db.transaction(async (tx) => {
      await tx.delete(wellTops).where(eq(wellTops.wellId, wellId));
      if (rows.length) await tx.insert(wellTops).values(rows.map((r) => ({ ...r, wellId })));
      await this.audit.record(audit, tx);
    });
  }
}
