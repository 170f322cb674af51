import { Body, Controller, Param, Put } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser, Roles } from '../auth/decorators.js';
import { PutCutoffsDto } from '../formations/dto/formation.dto.js';
import { CutoffsService } from './cutoffs.service.js';
import { CutoffsResultDto } from './dto/cutoffs.dto.js';

@ApiTags('formations')
@ApiBearerAuth()
@Controller('assets/:assetId/formations/:formationId/cutoffs')
export class CutoffsController {
  constructor(private readonly cutoffs: CutoffsService) {}

  @Roles('petrophysicist', 'admin')
  @Put()
  put(@Param('assetId') assetId: string, @Param('formationId') formationId: string, @Body() body: PutCutoffsDto, @CurrentUser() user: AuthUser): Promise<CutoffsResultDto> {
    return this.cutoffs.put(assetId, formationId, body, user);
  }
}
