import { Injectable } from '@nestjs/common';
import { zoneParameters, type NewAuditEntry, type ZoneParameterRow } from '@poreline/schema';
import { and, eq } from 'drizzle-orm';
import { AuditService } from '../audit/audit.service.js';
import { DatabaseService } from '../database/database.module.js';

/** All Drizzle access to per-zone evaluation parameters. */
@Injectable()
export class ZoneParametersRepository {
  constructor(
    private readonly database: DatabaseService,
    private readonly audit: AuditService,
  ) {}

  listByWell(wellId: string): Promise<ZoneParameterRow[]> {
    return this.database.db.select().from(zoneParameters).where(eq(zoneParameters.wellId, wellId));
  }

  async find(wellId: string, formationId: string): Promise<ZoneParameterRow | undefined> {
    const [row] = await this.database.db
      .select()
      .from(zoneParameters)
      .where(and(eq(zoneParameters.wellId, wellId), eq(zoneParameters.formationId, formationId)));
    return row;
  }

  /** Stores the zone's parameters and the audit entry, in one transaction. */
  async upsert(wellId: string, formationId: string, params: Record<string, unknown>, audit: Omit<NewAuditEntry, 'id' | 'at'>): Promise<void> {
    await this.database.db.transaction(async (tx) => {
      await tx
        .insert(zoneParameters)
        .values({ wellId, formationId, params })
        .onConflictDoUpdate({ target: [zoneParameters.wellId, zoneParameters.formationId], set: { params, updatedAt: new Date() } });
      await this.audit.record(audit, tx);
    });
  }
}
