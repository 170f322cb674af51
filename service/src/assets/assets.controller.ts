import { Controller, Get, Param } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AssetAccess, AuthUser } from '../auth/auth-user.js';
import { CurrentAccess, CurrentUser } from '../auth/decorators.js';
import { AssetsService } from './assets.service.js';
import { AssetDto } from './dto/asset.dto.js';

@ApiTags('assets')
@ApiBearerAuth()
@Controller('assets')
export class AssetsController {
  constructor(private readonly assets: AssetsService) {}

  @Get()
  list(@CurrentUser() user: AuthUser): Promise<AssetDto[]> {
    return this.assets.list(user);
  }

  @Get(':assetId')
  get(@Param('assetId') assetId: string, @CurrentAccess() access: AssetAccess): Promise<AssetDto> {
    return this.assets.get(assetId, access.role);
  }
}
