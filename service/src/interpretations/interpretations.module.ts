import { Module } from '@nestjs/common';
import { WellsModule } from '../wells/wells.module.js';
import { WorkbenchModule } from '../workbench/workbench.module.js';
import { EvaluationService } from './evaluation.service.js';
import { InterpretationsController } from './interpretations.controller.js';
import { InterpretationsRepository } from './interpretations.repository.js';
import { InterpretationsService } from './interpretations.service.js';

@Module({
  imports: [WellsModule, WorkbenchModule],
  controllers: [InterpretationsController],
  providers: [InterpretationsService, InterpretationsRepository, EvaluationService],
  exports: [InterpretationsService, InterpretationsRepository, EvaluationService],
})
export class InterpretationsModule {}
