import { Injectable } from '@nestjs/common';
import { assetMembers, assets, users, type MemberRole, type User } from '@poreline/schema';
import { count, eq, sql } from 'drizzle-orm';
import { DatabaseService } from '../database/database.module.js';

export interface Membership {
  assetId: string;
  assetName: string;
  role: MemberRole;
}

/** All Drizzle access to users. */
@Injectable()
export class UsersRepository {
  constructor(private readonly database: DatabaseService) {}

  async findById(id: string): Promise<User | undefined> {
    const [row] = await this.database.db.select().from(users).where(eq(users.id, id));
    return row;
  }

  async findByEmail(email: string): Promise<User | undefined> {
    const [row] = await this.database.db
      .select()
      .from(users)
      .where(eq(sql`lower(${users.email})`, email.trim().toLowerCase()));
    return row;
  }

  async count(): Promise<number> {
    const [row] = await this.database.db.select({ n: count() }).from(users);
    return row.n;
  }

  /** Assets the user is a member of; a global admin sees every asset of the organisation as admin. */
  async memberships(user: Pick<User, 'id' | 'organisationId' | 'isAdmin'>): Promise<Membership[]> {
    const db = this.database.db;
    const own = await db
      .select({ assetId: assets.id, assetName: assets.name, role: assetMembers.role })
      .from(assetMembers)
      .innerJoin(assets, eq(assets.id, assetMembers.assetId))
      .where(eq(assetMembers.userId, user.id))
      .orderBy(assets.name);
    if (!user.isAdmin) return own;
    const all = await db.select({ assetId: assets.id, assetName: assets.name }).from(assets).where(eq(assets.organisationId, user.organisationId)).orderBy(assets.name);
    const byId = new Map(own.map((m) => [m.assetId, m]));
    return all.map((a) => byId.get(a.assetId) ?? { ...a, role: 'admin' as const });
  }
}
