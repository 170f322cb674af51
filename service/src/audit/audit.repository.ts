import { Injectable } from '@nestjs/common';
import { auditLog, users } from '@poreline/schema';
import { and, desc, eq } from 'drizzle-orm';
import { DatabaseService } from '../database/database.module.js';

/** Reads the audit log (writes go through AuditService.record). */
@Injectable()
export class AuditRepository {
  constructor(private readonly database: DatabaseService) {}

  listByAsset(assetId: string, entity: string | undefined, limit: number) {
    return this.database.db
      .select({ entry: auditLog, userName: users.name, userEmail: users.email })
      .from(auditLog)
      .leftJoin(users, eq(users.id, auditLog.userId))
      .where(entity ? and(eq(auditLog.assetId, assetId), eq(auditLog.entity, entity)) : eq(auditLog.assetId, assetId))
      .orderBy(desc(auditLog.at), desc(auditLog.id))
      .limit(limit);
  }
}
