import { Controller, Get, Param } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { CurveCheckService } from './curve-check.service.js';
import { CurveCheckDto } from './dto/curve-check.dto.js';

@ApiTags('curve check')
@ApiBearerAuth()
@Controller('assets/:assetId/wells/:wellId/curve-check')
export class CurveCheckController {
  constructor(private readonly curveCheck: CurveCheckService) {}

  @Get()
  check(@Param('assetId') assetId: string, @Param('wellId') wellId: string): Promise<CurveCheckDto[]> {
    return this.curveCheck.check(assetId, wellId);
  }
}
