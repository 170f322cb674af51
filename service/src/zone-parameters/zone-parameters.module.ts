import { Module } from '@nestjs/common';
import { FormationsModule } from '../formations/formations.module.js';
import { WellsModule } from '../wells/wells.module.js';
import { ZoneParametersController } from './zone-parameters.controller.js';
import { ZoneParametersRepository } from './zone-parameters.repository.js';
import { ZoneParametersService } from './zone-parameters.service.js';

@Module({
  imports: [WellsModule, FormationsModule],
  controllers: [ZoneParametersController],
  providers: [ZoneParametersService, ZoneParametersRepository],
  exports: [ZoneParametersService],
})
export class ZoneParametersModule {}
