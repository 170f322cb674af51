import { ApiProperty } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { ArrayMaxSize, IsArray, IsIn, IsString, MaxLength, ValidateNested } from 'class-validator';
import { BINDING_KEYS, type BindingKey } from '../binding-keys.js';

export class BindingDto {
  @ApiProperty({ enum: BINDING_KEYS }) binding: BindingKey;
  @ApiProperty() logRunId: string;
  @ApiProperty({ description: 'File name of the log run (for display)' }) fileName: string;
  @ApiProperty() mnemonic: string;
  @ApiProperty({ description: 'The curve unit as written in the file' }) unit: string;
  @ApiProperty({ description: 'The user confirmed this binding' }) confirmed: boolean;
  @ApiProperty({ description: 'Proposed from the recognised curve classes (nothing stored yet)' }) proposed: boolean;
}

export class BindingInputDto {
  @ApiProperty({ enum: BINDING_KEYS })
  @IsIn(BINDING_KEYS, { message: `binding must be one of: ${BINDING_KEYS.join(', ')}` })
  binding: BindingKey;

  @ApiProperty()
  @IsString({ message: 'logRunId must be a string' })
  logRunId: string;

  @ApiProperty()
  @IsString({ message: 'mnemonic must be a string' })
  @MaxLength(64, { message: 'mnemonic must be at most 64 characters' })
  mnemonic: string;
}

export class PutBindingsDto {
  @ApiProperty({ type: [BindingInputDto], description: 'The full set: bindings not listed are removed' })
  @IsArray({ message: 'bindings must be an array' })
  @ArrayMaxSize(BINDING_KEYS.length, { message: `bindings must have at most ${BINDING_KEYS.length} entries` })
  @ValidateNested({ each: true })
  @Type(() => BindingInputDto)
  bindings: BindingInputDto[];
}
