import { Module } from '@nestjs/common';
import { FormationsModule } from '../formations/formations.module.js';
import { InterpretationsModule } from '../interpretations/interpretations.module.js';
import { ZoneTablesController } from './zone-tables.controller.js';
import { ZoneTablesService } from './zone-tables.service.js';

@Module({
  imports: [FormationsModule, InterpretationsModule],
  controllers: [ZoneTablesController],
  providers: [ZoneTablesService],
})
export class ZoneTablesModule {}
