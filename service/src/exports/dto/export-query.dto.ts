import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional } from 'class-validator';

export const TABLE_FORMATS = ['csv', 'xlsx'] as const;
export const INTERPRETATION_FORMATS = ['csv', 'xlsx', 'las'] as const;

export class InterpretationExportQueryDto {
  @ApiPropertyOptional({ enum: INTERPRETATION_FORMATS, default: 'csv' })
  @IsOptional()
  @IsIn(INTERPRETATION_FORMATS, { message: `format must be one of: ${INTERPRETATION_FORMATS.join(', ')}` })
  format?: (typeof INTERPRETATION_FORMATS)[number];
}
