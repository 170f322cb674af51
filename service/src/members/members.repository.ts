import { Injectable } from '@nestjs/common';
import { assetMembers, assets, users, type MemberRole, type NewAuditEntry } from '@poreline/schema';
import { and, asc, eq, sql } from 'drizzle-orm';
import { AuditService } from '../audit/audit.service.js';
import { DatabaseService } from '../database/database.module.js';

type AuditValues = Omit<NewAuditEntry, 'id' | 'at'>;

/** All Drizzle access to the members of an asset. */
@Injectable()
export class MembersRepository {
  constructor(
    private readonly database: DatabaseService,
    private readonly audit: AuditService,
  ) {}

  list(assetId: string) {
    return this.database.db
      .select({ userId: users.id, name: users.name, email: users.email, role: assetMembers.role, isAdmin: users.isAdmin })
      .from(assetMembers)
      .innerJoin(users, eq(users.id, assetMembers.userId))
      .where(eq(assetMembers.assetId, assetId))
      .orderBy(asc(users.name));
  }

  /** A user of the asset's organisation, by e-mail (case-insensitive). */
  async userInAssetOrganisation(assetId: string, email: string) {
    const [row] = await this.database.db
      .select({ id: users.id, name: users.name, email: users.email })
      .from(users)
      .innerJoin(assets, eq(assets.organisationId, users.organisationId))
      .where(and(eq(assets.id, assetId), eq(sql`lower(${users.email})`, email.trim().toLowerCase())));
    return row;
  }

  async roleOf(assetId: string, userId: string): Promise<MemberRole | undefined> {
    const [row] = await this.database.db
      .select({ role: assetMembers.role })
      .from(assetMembers)
      .where(and(eq(assetMembers.assetId, assetId), eq(assetMembers.userId, userId)));
    return row?.role;
  }

  /** Adds the member or changes the role, with the audit entry, in one transaction. */
  async upsert(assetId: string, userId: string, role: MemberRole, audit: AuditValues): Promise<void> {
    await this.database.db.transaction(async (tx) => {
      await tx.insert(assetMembers).values({ assetId, userId, role }).onConflictDoUpdate({ target: [assetMembers.assetId, assetMembers.userId], set: { role, updatedAt: new Date() } });
      await this.audit.record(audit, tx);
    });
  }

  /** Removes the member with the audit entry, in one transaction. */
  async remove(assetId: string, userId: string, audit: AuditValues): Promise<void> {
    await this.database.db.transaction(async (tx) => {
      await tx.delete(assetMembers).where(and(eq(assetMembers.assetId, assetId), eq(assetMembers.userId, userId)));
      await this.audit.record(audit, tx);
    });
  }
}
