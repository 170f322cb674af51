import { Controller, Get, Param, Query, StreamableFile } from '@nestjs/common';
import { ApiBearerAuth, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators.js';
import { InterpretationExportQueryDto } from './dto/export-query.dto.js';
import { toStreamable } from './export-file.js';
import { ExportsService } from './exports.service.js';

@ApiTags('exports')
@ApiBearerAuth()
@Controller('assets/:assetId/wells/:wellId/interpretations/:id/export')
export class ExportsController {
  constructor(private readonly exports: ExportsService) {}

  @Get()
  @ApiProduces('text/csv', 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet', 'text/plain')
  async interpretation(@Param('assetId') assetId: string, @Param('wellId') wellId: string, @Param('id') id: string, @Query() query: InterpretationExportQueryDto, @CurrentUser() user: AuthUser): Promise<StreamableFile> {
    return toStreamable(await this.exports.interpretation(assetId, wellId, id, query.format ?? 'csv', user));
  }
}
