import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsNumber, IsOptional, IsString, Matches, MaxLength, MinLength } from 'class-validator';
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

export class WellRowDto {
  @ApiProperty() id: string;
  @ApiProperty() name: string;
  @ApiProperty() uwi: string;
  @ApiProperty({ nullable: true }) kbElevation: number | null;
  @ApiProperty({ nullable: true }) groundElevation: number | null;
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
