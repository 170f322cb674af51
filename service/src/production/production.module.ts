import { Module } from '@nestjs/common';
import { MulterModule } from '@nestjs/platform-express';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import { CaseCrossChecks } from '../reserves-cases/case-cross-checks.js';
import { WellsModule } from '../wells/wells.module.js';
import { ProductionController } from './production.controller.js';
import { ProductionRepository } from './production.repository.js';
import { ProductionService } from './production.service.js';

@Module({
  imports: [
    WellsModule,
    MulterModule.registerAsync({
      inject: [APP_CONFIG],
      // CSV files stay in memory: parsed and stored in one go, or refused whole.
      useFactory: (config: AppConfig) => ({ limits: { fileSize: config.uploadMaxBytes, files: 1 } }),
    }),
  ],
  controllers: [ProductionController],
  providers: [ProductionService, ProductionRepository, { provide: CaseCrossChecks, useExisting: ProductionService }],
  exports: [CaseCrossChecks],
})
export class ProductionModule {}
