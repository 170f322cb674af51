import { Body, Controller, Get, Param, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser, Roles } from '../auth/decorators.js';
import { CreateWellDto, WellDetailDto, WellRowDto } from './dto/well.dto.js';
import { WellsService } from './wells.service.js';

@ApiTags('wells')
@ApiBearerAuth()
@Controller('assets/:assetId/wells')
export class WellsController {
  constructor(private readonly wells: WellsService) {}

  @Get()
  list(@Param('assetId') assetId: string): Promise<WellRowDto[]> {
    return this.wells.list(assetId);
  }

  @Roles('petrophysicist', 'admin')
  @Post()
  create(@Param('assetId') assetId: string, @Body() body: CreateWellDto, @CurrentUser() user: AuthUser): Promise<WellRowDto> {
    return this.wells.create(assetId, body, user);
  }

  @Get(':wellId')
  get(@Param('assetId') assetId: string, @Param('wellId') wellId: string): Promise<WellDetailDto> {
    return this.wells.get(assetId, wellId);
  }
}
