import { Controller, Get, Param, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { Roles } from '../auth/decorators.js';
import { AuditLogService } from './audit-log.service.js';
import { AuditEntryDto, AuditQueryDto } from './dto/audit.dto.js';

@ApiTags('audit')
@ApiBearerAuth()
@Controller('assets/:assetId/audit')
export class AuditController {
  constructor(private readonly auditLog: AuditLogService) {}

  @Roles('admin', 'reviewer')
  @Get()
  list(@Param('assetId') assetId: string, @Query() query: AuditQueryDto): Promise<AuditEntryDto[]> {
    return this.auditLog.list(assetId, query);
  }
}
