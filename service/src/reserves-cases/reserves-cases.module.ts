import { Module } from '@nestjs/common';
import { ProductionModule } from '../production/production.module.js';
import { ReservesCasesController } from './reserves-cases.controller.js';
import { ReservesCasesRepository } from './reserves-cases.repository.js';
import { ReservesCasesService } from './reserves-cases.service.js';

@Module({
  imports: [ProductionModule],
  controllers: [ReservesCasesController],
  providers: [ReservesCasesService, ReservesCasesRepository],
})
export class ReservesCasesModule {}
