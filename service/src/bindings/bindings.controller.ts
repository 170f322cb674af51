import { Body, Controller, Get, Param, Put } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser, Roles } from '../auth/decorators.js';
import { BindingsService } from './bindings.service.js';
import { BindingDto, PutBindingsDto } from './dto/bindings.dto.js';

@ApiTags('curve bindings')
@ApiBearerAuth()
@Controller('assets/:assetId/wells/:wellId/bindings')
export class BindingsController {
  constructor(private readonly bindings: BindingsService) {}

  @Get()
  list(@Param('assetId') assetId: string, @Param('wellId') wellId: string): Promise<BindingDto[]> {
    return this.bindings.list(assetId, wellId);
  }

  @Roles('petrophysicist', 'admin')
  @Put()
  replace(@Param('assetId') assetId: string, @Param('wellId') wellId: string, @Body() body: PutBindingsDto, @CurrentUser() user: AuthUser): Promise<BindingDto[]> {
    return this.bindings.replace(assetId, wellId, body, user);
  }
}
