import { Inject, Injectable, Logger } from '@nestjs/common';
import { assetMembers, assets, organisations, users } from '@poreline/schema';
import bcrypt from 'bcryptjs';
import { eq } from 'drizzle-orm';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import { DatabaseService } from '../database/database.module.js';
import { DemoFieldSeeder, type DemoFieldReport } from './demo-field.seeder.js';
import { DEMO_ASSET, DEMO_ORGANISATION, DEMO_USERS } from './demo-users.js';

/**
 * Loads the demo organisation, users (one per role) and asset, once; then, unless the config
 * asks for the users only (demoData 'users'), the Wrenmoor demo field (see DemoFieldSeeder).
 */
@Injectable()
export class DemoSeedService {
  private readonly logger = new Logger(DemoSeedService.name);

  constructor(
    private readonly database: DatabaseService,
    private readonly field: DemoFieldSeeder,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  /** Idempotent: creates the users and asset only when the demo asset is missing, and the field only until it is complete. */
  async seed(): Promise<{ assetId: string; created: boolean; field: DemoFieldReport | null }> {
    const { assetId, created } = await this.seedUsers();
    const field = (this.config.demoData ?? 'full') === 'full' ? await this.field.load(assetId) : null;
    return { assetId, created, field };
  }

  private async seedUsers(): Promise<{ assetId: string; created: boolean }> {
    const db = this.database.db;
    const [existing] = await db.select({ id: assets.id }).from(assets).where(eq(assets.isDemo, true));
    if (existing) return { assetId: existing.id, created: false };
    const hashes = await Promise.all(DEMO_USERS.map((u) => bcrypt.hash(u.password, 10)));
    const assetId = await db.transaction(async (tx) => {
      const [org] = await tx.insert(organisations).values({ name: DEMO_ORGANISATION }).returning();
      const [asset] = await tx.insert(assets).values({ organisationId: org.id, ...DEMO_ASSET, isDemo: true }).returning();
      for (const [i, u] of DEMO_USERS.entries()) {
        const [user] = await tx
          .insert(users)
          .values({ organisationId: org.id, email: u.email, name: u.name, passwordHash: hashes[i], isAdmin: u.isAdmin })
          .returning();
        await tx.insert(assetMembers).values({ assetId: asset.id, userId: user.id, role: u.role });
      }
      return asset.id;
    });
    this.logger.log(`Demo asset "${DEMO_ASSET.name}" and ${DEMO_USERS.length} demo users created.`);
    return { assetId, created: true };
  }
}
