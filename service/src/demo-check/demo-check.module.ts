import { Module } from '@nestjs/common';
import { BindingsModule } from '../bindings/bindings.module.js';
import { FormationsModule } from '../formations/formations.module.js';
import { InterpretationsModule } from '../interpretations/interpretations.module.js';
import { SurveysModule } from '../surveys/surveys.module.js';
import { WellsModule } from '../wells/wells.module.js';
import { WorkbenchModule } from '../workbench/workbench.module.js';
import { DemoCheckController } from './demo-check.controller.js';
import { DemoCheckRepository } from './demo-check.repository.js';
import { DemoCheckService } from './demo-check.service.js';

/** "Model vs evaluated" on the demo asset: the engine checked against the earth model of the demo field. */
@Module({
  imports: [WellsModule, FormationsModule, BindingsModule, SurveysModule, WorkbenchModule, InterpretationsModule],
  controllers: [DemoCheckController],
  providers: [DemoCheckService, DemoCheckRepository],
})
export class DemoCheckModule {}
