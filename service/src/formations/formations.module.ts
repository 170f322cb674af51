import { Module } from '@nestjs/common';
import { FormationsController } from './formations.controller.js';
import { FormationsRepository } from './formations.repository.js';
import { FormationsService } from './formations.service.js';

@Module({
  controllers: [FormationsController],
  providers: [FormationsService, FormationsRepository],
  exports: [FormationsService, FormationsRepository],
})
export class FormationsModule {}
