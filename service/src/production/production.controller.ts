import { Body, Controller, Delete, Get, HttpCode, Param, Post, Query, UploadedFile, UseInterceptors } from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { ApiBearerAuth, ApiBody, ApiConsumes, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser, Roles } from '../auth/decorators.js';
import {
  CreateSeriesDto,
  DeclineFitQueryDto,
  GasInflowDto,
  InflowDto,
  PzFitQueryDto,
  UploadSeriesDto,
  type DeclineFitDto,
  type GasInflowResultDto,
  type InflowResultDto,
  type PzFitDto,
  type SeriesDto,
} from './dto/production.dto.js';
import { ProductionService, type UploadedCsv } from './production.service.js';

@ApiTags('production and cross-checks')
@ApiBearerAuth()
@Controller('assets/:assetId')
export class ProductionController {
  constructor(private readonly production: ProductionService) {}

  @Get('wells/:wellId/production')
  list(@Param('assetId') assetId: string, @Param('wellId') wellId: string): Promise<SeriesDto[]> {
    return this.production.list(assetId, wellId);
  }

  @Roles('engineer', 'admin')
  @Post('wells/:wellId/production')
  create(@Param('assetId') assetId: string, @Param('wellId') wellId: string, @Body() body: CreateSeriesDto, @CurrentUser() user: AuthUser): Promise<SeriesDto> {
    return this.production.create(assetId, wellId, body, user);
  }

  @Roles('engineer', 'admin')
  @Post('wells/:wellId/production/upload')
  @ApiConsumes('multipart/form-data')
  @ApiBody({ schema: { type: 'object', properties: { file: { type: 'string', format: 'binary' }, kind: { type: 'string' }, fluid: { type: 'string' } } } })
  @UseInterceptors(FileInterceptor('file'))
  upload(@Param('assetId') assetId: string, @Param('wellId') wellId: string, @UploadedFile() file: UploadedCsv | undefined, @Body() body: UploadSeriesDto, @CurrentUser() user: AuthUser): Promise<SeriesDto> {
    return this.production.upload(assetId, wellId, file, body, user);
  }

  @Roles('engineer', 'admin')
  @Delete('wells/:wellId/production/:seriesId')
  @HttpCode(204)
  remove(@Param('assetId') assetId: string, @Param('wellId') wellId: string, @Param('seriesId') seriesId: string, @CurrentUser() user: AuthUser): Promise<void> {
    return this.production.remove(assetId, wellId, seriesId, user);
  }

  @Get('wells/:wellId/production/:seriesId/pz-fit')
  pzFit(@Param('assetId') assetId: string, @Param('wellId') wellId: string, @Param('seriesId') seriesId: string, @Query() query: PzFitQueryDto): Promise<PzFitDto> {
    return this.production.pzFit(assetId, wellId, seriesId, query);
  }

  @Get('wells/:wellId/production/:seriesId/decline-fit')
  declineFit(@Param('assetId') assetId: string, @Param('wellId') wellId: string, @Param('seriesId') seriesId: string, @Query() query: DeclineFitQueryDto): Promise<DeclineFitDto> {
    return this.production.declineFit(assetId, wellId, seriesId, query);
  }

  @Post('inflow')
  @HttpCode(200)
  inflow(@Body() body: InflowDto): InflowResultDto {
    return this.production.inflow(body);
  }

  @Post('inflow/gas')
  @HttpCode(200)
  gasInflow(@Body() body: GasInflowDto): GasInflowResultDto {
    return this.production.gasInflow(body);
  }
}
