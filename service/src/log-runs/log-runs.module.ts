import { Module } from '@nestjs/common';
import { MulterModule } from '@nestjs/platform-express';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import { WellsModule } from '../wells/wells.module.js';
import { LogRunsController } from './log-runs.controller.js';
import { LogRunsRepository } from './log-runs.repository.js';
import { LogRunsService } from './log-runs.service.js';

@Module({
  imports: [
    WellsModule,
    MulterModule.registerAsync({
      inject: [APP_CONFIG],
      // Files stay in memory: they are hashed, parsed and stored in one go.
      useFactory: (config: AppConfig) => ({ limits: { fileSize: config.uploadMaxBytes, files: 100 } }),
    }),
  ],
  controllers: [LogRunsController],
  providers: [LogRunsService, LogRunsRepository],
})
export class LogRunsModule {}
