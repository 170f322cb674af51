import { Controller, Get, Param, Post, StreamableFile, UploadedFiles, UseInterceptors } from '@nestjs/common';
import { FilesInterceptor } from '@nestjs/platform-express';
import { ApiBearerAuth, ApiBody, ApiConsumes, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser, Roles } from '../auth/decorators.js';
import { UploadResponseDto } from './dto/log-run.dto.js';
import { LogRunsService, type UploadedFile } from './log-runs.service.js';

@ApiTags('log runs')
@ApiBearerAuth()
@Controller('assets/:assetId/wells/:wellId/log-runs')
export class LogRunsController {
  constructor(private readonly runs: LogRunsService) {}

  @Roles('petrophysicist', 'admin')
  @Post()
  @ApiConsumes('multipart/form-data')
  @ApiBody({ schema: { type: 'object', properties: { files: { type: 'array', items: { type: 'string', format: 'binary' } } } } })
  @UseInterceptors(FilesInterceptor('files', 100))
  upload(
    @Param('assetId') assetId: string,
    @Param('wellId') wellId: string,
    @UploadedFiles() files: UploadedFile[],
    @CurrentUser() user: AuthUser,
  ): Promise<UploadResponseDto> {
    return this.runs.upload(assetId, wellId, files, user);
  }

  @Get(':runId/samples')
  @ApiProduces('application/octet-stream')
  async samples(@Param('assetId') assetId: string, @Param('wellId') wellId: string, @Param('runId') runId: string): Promise<StreamableFile> {
    const bytes = await this.runs.samples(assetId, wellId, runId);
    return new StreamableFile(bytes, { type: 'application/octet-stream', length: bytes.length });
  }
}
