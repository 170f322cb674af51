import { Module } from '@nestjs/common';
import { FormationsModule } from '../formations/formations.module.js';
import { WellsModule } from '../wells/wells.module.js';
import { TopsController } from './tops.controller.js';
import { TopsRepository } from './tops.repository.js';
import { TopsService } from './tops.service.js';

@Module({
  imports: [WellsModule, FormationsModule],
  controllers: [TopsController],
  providers: [TopsService, TopsRepository],
  exports: [TopsService, TopsRepository],
})
export class TopsModule {}
