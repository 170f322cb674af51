import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsBoolean, IsIn, IsOptional, IsString } from 'class-validator';
import { TABLE_FORMATS } from '../../exports/dto/export-query.dto.js';

export class ZoneTableQueryDto {
  @ApiPropertyOptional({ description: 'Only this formation (one row per well of the asset with a top of it)' })
  @IsOptional()
  @IsString({ message: 'formationId must be a string' })
  formationId?: string;

  @ApiPropertyOptional({ description: 'Use the newest approved version of each well instead of the newest version', default: false })
  @IsOptional()
  @Transform(({ value }) => (value === 'true' ? true : value === 'false' ? false : value))
  @IsBoolean({ message: 'approvedOnly must be true or false' })
  approvedOnly?: boolean;
}

export class ZoneTableExportQueryDto extends ZoneTableQueryDto {
  @ApiPropertyOptional({ enum: TABLE_FORMATS, default: 'csv' })
  @IsOptional()
  @IsIn(TABLE_FORMATS, { message: `format must be one of: ${TABLE_FORMATS.join(', ')}` })
  format?: (typeof TABLE_FORMATS)[number];
}

export class ZoneTableRowDto {
  @ApiProperty() wellId: string;
  @ApiProperty() wellName: string;
  @ApiProperty({ nullable: true }) interpretationId: string | null;
  @ApiProperty({ nullable: true }) version: number | null;
  @ApiProperty({ nullable: true, enum: ['draft', 'submitted', 'approved', 'returned'] }) status: string | null;
  @ApiProperty({ nullable: true }) formationId: string | null;
  @ApiProperty() formation: string;
  @ApiProperty({ nullable: true }) top: number | null;
  @ApiProperty({ nullable: true }) base: number | null;
  @ApiProperty({ nullable: true, description: 'MD thickness, depth unit' }) gross: number | null;
  @ApiProperty({ nullable: true }) netReservoir: number | null;
  @ApiProperty({ nullable: true }) netPay: number | null;
  @ApiProperty({ nullable: true, description: 'net reservoir / gross' }) ntg: number | null;
  @ApiProperty({ nullable: true, description: 'thickness-weighted PHIE over net pay, v/v' }) phiMean: number | null;
  @ApiProperty({ nullable: true, description: 'pore-volume-weighted Sw over net pay, v/v' }) swMean: number | null;
  @ApiProperty({ nullable: true, description: 'thickness-weighted Vsh over net pay, v/v' }) vshMean: number | null;
  @ApiProperty({ nullable: true, description: 'sum(PHIE h) over net pay, MD, depth unit' }) phiH: number | null;
  @ApiProperty({ nullable: true, description: 'sum(PHIE (1 - Sw) h) over net pay, MD, depth unit' }) hcpt: number | null;
  @ApiProperty({ nullable: true }) grossTvd: number | null;
  @ApiProperty({ nullable: true }) netReservoirTvd: number | null;
  @ApiProperty({ nullable: true }) netPayTvd: number | null;
  @ApiProperty({ nullable: true }) phiHTvd: number | null;
  @ApiProperty({ nullable: true }) hcptTvd: number | null;
  @ApiProperty({ nullable: true }) grossTvt: number | null;
  @ApiProperty({ nullable: true }) netReservoirTvt: number | null;
  @ApiProperty({ nullable: true }) netPayTvt: number | null;
  @ApiProperty({ nullable: true }) phiHTvt: number | null;
  @ApiProperty({ nullable: true }) hcptTvt: number | null;
  @ApiProperty({ nullable: true, enum: ['ft', 'm'] }) depthUnit: string | null;
}
