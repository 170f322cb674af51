import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsInt, IsOptional, IsString, Matches, Max, Min } from 'class-validator';

export class AuditQueryDto {
  @ApiPropertyOptional({ description: 'Only entries of this entity (formation, formation_cutoffs, well_tops, zone_parameters, curve_bindings, well_survey, interpretation, well, log_run)' })
  @IsOptional()
  @IsString({ message: 'entity must be a string' })
  @Matches(/^[a-z][a-z_-]{0,39}$/, { message: 'entity must be a lower-case name like well_tops or reserves-case' })
  entity?: string;

  @ApiPropertyOptional({ default: 100, minimum: 1, maximum: 1000 })
  @IsOptional()
  @Type(() => Number)
  @IsInt({ message: 'limit must be a whole number' })
  @Min(1, { message: 'limit must be between 1 and 1000' })
  @Max(1000, { message: 'limit must be between 1 and 1000' })
  limit?: number;
}

export class AuditUserDto {
  @ApiProperty() id: string;
  @ApiProperty() name: string;
  @ApiProperty() email: string;
}

export class AuditEntryDto {
  @ApiProperty() id: number;
  @ApiProperty() at: string;
  @ApiProperty({ type: AuditUserDto, nullable: true }) user: AuditUserDto | null;
  @ApiProperty() action: string;
  @ApiProperty() entity: string;
  @ApiProperty({ nullable: true }) entityId: string | null;
  @ApiProperty({ nullable: true, type: 'object', additionalProperties: true }) before: unknown;
  @ApiProperty({ nullable: true, type: 'object', additionalProperties: true }) after: unknown;
}
