import { Body, Controller, Get, Param, Put } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser, Roles } from '../auth/decorators.js';
import { PutTopsDto, TopDto, ZoneDto } from './dto/tops.dto.js';
import { TopsService } from './tops.service.js';

@ApiTags('tops and zones')
@ApiBearerAuth()
@Controller('assets/:assetId/wells/:wellId')
export class TopsController {
  constructor(private readonly tops: TopsService) {}

  @Get('tops')
  list(@Param('assetId') assetId: string, @Param('wellId') wellId: string): Promise<TopDto[]> {
    return this.tops.list(assetId, wellId);
  }

  @Roles('petrophysicist', 'admin')
  @Put('tops')
  replace(@Param('assetId') assetId: string, @Param('wellId') wellId: string, @Body() body: PutTopsDto, @CurrentUser() user: AuthUser): Promise<TopDto[]> {
    return this.tops.replace(assetId, wellId, body, user);
  }

  @Get('zones')
  zones(@Param('assetId') assetId: string, @Param('wellId') wellId: string): Promise<ZoneDto[]> {
    return this.tops.zones(assetId, wellId);
  }
}
