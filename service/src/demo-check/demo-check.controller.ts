import { Controller, Get, Param } from '@nestjs/common';
import { ApiBearerAuth, ApiNotFoundResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { DemoCheckService } from './demo-check.service.js';
import { DemoCheckDto } from './dto/demo-check.dto.js';

@ApiTags('demo check')
@ApiBearerAuth()
@Controller('assets/:assetId/demo-check')
export class DemoCheckController {
  constructor(private readonly check: DemoCheckService) {}

  @Get()
  @ApiOkResponse({ type: DemoCheckDto, description: 'Model vs evaluated: the demo field evaluated with the model parameters, compared with the model it was generated from' })
  @ApiNotFoundResponse({ description: 'The asset is not the demo asset (or the caller is not a member)' })
  get(@Param('assetId') assetId: string): Promise<DemoCheckDto> {
    return this.check.check(assetId);
  }
}
