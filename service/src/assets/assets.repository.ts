import { Injectable } from '@nestjs/common';
import { assetMembers, assets, type Asset, type MemberRole } from '@poreline/schema';
import { and, eq } from 'drizzle-orm';
import { DatabaseService } from '../database/database.module.js';
import type { AuthUser } from '../auth/auth-user.js';

/** All Drizzle access to assets and their members. */
@Injectable()
export class AssetsRepository {
  constructor(private readonly database: DatabaseService) {}

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
}
