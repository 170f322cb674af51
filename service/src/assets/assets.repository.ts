import { Injectable } from '@nestjs/common';
import { assetMembers, assets, type Asset, type MemberRole, type NewAsset, type NewAuditEntry } from '@poreline/schema';
import { and, eq, ne, sql } from 'drizzle-orm';
import { AuditService } from '../audit/audit.service.js';
import { DatabaseService } from '../database/database.module.js';
import type { AuthUser } from '../auth/auth-user.js';

type AuditValues = Omit<NewAuditEntry, 'id' | 'at'>;

/** All Drizzle access to assets and their members. */
@Injectable()
export class AssetsRepository {
  constructor(
    private readonly database: DatabaseService,
    private readonly audit: AuditService,
  ) {}

  /** The user's role in the asset, or undefined when they may not see it. */
  async roleOf(user: Pick<AuthUser, 'id' | 'isAdmin' | 'organisationId'>, assetId: string): Promise<MemberRole | undefined> {
    const db = this.database.db;
    const [member] = await db
      .select({ role: assetMembers.role })
      .from(assetMembers)
      .where(and(eq(assetMembers.assetId, assetId), eq(assetMembers.userId, user.id)));
    if (member) return member.role;
    if (!user.isAdmin) return undefined;
    const [asset] = await db
      .select({ id: assets.id })
      .from(assets)
      .where(and(eq(assets.id, assetId), eq(assets.organisationId, user.organisationId)));
    return asset ? 'admin' : undefined;
  }

  async findById(assetId: string): Promise<Asset | undefined> {
    const [row] = await this.database.db.select().from(assets).where(eq(assets.id, assetId));
    return row;
  }

  /** An asset of the organisation with this name (case-insensitive), other than `exceptId`. */
  async findByName(organisationId: string, name: string, exceptId?: string): Promise<Asset | undefined> {
    const [row] = await this.database.db
      .select()
      .from(assets)
      .where(and(eq(assets.organisationId, organisationId), eq(sql`lower(${assets.name})`, name.toLowerCase()), exceptId ? ne(assets.id, exceptId) : undefined));
    return row;
  }

  /** Inserts the asset, makes `adminUserId` its admin member and writes the audit entry, in one transaction. */
  async insertWithAdmin(values: NewAsset, adminUserId: string, audit: (asset: Asset) => AuditValues): Promise<Asset> {
    return this.database.db.transaction(async (tx) => {
      const [asset] = await tx.insert(assets).values(values).returning();
      await tx.insert(assetMembers).values({ assetId: asset.id, userId: adminUserId, role: 'admin' });
      await this.audit.record(audit(asset), tx);
      return asset;
    });
  }

  /** Changes name or description with the audit entry, in one transaction. */
  async update(assetId: string, patch: Pick<Partial<Asset>, 'name' | 'description'>, audit: (after: Asset) => AuditValues): Promise<Asset> {
    return this.database.db.transaction(async (tx) => {
      const [row] = await tx.update(assets).set(patch).where(eq(assets.id, assetId)).returning();
      await this.audit.record(audit(row), tx);
      return row;
    });
  }
}
