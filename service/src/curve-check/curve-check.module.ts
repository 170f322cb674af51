import { Module } from '@nestjs/common';
import { WellsModule } from '../wells/wells.module.js';
import { CurveCheckController } from './curve-check.controller.js';
import { CurveCheckRepository } from './curve-check.repository.js';
import { CurveCheckService } from './curve-check.service.js';

@Module({
  imports: [WellsModule],
  controllers: [CurveCheckController],
  providers: [CurveCheckService, CurveCheckRepository],
})
export class CurveCheckModule {}
