import { Body, Controller, Get, Param, Patch, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser, Roles } from '../auth/decorators.js';
import { CreateWellDto, UpdateWellDto, WellDetailDto, WellRowDto } from './dto/well.dto.js';
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

  @Roles('petrophysicist', 'admin')
  @Patch(':wellId')
  update(@Param('assetId') assetId: string, @Param('wellId') wellId: string, @Body() body: UpdateWellDto, @CurrentUser() user: AuthUser): Promise<WellRowDto> {
    return this.wells.update(assetId, wellId, body, user);
  }

  @Get(':wellId')
  get(@Param('assetId') assetId: string, @Param('wellId') wellId: string): Promise<WellDetailDto> {
    return this.wells.get(assetId, wellId);
  }
}
