import { Injectable } from '@nestjs/common';
import { AuditRepository } from './audit.repository.js';
import type { AuditEntryDto, AuditQueryDto } from './dto/audit.dto.js';

/** The asset's audit trail for admins and reviewers, newest first. */
@Injectable()
export class AuditLogService {
  constructor(private readonly audit: AuditRepository) {}

  async list(assetId: string, query: AuditQueryDto): Promise<AuditEntryDto[]> {
    const rows = await this.audit.listByAsset(assetId, query.entity, query.limit ?? 100);
    return rows.map(({ entry, userName, userEmail }) => ({
      id: entry.id,
      at: entry.at.toISOString(),
      user: entry.userId && userName !== null && userEmail !== null ? { id: entry.userId, name: userName, email: userEmail } : null,
      action: entry.action,
      entity: entry.entity,
      entityId: entry.entityId,
      before: entry.before ?? null,
      after: entry.after ?? null,
    }));
  }
}
