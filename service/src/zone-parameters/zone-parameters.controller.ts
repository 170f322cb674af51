import { Body, Controller, Get, Param, Put } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser, Roles } from '../auth/decorators.js';
import { PutZoneParametersDto, ZoneParametersDto } from './dto/zone-parameters.dto.js';
import { ZoneParametersService } from './zone-parameters.service.js';

@ApiTags('zone parameters')
@ApiBearerAuth()
@Controller('assets/:assetId/wells/:wellId/zones/:formationId/parameters')
export class ZoneParametersController {
  constructor(private readonly zoneParameters: ZoneParametersService) {}

  @Get()
  get(@Param('assetId') assetId: string, @Param('wellId') wellId: string, @Param('formationId') formationId: string): Promise<ZoneParametersDto> {
    return this.zoneParameters.get(assetId, wellId, formationId);
  }

  @Roles('petrophysicist', 'admin')
  @Put()
  put(@Param('assetId') assetId: string, @Param('wellId') wellId: string, @Param('formationId') formationId: string, @Body() body: PutZoneParametersDto, @CurrentUser() user: AuthUser): Promise<ZoneParametersDto> {
    return this.zoneParameters.put(assetId, wellId, formationId, body, user);
  }
}
