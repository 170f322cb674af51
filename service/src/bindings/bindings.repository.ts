import { Injectable } from '@nestjs/common';
import { curveBindings, type CurveBinding, type NewAuditEntry, type NewCurveBinding } from '@poreline/schema';
import { eq } from 'drizzle-orm';
import { AuditService } from '../audit/audit.service.js';
import { DatabaseService } from '../database/database.module.js';

/** All Drizzle access to a well's curve bindings. */
@Injectable()
export class BindingsRepository {
  constructor(
    private readonly database: DatabaseService,
    private readonly audit: AuditService,
  ) {}

  listByWell(wellId: string): Promise<CurveBinding[]> {
    return this.database.db.select().from(curveBindings).where(eq(curveBindings.wellId, wellId));
  }

  /** Replaces the well's bindings and writes the audit entry, in one transaction. */
  async replace(wellId: string, rows: Omit<NewCurveBinding, 'wellId'>[], audit: Omit<NewAuditEntry, 'id' | 'at'>): Promise<void> {
    await this.database.db.transaction(async (tx) => {
      await tx.delete(curveBindings).where(eq(curveBindings.wellId, wellId));
      if (rows.length) await tx.insert(curveBindings).values(rows.map((r) => ({ ...r, wellId })));
      await this.audit.record(audit, tx);
    });
  }
}
