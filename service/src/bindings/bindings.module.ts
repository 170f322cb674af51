import { Module } from '@nestjs/common';
import { WellsModule } from '../wells/wells.module.js';
import { BindingsController } from './bindings.controller.js';
import { BindingsRepository } from './bindings.repository.js';
import { BindingsService } from './bindings.service.js';

@Module({
  imports: [WellsModule],
  controllers: [BindingsController],
  providers: [BindingsService, BindingsRepository],
  exports: [BindingsService],
})
export class BindingsModule {}
