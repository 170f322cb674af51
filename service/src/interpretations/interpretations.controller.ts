import { Body, Controller, Get, HttpCode, Param, Post, Put } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser, Roles } from '../auth/decorators.js';
import { ApproveDto, InterpretationDto, ReturnDto } from './dto/interpretation.dto.js';
import { InterpretationsService } from './interpretations.service.js';

@ApiTags('interpretations')
@ApiBearerAuth()
@Controller('assets/:assetId/wells/:wellId/interpretations')
export class InterpretationsController {
  constructor(private readonly interpretations: InterpretationsService) {}

  @Get()
  list(@Param('assetId') assetId: string, @Param('wellId') wellId: string): Promise<InterpretationDto[]> {
    return this.interpretations.list(assetId, wellId);
  }

  @Roles('petrophysicist', 'admin')
  @Post()
  save(@Param('assetId') assetId: string, @Param('wellId') wellId: string, @CurrentUser() user: AuthUser): Promise<InterpretationDto> {
    return this.interpretations.saveInterpretation(assetId, wellId, user);
  }

  @Get(':id')
  get(@Param('assetId') assetId: string, @Param('wellId') wellId: string, @Param('id') id: string): Promise<InterpretationDto> {
    return this.interpretations.get(assetId, wellId, id);
  }

  @Roles('petrophysicist', 'admin')
  @Put(':id')
  saveVersion(@Param('assetId') assetId: string, @Param('wellId') wellId: string, @Param('id') id: string, @CurrentUser() user: AuthUser): Promise<InterpretationDto> {
    return this.interpretations.saveVersion(assetId, wellId, id, user);
  }

  @Roles('petrophysicist', 'admin')
  @Post(':id/submit')
  @HttpCode(200)
  submit(@Param('assetId') assetId: string, @Param('wellId') wellId: string, @Param('id') id: string, @CurrentUser() user: AuthUser): Promise<InterpretationDto> {
    return this.interpretations.submit(assetId, wellId, id, user);
  }

  @Roles('reviewer', 'admin')
  @Post(':id/approve')
  @HttpCode(200)
  approve(@Param('assetId') assetId: string, @Param('wellId') wellId: string, @Param('id') id: string, @Body() body: ApproveDto, @CurrentUser() user: AuthUser): Promise<InterpretationDto> {
    return this.interpretations.approve(assetId, wellId, id, user, body.comment);
  }

  @Roles('reviewer', 'admin')
  @Post(':id/return')
  @HttpCode(200)
  return(@Param('assetId') assetId: string, @Param('wellId') wellId: string, @Param('id') id: string, @Body() body: ReturnDto, @CurrentUser() user: AuthUser): Promise<InterpretationDto> {
    return this.interpretations.return(assetId, wellId, id, user, body.comment);
  }
}
