import { Body, Controller, Get, Param, Patch, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser, Roles } from '../auth/decorators.js';
import { CreateFormationDto, FormationDto, UpdateFormationDto } from './dto/formation.dto.js';
import { FormationsService } from './formations.service.js';

@ApiTags('formations')
@ApiBearerAuth()
@Controller('assets/:assetId/formations')
export class FormationsController {
  constructor(private readonly formations: FormationsService) {}

  @Get()
  list(@Param('assetId') assetId: string): Promise<FormationDto[]> {
    return this.formations.list(assetId);
  }

  @Roles('petrophysicist', 'admin')
  @Post()
  create(@Param('assetId') assetId: string, @Body() body: CreateFormationDto, @CurrentUser() user: AuthUser): Promise<FormationDto> {
    return this.formations.create(assetId, body, user);
  }

  @Roles('petrophysicist', 'admin')
  @Patch(':formationId')
  update(@Param('assetId') assetId: string, @Param('formationId') formationId: string, @Body() body: UpdateFormationDto, @CurrentUser() user: AuthUser): Promise<FormationDto> {
    return this.formations.update(assetId, formationId, body, user);
  }
}
