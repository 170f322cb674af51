import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsInt, IsNumber, IsOptional, IsString, Matches, Max, MaxLength, Min, MinLength, ValidateIf } from 'class-validator';
import { LITHOLOGIES, type FormationLithology } from '../lithologies.js';

const HEX = /^#[0-9a-f]{6}$/i;

export class CutoffsDto {
  @ApiProperty({ description: 'Net reservoir needs Vsh <= vshMax (v/v)', example: 0.4 }) vshMax: number;
  @ApiProperty({ description: 'Net reservoir needs porosity >= phiMin (v/v)', example: 0.08 }) phiMin: number;
  @ApiProperty({ description: 'Net pay needs Sw <= swMax (v/v)', example: 0.6 }) swMax: number;
  @ApiProperty({ nullable: true, description: 'Optional: net reservoir needs permeability >= permMin (mD)' }) permMin: number | null;
}

export class FormationDto {
  @ApiProperty() id: string;
  @ApiProperty() name: string;
  @ApiProperty({ description: 'Position in stratigraphic order, 1 = shallowest' }) ordinal: number;
  @ApiProperty({ example: '#c9a227' }) colour: string;
  @ApiProperty({ enum: LITHOLOGIES }) lithology: FormationLithology;
  @ApiProperty({ type: CutoffsDto }) cutoffs: CutoffsDto;
}

export class CreateFormationDto {
  @ApiProperty({ example: 'Upper Wren Sand' })
  @IsString({ message: 'name must be a string' })
  @MinLength(1, { message: 'name must not be empty' })
  @MaxLength(80, { message: 'name must be at most 80 characters' })
  @Matches(/\S/, { message: 'name must not be blank' })
  name: string;

  @ApiPropertyOptional({ example: '#4f9fa8', description: 'Defaults to the next unused colour of the Poreline palette' })
  @IsOptional()
  @Matches(HEX, { message: 'colour must be a hex colour like #4f9fa8' })
  colour?: string;

  @ApiPropertyOptional({ enum: LITHOLOGIES, default: 'sandstone' })
  @IsOptional()
  @IsIn(LITHOLOGIES, { message: `lithology must be one of: ${LITHOLOGIES.join(', ')}` })
  lithology?: FormationLithology;

  @ApiPropertyOptional({ description: 'Position to insert at (1 = shallowest); defaults to the deepest' })
  @IsOptional()
  @IsInt({ message: 'ordinal must be a whole number' })
  @Min(1, { message: 'ordinal must be 1 or more' })
  ordinal?: number;
}

export class UpdateFormationDto {
  @ApiPropertyOptional()
  @IsOptional()
  @IsString({ message: 'name must be a string' })
  @MinLength(1, { message: 'name must not be empty' })
  @MaxLength(80, { message: 'name must be at most 80 characters' })
  @Matches(/\S/, { message: 'name must not be blank' })
  name?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @Matches(HEX, { message: 'colour must be a hex colour like #4f9fa8' })
  colour?: string;

  @ApiPropertyOptional({ enum: LITHOLOGIES })
  @IsOptional()
  @IsIn(LITHOLOGIES, { message: `lithology must be one of: ${LITHOLOGIES.join(', ')}` })
  lithology?: FormationLithology;

  @ApiPropertyOptional({ description: 'Move to this position (1 = shallowest); the others shift' })
  @IsOptional()
  @IsInt({ message: 'ordinal must be a whole number' })
  @Min(1, { message: 'ordinal must be 1 or more' })
  ordinal?: number;
}

/** Cutoffs are fractions (v/v) and, optionally, a permeability in mD. Inclusive limits. */
export class PutCutoffsDto {
  @ApiProperty({ example: 0.4 })
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'vshMax must be a number (v/v)' })
  @Min(0, { message: 'vshMax must be between 0 and 1 (v/v)' })
  @Max(1, { message: 'vshMax must be between 0 and 1 (v/v)' })
  vshMax: number;

  @ApiProperty({ example: 0.08 })
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'phiMin must be a number (v/v)' })
  @Min(0, { message: 'phiMin must be between 0 and 1 (v/v)' })
  @Max(1, { message: 'phiMin must be between 0 and 1 (v/v)' })
  phiMin: number;

  @ApiProperty({ example: 0.6 })
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'swMax must be a number (v/v)' })
  @Min(0, { message: 'swMax must be between 0 and 1 (v/v)' })
  @Max(1, { message: 'swMax must be between 0 and 1 (v/v)' })
  swMax: number;

  @ApiPropertyOptional({ nullable: true, description: 'mD; null or absent = no permeability cutoff' })
  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'permMin must be a number (mD) or null' })
  @Min(0, { message: 'permMin must be 0 mD or more' })
  permMin?: number | null;
}
