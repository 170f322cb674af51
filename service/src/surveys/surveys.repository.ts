import { Injectable } from '@nestjs/common';
import { wellSurveys, type NewAuditEntry, type NewWellSurvey, type WellSurvey } from '@poreline/schema';
import { eq } from 'drizzle-orm';
import { AuditService } from '../audit/audit.service.js';
import { DatabaseService } from '../database/database.module.js';

/** All Drizzle access to deviation surveys. */
@Injectable()
export class SurveysRepository {
  constructor(
    private readonly database: DatabaseService,
    private readonly audit: AuditService,
  ) {}

  async find(wellId: string): Promise<WellSurvey | undefined> {
    const [row] = await this.database.db.select().from(wellSurveys).where(eq(wellSurveys.wellId, wellId));
    return row;
  }

  /** Stores (or replaces) the well's survey and writes the audit entry, in one transaction. */
  upsert(values: NewWellSurvey, audit: Omit<NewAuditEntry, 'id' | 'at'>): Promise<WellSurvey> {
    return this.database.db.transaction(async (tx) => {
      const { fileName, depthUnit, stations, uploadedBy } = values;
      const [row] = await tx
        .insert(wellSurveys)
        .values(values)
        .onConflictDoUpdate({ target: wellSurveys.wellId, set: { fileName, depthUnit, stations, uploadedBy, updatedAt: new Date() } })
        .returning();
      await this.audit.record(audit, tx);
      return row;
    });
  }
}
