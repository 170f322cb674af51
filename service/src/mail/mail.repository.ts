import { Injectable } from '@nestjs/common';
import { assetMembers, assets, mailMessages, users, type MailMessage, type NewMailMessage } from '@poreline/schema';
import { and, desc, eq, inArray } from 'drizzle-orm';
import { DatabaseService } from '../database/database.module.js';

/** All Drizzle access to the e-mail notices. */
@Injectable()
export class MailRepository {
  constructor(private readonly database: DatabaseService) {}

  /** Stores the notices (status pending) in one statement: all or none. */
  insert(rows: NewMailMessage[]): Promise<MailMessage[]> {
    if (rows.length === 0) return Promise.resolve([]);
    return this.database.db.insert(mailMessages).values(rows).returning();
  }

  async markSent(id: string): Promise<void> {
    await this.database.db.update(mailMessages).set({ status: 'sent', sentAt: new Date(), error: null }).where(eq(mailMessages.id, id));
  }

  async markFailed(id: string, error: string): Promise<void> {
    await this.database.db.update(mailMessages).set({ status: 'failed', error }).where(eq(mailMessages.id, id));
  }

  /** Keeps the raw message the catcher received; false when no notice has that Message-ID. */
  async keepCaught(messageId: string, raw: string): Promise<boolean> {
    const rows = await this.database.db.update(mailMessages).set({ caught: raw }).where(eq(mailMessages.messageId, messageId)).returning({ id: mailMessages.id });
    return rows.length > 0;
  }

  /** Newest first: the notices to users of one organisation. */
  listForOrganisation(organisationId: string, limit: number) {
    return this.database.db
      .select({ message: mailMessages, assetName: assets.name })
      .from(mailMessages)
      .innerJoin(users, eq(users.id, mailMessages.toUserId))
      .leftJoin(assets, eq(assets.id, mailMessages.assetId))
      .where(eq(users.organisationId, organisationId))
      .orderBy(desc(mailMessages.createdAt), desc(mailMessages.id))
      .limit(limit);
  }

  async findForOrganisation(organisationId: string, id: string) {
    const [row] = await this.database.db
      .select({ message: mailMessages, assetName: assets.name })
      .from(mailMessages)
      .innerJoin(users, eq(users.id, mailMessages.toUserId))
      .leftJoin(assets, eq(assets.id, mailMessages.assetId))
      .where(and(eq(users.organisationId, organisationId), eq(mailMessages.id, id)));
    return row;
  }

  /** Members of the asset holding one of the roles, with their addresses. */
  membersWithRole(assetId: string, roles: ('reviewer' | 'admin')[]) {
    return this.database.db
      .select({ id: users.id, name: users.name, email: users.email })
      .from(assetMembers)
      .innerJoin(users, eq(users.id, assetMembers.userId))
      .where(and(eq(assetMembers.assetId, assetId), inArray(assetMembers.role, roles)));
  }

  users(ids: string[]) {
    if (ids.length === 0) return Promise.resolve([]);
    return this.database.db.select({ id: users.id, name: users.name, email: users.email }).from(users).where(inArray(users.id, ids));
  }

  async assetName(assetId: string): Promise<string | undefined> {
    const [row] = await this.database.db.select({ name: assets.name }).from(assets).where(eq(assets.id, assetId));
    return row?.name;
  }
}
