import { Injectable } from '@nestjs/common';
import { assetMembers, assets, users, type MemberRole, type NewAuditEntry, type NewUser, type User } from '@poreline/schema';
import { and, asc, count, eq, inArray } from 'drizzle-orm';
import { AuditService } from '../audit/audit.service.js';
import { DatabaseService } from '../database/database.module.js';

type AuditValues = Omit<NewAuditEntry, 'id' | 'at'>;

/** A user's explicit membership of an asset. */
export interface AccountMembership {
  userId: string;
  assetId: string;
  assetName: string;
  role: MemberRole;
}

/**
 * All Drizzle access for managing accounts (the admin area). Sign-in look-ups stay in
 * auth/users.repository.ts; this one lists, creates and edits accounts of an organisation.
 */
@Injectable()
export class UserAccountsRepository {
  constructor(
    private readonly database: DatabaseService,
    private readonly audit: AuditService,
  ) {}

  listByOrganisation(organisationId: string): Promise<User[]> {
    return this.database.db.select().from(users).where(eq(users.organisationId, organisationId)).orderBy(asc(users.name), asc(users.email));
  }

  async findInOrganisation(organisationId: string, userId: string): Promise<User | undefined> {
    const [row] = await this.database.db
      .select()
      .from(users)
      .where(and(eq(users.id, userId), eq(users.organisationId, organisationId)));
    return row;
  }

  async countAdmins(organisationId: string): Promise<number> {
    const [row] = await this.database.db
      .select({ n: count() })
      .from(users)
      .where(and(eq(users.organisationId, organisationId), eq(users.isAdmin, true)));
    return row.n;
  }

  async membershipsOf(userIds: string[]): Promise<AccountMembership[]> {
    if (!userIds.length) return [];
    return this.database.db
      .select({ userId: assetMembers.userId, assetId: assets.id, assetName: assets.name, role: assetMembers.role })
      .from(assetMembers)
      .innerJoin(assets, eq(assets.id, assetMembers.assetId))
      .where(inArray(assetMembers.userId, userIds))
      .orderBy(asc(assets.name));
  }

  /** Inserts the account with its audit entry, in one transaction. */
  async insert(values: NewUser, audit: (user: User) => AuditValues): Promise<User> {
    return this.database.db.transaction(async (tx) => {
      const [row] = await tx.insert(users).values(values).returning();
      await this.audit.record(audit(row), tx);
      return row;
    });
  }

  /** Changes the account with its audit entry, in one transaction. */
  async update(userId: string, patch: Partial<Pick<User, 'name' | 'isAdmin' | 'passwordHash'>>, audit: (after: User) => AuditValues): Promise<User> {
    return this.database.db.transaction(async (tx) => {
      const [row] = await tx.update(users).set(patch).where(eq(users.id, userId)).returning();
      await this.audit.record(audit(row), tx);
      return row;
    });
  }
}

/** True when the database refused a row for a unique index (PostgreSQL 23505), also when Drizzle wraps the driver's error. */
export function isUniqueViolation(error: unknown): boolean {
  for (let e: unknown = error, depth = 0; e && typeof e === 'object' && depth < 3; e = (e as { cause?: unknown }).cause, depth++) {
    if ((e as { code?: unknown }).code === '23505') return true;
  }
  return false;
}
