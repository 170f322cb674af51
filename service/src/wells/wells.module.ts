import { Module } from '@nestjs/common';
import { WellsController } from './wells.controller.js';
import { WellsRepository } from './wells.repository.js';
import { WellsService } from './wells.service.js';

@Module({
  controllers: [WellsController],
  providers: [WellsService, WellsRepository],
  exports: [WellsService, WellsRepository],
})
export class WellsModule {}
