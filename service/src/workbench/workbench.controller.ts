import { Controller, Get, Param, StreamableFile } from '@nestjs/common';
import { ApiBearerAuth, ApiProduces, ApiTags } from '@nestjs/swagger';
import { WorkbenchDto } from './dto/workbench.dto.js';
import { WorkbenchService } from './workbench.service.js';

@ApiTags('workbench')
@ApiBearerAuth()
@Controller('assets/:assetId/wells/:wellId')
export class WorkbenchController {
  constructor(private readonly workbench: WorkbenchService) {}

  @Get('workbench')
  get(@Param('assetId') assetId: string, @Param('wellId') wellId: string): Promise<WorkbenchDto> {
    return this.workbench.workbench(assetId, wellId);
  }

  @Get('merged-samples')
  @ApiProduces('application/octet-stream')
  async mergedSamples(@Param('assetId') assetId: string, @Param('wellId') wellId: string): Promise<StreamableFile> {
    const bytes = await this.workbench.mergedBundle(assetId, wellId);
    return new StreamableFile(bytes, { type: 'application/octet-stream', length: bytes.length });
  }
}
