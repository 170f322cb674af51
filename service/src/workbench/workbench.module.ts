import { Module } from '@nestjs/common';
import { BindingsModule } from '../bindings/bindings.module.js';
import { FormationsModule } from '../formations/formations.module.js';
import { InterpretationsRepository } from '../interpretations/interpretations.repository.js';
import { SurveysModule } from '../surveys/surveys.module.js';
import { TopsModule } from '../tops/tops.module.js';
import { WellsModule } from '../wells/wells.module.js';
import { ZoneParametersModule } from '../zone-parameters/zone-parameters.module.js';
import { MergedSamplesRepository } from './merged-samples.repository.js';
import { MergedSamplesService } from './merged-samples.service.js';
import { WorkbenchController } from './workbench.controller.js';
import { WorkbenchService } from './workbench.service.js';

@Module({
  imports: [WellsModule, FormationsModule, TopsModule, ZoneParametersModule, BindingsModule, SurveysModule],
  controllers: [WorkbenchController],
  // InterpretationsRepository is stateless; the workbench reads the latest version through it.
  providers: [WorkbenchService, MergedSamplesService, MergedSamplesRepository, InterpretationsRepository],
  exports: [WorkbenchService, MergedSamplesService],
})
export class WorkbenchModule {}
