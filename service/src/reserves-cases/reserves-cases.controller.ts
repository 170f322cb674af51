import { Body, Controller, Get, HttpCode, Param, Patch, Post, Query, StreamableFile } from '@nestjs/common';
import { ApiBearerAuth, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser, Roles } from '../auth/decorators.js';
import {
  ApproveCaseDto,
  CandidatesQueryDto,
  CreateReservesCaseDto,
  ExportQueryDto,
  RefreshSourcesDto,
  ReservesCaseDto,
  ReservesCaseSummaryDto,
  ReturnCaseDto,
  UpdateReservesCaseDto,
  type CandidateDto,
  type CaseAuditEntryDto,
} from './dto/reserves-case.dto.js';
import { ReservesCasesService } from './reserves-cases.service.js';

const XLSX = 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet';

@ApiTags('reserves cases')
@ApiBearerAuth()
@Controller('assets/:assetId/reserves-cases')
export class ReservesCasesController {
  constructor(private readonly cases: ReservesCasesService) {}

  @Get()
  list(@Param('assetId') assetId: string): Promise<ReservesCaseSummaryDto[]> {
    return this.cases.list(assetId);
  }

  @Get('candidates')
  candidates(@Param('assetId') assetId: string, @Query() query: CandidatesQueryDto): Promise<CandidateDto[]> {
    return this.cases.candidates(assetId, query.formationId);
  }

  @Roles('engineer', 'admin')
  @Post()
  create(@Param('assetId') assetId: string, @Body() body: CreateReservesCaseDto, @CurrentUser() user: AuthUser): Promise<ReservesCaseDto> {
    return this.cases.create(assetId, body, user);
  }

  @Get(':caseId')
  get(@Param('assetId') assetId: string, @Param('caseId') caseId: string): Promise<ReservesCaseDto> {
    return this.cases.get(assetId, caseId);
  }

  @Roles('engineer', 'admin')
  @Patch(':caseId')
  update(@Param('assetId') assetId: string, @Param('caseId') caseId: string, @Body() body: UpdateReservesCaseDto, @CurrentUser() user: AuthUser): Promise<ReservesCaseDto> {
    return this.cases.update(assetId, caseId, body, user);
  }

  @Roles('engineer', 'admin')
  @Post(':caseId/run')
  @HttpCode(200)
  run(@Param('assetId') assetId: string, @Param('caseId') caseId: string, @CurrentUser() user: AuthUser): Promise<ReservesCaseDto> {
    return this.cases.run(assetId, caseId, user);
  }

  @Roles('engineer', 'admin')
  @Post(':caseId/refresh-sources')
  @HttpCode(200)
  refresh(@Param('assetId') assetId: string, @Param('caseId') caseId: string, @Body() body: RefreshSourcesDto, @CurrentUser() user: AuthUser): Promise<ReservesCaseDto> {
    return this.cases.refreshSources(assetId, caseId, body, user);
  }

  @Roles('engineer', 'admin')
  @Post(':caseId/copy')
  copy(@Param('assetId') assetId: string, @Param('caseId') caseId: string, @CurrentUser() user: AuthUser): Promise<ReservesCaseDto> {
    return this.cases.copy(assetId, caseId, user);
  }

  @Roles('engineer', 'admin')
  @Post(':caseId/submit')
  @HttpCode(200)
  submit(@Param('assetId') assetId: string, @Param('caseId') caseId: string, @CurrentUser() user: AuthUser): Promise<ReservesCaseDto> {
    return this.cases.submit(assetId, caseId, user);
  }

  @Roles('reviewer', 'admin')
  @Post(':caseId/approve')
  @HttpCode(200)
  approve(@Param('assetId') assetId: string, @Param('caseId') caseId: string, @Body() body: ApproveCaseDto, @CurrentUser() user: AuthUser): Promise<ReservesCaseDto> {
    return this.cases.approve(assetId, caseId, body, user);
  }

  @Roles('reviewer', 'admin')
  @Post(':caseId/return')
  @HttpCode(200)
  returnCase(@Param('assetId') assetId: string, @Param('caseId') caseId: string, @Body() body: ReturnCaseDto, @CurrentUser() user: AuthUser): Promise<ReservesCaseDto> {
    return this.cases.returnCase(assetId, caseId, body, user);
  }

  @Get(':caseId/audit')
  audit(@Param('assetId') assetId: string, @Param('caseId') caseId: string): Promise<CaseAuditEntryDto[]> {
    return this.cases.auditTrail(assetId, caseId);
  }

  @Get(':caseId/export')
  @ApiProduces(XLSX)
  async export(@Param('assetId') assetId: string, @Param('caseId') caseId: string, @Query() _query: ExportQueryDto): Promise<StreamableFile> {
    const file = await this.cases.exportXlsx(assetId, caseId);
    return new StreamableFile(file.bytes, { type: XLSX, disposition: `attachment; filename="${file.fileName}"`, length: file.bytes.length });
  }
}
