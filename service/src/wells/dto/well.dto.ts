import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsNumber, IsOptional, IsString, Matches, Max, MaxLength, Min, MinLength, ValidateIf } from 'class-validator';
import { LogRunDetailDto, LogRunDto } from '../../log-runs/dto/log-run.dto.js';

export class CreateWellDto {
  @ApiProperty({ example: 'WM-7' })
  @IsString()
  @MinLength(1, { message: 'name must not be empty' })
  @MaxLength(80, { message: 'name must be at most 80 characters' })
  @Matches(/\S/, { message: 'name must not be blank' })
  name: string;

  @ApiPropertyOptional({ example: '99-001-00007-00', description: 'Unique well identifier (UWI / API number style)' })
  @IsOptional()
  @IsString()
  @MaxLength(40, { message: 'uwi must be at most 40 characters' })
  uwi?: string;

  @ApiPropertyOptional() @IsOptional() @IsNumber({}, { message: 'kbElevation must be a number' }) kbElevation?: number;
  @ApiPropertyOptional() @IsOptional() @IsNumber({}, { message: 'groundElevation must be a number' }) groundElevation?: number;
}

/** Depth datums a well's measured depths can be referred to (kelly bushing, drill floor, rotary table, ground level, mean sea level). */
export const DEPTH_REFERENCES = ['KB', 'DF', 'RT', 'GL', 'MSL'] as const;

/** PATCH body: only the fields sent change; null clears an optional number. */
export class UpdateWellDto {
  @ApiPropertyOptional({ example: 'WM-7' })
  @IsOptional()
  @IsString({ message: 'name must be a string' })
  @MinLength(1, { message: 'name must not be empty' })
  @MaxLength(80, { message: 'name must be at most 80 characters' })
  @Matches(/\S/, { message: 'name must not be blank' })
  name?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @IsString({ message: 'uwi must be a string' })
  @MaxLength(40, { message: 'uwi must be at most 40 characters' })
  uwi?: string;

  @ApiPropertyOptional({ nullable: true, description: 'degrees, WGS 84' })
  @ValidateIf((_, v) => v !== null && v !== undefined)
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'latitude must be a number of degrees' })
  @Min(-90, { message: 'latitude must be between -90 and 90 degrees' })
  @Max(90, { message: 'latitude must be between -90 and 90 degrees' })
  latitude?: number | null;

  @ApiPropertyOptional({ nullable: true, description: 'degrees, WGS 84' })
  @ValidateIf((_, v) => v !== null && v !== undefined)
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'longitude must be a number of degrees' })
  @Min(-180, { message: 'longitude must be between -180 and 180 degrees' })
  @Max(180, { message: 'longitude must be between -180 and 180 degrees' })
  longitude?: number | null;

  @ApiPropertyOptional({ nullable: true, description: "Elevation of the kelly bushing above sea level, in the well's depth unit" })
  @ValidateIf((_, v) => v !== null && v !== undefined)
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'kbElevation must be a number' })
  kbElevation?: number | null;

  @ApiPropertyOptional({ nullable: true })
  @ValidateIf((_, v) => v !== null && v !== undefined)
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'groundElevation must be a number' })
  groundElevation?: number | null;

  @ApiPropertyOptional({ enum: DEPTH_REFERENCES })
  @IsOptional()
  @IsIn(DEPTH_REFERENCES, { message: `depthReference must be one of: ${DEPTH_REFERENCES.join(', ')}` })
  depthReference?: (typeof DEPTH_REFERENCES)[number];
}

export class WellRowDto {
  @ApiProperty() id: string;
  @ApiProperty() name: string;
  @ApiProperty() uwi: string;
  @ApiProperty({ nullable: true }) kbElevation: number | null;
  @ApiProperty({ nullable: true }) groundElevation: number | null;
  @ApiProperty({ nullable: true }) latitude: number | null;
  @ApiProperty({ nullable: true }) longitude: number | null;
  @ApiProperty() depthReference: string;
  @ApiProperty() logRunCount: number;
  @ApiProperty() curveCount: number;
  @ApiProperty({ nullable: true, description: 'Shallowest logged depth over all runs' }) top: number | null;
  @ApiProperty({ nullable: true, description: 'Deepest logged depth over all runs' }) base: number | null;
  @ApiProperty({ nullable: true }) depthUnit: string | null;
  @ApiProperty({ type: [LogRunDto] }) logRuns: LogRunDto[];
}

export class WellDetailDto extends WellRowDto {
  @ApiProperty({ type: [LogRunDetailDto] }) declare logRuns: LogRunDetailDto[];
}
