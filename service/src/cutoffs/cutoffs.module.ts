import { Module } from '@nestjs/common';
import { FormationsModule } from '../formations/formations.module.js';
import { InterpretationsModule } from '../interpretations/interpretations.module.js';
import { CutoffsController } from './cutoffs.controller.js';
import { CutoffsService } from './cutoffs.service.js';

@Module({
  imports: [FormationsModule, InterpretationsModule],
  controllers: [CutoffsController],
  providers: [CutoffsService],
})
export class CutoffsModule {}
