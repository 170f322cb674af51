import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional, IsString, Matches, MaxLength, MinLength } from 'class-validator';

/** POST /api/assets: a new field or project of the caller's organisation. */
export class CreateAssetDto {
  @ApiProperty({ example: 'North Tern Field' })
  @IsString({ message: 'name must be a string' })
  @MinLength(1, { message: 'name must not be empty' })
  @MaxLength(120, { message: 'name must be at most 120 characters' })
  @Matches(/\S/, { message: 'name must not be blank' })
  name: string;

  @ApiPropertyOptional({ example: 'Gas field, two appraisal wells' })
  @IsOptional()
  @IsString({ message: 'description must be a string' })
  @MaxLength(2000, { message: 'description must be at most 2000 characters' })
  description?: string;
}

/** PATCH /api/assets/:assetId: only the fields sent change. */
export class UpdateAssetDto {
  @ApiPropertyOptional()
  @IsOptional()
  @IsString({ message: 'name must be a string' })
  @MinLength(1, { message: 'name must not be empty' })
  @MaxLength(120, { message: 'name must be at most 120 characters' })
  @Matches(/\S/, { message: 'name must not be blank' })
  name?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @IsString({ message: 'description must be a string' })
  @MaxLength(2000, { message: 'description must be at most 2000 characters' })
  description?: string;
}
