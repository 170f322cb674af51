import { Module } from '@nestjs/common';
import { InterpretationsModule } from '../interpretations/interpretations.module.js';
import { WellsModule } from '../wells/wells.module.js';
import { ExportsController } from './exports.controller.js';
import { ExportsService } from './exports.service.js';

@Module({
  imports: [WellsModule, InterpretationsModule],
  controllers: [ExportsController],
  providers: [ExportsService],
})
export class ExportsModule {}
