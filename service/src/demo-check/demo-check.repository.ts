import { Injectable } from '@nestjs/common';
import { assets } from '@poreline/schema';
import { and, eq } from 'drizzle-orm';
import { DatabaseService } from '../database/database.module.js';

@Injectable()
export class DemoCheckRepository {
  constructor(private readonly database: DatabaseService) {}

  /** True when the asset is the seeded demo asset. */
  async isDemoAsset(assetId: string): Promise<boolean> {
    const [row] = await this.database.db
      .select({ id: assets.id })
      .from(assets)
      .where(and(eq(assets.id, assetId), eq(assets.isDemo, true)))
      .limit(1);
    return !!row;
  }
}
