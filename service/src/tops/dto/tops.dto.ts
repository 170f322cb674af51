import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { ArrayMaxSize, IsArray, IsIn, IsNumber, IsOptional, IsString, ValidateNested } from 'class-validator';

export const TOP_SOURCES = ['table', 'depth-view', 'import'] as const;
export type TopSource = (typeof TOP_SOURCES)[number];

export class TopInputDto {
  @ApiProperty()
  @IsString({ message: 'formationId must be a string' })
  formationId: string;

  @ApiProperty({ description: "Measured depth of the top, in the well's log depth unit" })
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'md must be a finite number' })
  md: number;

  @ApiPropertyOptional({ enum: TOP_SOURCES, default: 'table' })
  @IsOptional()
  @IsIn(TOP_SOURCES, { message: `source must be one of: ${TOP_SOURCES.join(', ')}` })
  source?: TopSource;
}

export class PutTopsDto {
  @ApiProperty({ type: [TopInputDto] })
  @IsArray({ message: 'tops must be an array' })
  @ArrayMaxSize(500, { message: 'tops must have at most 500 entries' })
  @ValidateNested({ each: true })
  @Type(() => TopInputDto)
  tops: TopInputDto[];
}

export class TopDto {
  @ApiProperty() formationId: string;
  @ApiProperty() formationName: string;
  @ApiProperty() colour: string;
  @ApiProperty() md: number;
  @ApiProperty({ enum: TOP_SOURCES }) source: string;
}

export class ZoneDto {
  @ApiProperty() formationId: string;
  @ApiProperty() name: string;
  @ApiProperty() colour: string;
  @ApiProperty() top: number;
  @ApiProperty({ nullable: true, description: 'Next top, or the deepest logged depth for the last zone (null when nothing is logged below its top)' }) base: number | null;
}
