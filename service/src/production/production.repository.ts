import { Injectable } from '@nestjs/common';
import { productionSeries, reservesCases, type Database, type NewProductionSeries, type ProductionSeries, type ReservesCase } from '@poreline/schema';
import { and, asc, eq, inArray } from 'drizzle-orm';
import { DatabaseService } from '../database/database.module.js';

export type Tx = Pick<Database, 'insert' | 'update' | 'select' | 'delete'>;

/** All Drizzle access for production series (and the case lookup the cross-checks need). */
@Injectable()
export class ProductionRepository {
  constructor(private readonly database: DatabaseService) {}

  transaction<T>(work: (tx: Tx) => Promise<T>): Promise<T> {
    return this.database.db.transaction((tx) => work(tx));
  }

  listByWell(wellId: string): Promise<ProductionSeries[]> {
    return this.database.db.select().from(productionSeries).where(eq(productionSeries.wellId, wellId)).orderBy(asc(productionSeries.createdAt));
  }

  listByWells(wellIds: string[]): Promise<ProductionSeries[]> {
    if (!wellIds.length) return Promise.resolve([]);
    return this.database.db.select().from(productionSeries).where(inArray(productionSeries.wellId, wellIds)).orderBy(asc(productionSeries.createdAt));
  }

  async find(wellId: string, seriesId: string): Promise<ProductionSeries | undefined> {
    const [row] = await this.database.db
      .select()
      .from(productionSeries)
      .where(and(eq(productionSeries.wellId, wellId), eq(productionSeries.id, seriesId)));
    return row;
  }

  async insert(values: NewProductionSeries, tx: Tx): Promise<ProductionSeries> {
    const [row] = await tx.insert(productionSeries).values(values).returning();
    return row;
  }

  async remove(seriesId: string, tx: Tx): Promise<void> {
    await tx.delete(productionSeries).where(eq(productionSeries.id, seriesId));
  }

  async caseInAsset(assetId: string, caseId: string): Promise<ReservesCase | undefined> {
    const [row] = await this.database.db
      .select()
      .from(reservesCases)
      .where(and(eq(reservesCases.assetId, assetId), eq(reservesCases.id, caseId)));
    return row;
  }
}
