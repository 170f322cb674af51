import { Injectable } from '@nestjs/common';
import { auditLog, type Database, type NewAuditEntry } from '@poreline/schema';
import { DatabaseService } from '../database/database.module.js';

/** Writes the audit trail: who changed what, when, before and after. */
@Injectable()
export class AuditService {
  constructor(private readonly database: DatabaseService) {}

  /** Records one entry; pass `tx` to write inside the caller's transaction. */
  async record(entry: Omit<NewAuditEntry, 'id' | 'at'>, tx?: Pick<Database, 'insert'>): Promise<void> {
    await (tx ?? this.database.db).insert(auditLog).values(entry);
  }
}
