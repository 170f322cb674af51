import { Body, Controller, Get, Param, Patch, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AssetAccess, AuthUser } from '../auth/auth-user.js';
import { CurrentAccess, CurrentUser, Roles } from '../auth/decorators.js';
import { AssetsService } from './assets.service.js';
import { CreateAssetDto, UpdateAssetDto } from './dto/asset-input.dto.js';
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

  /** Global admin only (no :assetId here, so @Roles('admin') means the global flag). */
  @Roles('admin')
  @Post()
  create(@Body() body: CreateAssetDto, @CurrentUser() user: AuthUser): Promise<AssetDto> {
    return this.assets.create(body, user);
  }

  @Roles('admin')
  @Patch(':assetId')
  update(@Param('assetId') assetId: string, @Body() body: UpdateAssetDto, @CurrentUser() user: AuthUser, @CurrentAccess() access: AssetAccess): Promise<AssetDto> {
    return this.assets.update(assetId, body, user, access.role);
  }
}
