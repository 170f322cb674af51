import { Controller, Get, Param, Query, StreamableFile } from '@nestjs/common';
import { ApiBearerAuth, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators.js';
import { toStreamable } from '../exports/export-file.js';
import { ZoneTableExportQueryDto, ZoneTableQueryDto, ZoneTableRowDto } from './dto/zone-table.dto.js';
import { ZoneTablesService } from './zone-tables.service.js';

@ApiTags('zone tables')
@ApiBearerAuth()
@Controller('assets/:assetId/zone-table')
export class ZoneTablesController {
  constructor(private readonly zoneTables: ZoneTablesService) {}

  @Get()
  table(@Param('assetId') assetId: string, @Query() query: ZoneTableQueryDto): Promise<ZoneTableRowDto[]> {
    return this.zoneTables.table(assetId, query);
  }

  @Get('export')
  @ApiProduces('text/csv', 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet')
  async export(@Param('assetId') assetId: string, @Query() query: ZoneTableExportQueryDto, @CurrentUser() user: AuthUser): Promise<StreamableFile> {
    return toStreamable(await this.zoneTables.export(assetId, query, user));
  }
}
