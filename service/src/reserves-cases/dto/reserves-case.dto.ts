import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { ArrayMaxSize, IsArray, IsInt, IsObject, IsOptional, IsString, IsUUID, Matches, Max, MaxLength, Min, MinLength } from 'class-validator';
import type { ReviewStatus } from '@poreline/schema';
import type { CaseInputs } from '../case-inputs.js';
import type { CaseResults, CombinedValues } from '../case-engine.js';
import type { SourceSnapshot } from '../source-values.js';

const SEED_MAX = 2_147_483_647;

export class CreateReservesCaseDto {
  @ApiProperty({ example: 'Upper Sand – base case' })
  @IsString({ message: 'name must be a string' })
  @MinLength(1, { message: 'name must not be empty' })
  @MaxLength(120, { message: 'name must be at most 120 characters' })
  @Matches(/\S/, { message: 'name must not be blank' })
  name: string;

  @ApiProperty({ description: 'Target formation of the asset' })
  @IsUUID('all', { message: 'formationId must be a formation id (uuid)' })
  formationId: string;

  @ApiPropertyOptional({ type: [String], description: 'Wells whose newest approved interpretation feeds the case' })
  @IsOptional()
  @IsArray({ message: 'wellIds must be an array of well ids' })
  @ArrayMaxSize(500, { message: 'wellIds must hold at most 500 wells' })
  @IsUUID('all', { each: true, message: 'wellIds must hold well ids (uuid)' })
  wellIds?: string[];

  @ApiPropertyOptional({ description: 'Partial CaseInputs (see RESERVES.md)' })
  @IsOptional()
  @IsObject({ message: 'inputs must be an object' })
  inputs?: Record<string, unknown>;

  @ApiPropertyOptional({ description: 'Monte Carlo seed (integer); random when omitted' })
  @IsOptional()
  @IsInt({ message: 'seed must be an integer' })
  @Min(0, { message: 'seed must be >= 0' })
  @Max(SEED_MAX, { message: `seed must be <= ${SEED_MAX}` })
  seed?: number;
}

export class UpdateReservesCaseDto {
  @ApiPropertyOptional()
  @IsOptional()
  @IsString({ message: 'name must be a string' })
  @MinLength(1, { message: 'name must not be empty' })
  @MaxLength(120, { message: 'name must be at most 120 characters' })
  @Matches(/\S/, { message: 'name must not be blank' })
  name?: string;

  @ApiPropertyOptional({ type: [String] })
  @IsOptional()
  @IsArray({ message: 'wellIds must be an array of well ids' })
  @ArrayMaxSize(500, { message: 'wellIds must hold at most 500 wells' })
  @IsUUID('all', { each: true, message: 'wellIds must hold well ids (uuid)' })
  wellIds?: string[];

  @ApiPropertyOptional({ description: 'Partial CaseInputs; each top-level key given replaces that key' })
  @IsOptional()
  @IsObject({ message: 'inputs must be an object' })
  inputs?: Record<string, unknown>;

  @ApiPropertyOptional()
  @IsOptional()
  @IsInt({ message: 'seed must be an integer' })
  @Min(0, { message: 'seed must be >= 0' })
  @Max(SEED_MAX, { message: `seed must be <= ${SEED_MAX}` })
  seed?: number;

  @ApiPropertyOptional({ description: 'The revision the edit was made on; 409 when the case has moved on' })
  @IsOptional()
  @IsInt({ message: 'expectedRevision must be an integer' })
  expectedRevision?: number;
}

export class RefreshSourcesDto {
  @ApiPropertyOptional({ type: [String], description: 'Only these wells (default: every stale source)' })
  @IsOptional()
  @IsArray({ message: 'wellIds must be an array of well ids' })
  @IsUUID('all', { each: true, message: 'wellIds must hold well ids (uuid)' })
  wellIds?: string[];
}

export class ApproveCaseDto {
  @ApiPropertyOptional()
  @IsOptional()
  @IsString({ message: 'comment must be a string' })
  @MaxLength(4000, { message: 'comment must be at most 4000 characters' })
  comment?: string;
}

export class ReturnCaseDto {
  @ApiProperty({ description: 'What the author should change' })
  @IsString({ message: 'comment must be a string' })
  @Matches(/\S/, { message: 'comment is required: say what should change' })
  @MaxLength(4000, { message: 'comment must be at most 4000 characters' })
  comment: string;
}

export class ExportQueryDto {
  @ApiPropertyOptional({ enum: ['xlsx'] })
  @IsOptional()
  @Matches(/^xlsx$/, { message: 'format must be xlsx' })
  format?: 'xlsx';
}

export class CandidatesQueryDto {
  @ApiProperty()
  @IsUUID('all', { message: 'formationId must be a formation id (uuid)' })
  formationId: string;
}

export interface UserRef {
  id: string;
  name: string;
}

export interface SourceDto extends SourceSnapshot {
  latestApprovedVersion: number | null;
  latestInterpretationId: string | null;
  stale: boolean;
}

export interface CandidateDto extends Omit<SourceSnapshot, 'formationName'> {
  formationName: string;
}

export class ReservesCaseDto {
  @ApiProperty() id: string;
  @ApiProperty() assetId: string;
  @ApiProperty() formationId: string;
  @ApiProperty() formationName: string;
  @ApiProperty() name: string;
  @ApiProperty({ enum: ['draft', 'submitted', 'approved', 'returned'] }) status: ReviewStatus;
  @ApiProperty() revision: number;
  @ApiProperty() seed: number;
  @ApiProperty({ type: 'array', items: { type: 'object' } }) sources: SourceDto[];
  @ApiProperty({ type: 'object', additionalProperties: true }) inputs: CaseInputs;
  @ApiProperty({ type: 'object', nullable: true, additionalProperties: true }) combined: CombinedValues | null;
  @ApiProperty({ nullable: true }) combinedError: string | null;
  @ApiProperty({ type: 'object', nullable: true, additionalProperties: true }) results: CaseResults | null;
  @ApiProperty({ description: 'Results belong to the current revision' }) resultsCurrent: boolean;
  @ApiProperty() staleSources: number;
  @ApiProperty({ type: [String] }) conventions: string[];
  @ApiProperty() caution: string;
  @ApiProperty({ type: 'object', nullable: true, additionalProperties: true }) createdBy: UserRef | null;
  @ApiProperty({ type: 'object', nullable: true, additionalProperties: true }) submittedBy: UserRef | null;
  @ApiProperty({ nullable: true }) submittedAt: string | null;
  @ApiProperty({ type: 'object', nullable: true, additionalProperties: true }) reviewedBy: UserRef | null;
  @ApiProperty({ nullable: true }) reviewedAt: string | null;
  @ApiProperty({ nullable: true }) reviewComment: string | null;
  @ApiProperty() createdAt: string;
  @ApiProperty() updatedAt: string;
}

export class ReservesCaseSummaryDto {
  @ApiProperty() id: string;
  @ApiProperty() name: string;
  @ApiProperty() formationId: string;
  @ApiProperty() formationName: string;
  @ApiProperty({ enum: ['draft', 'submitted', 'approved', 'returned'] }) status: ReviewStatus;
  @ApiProperty() revision: number;
  @ApiProperty({ enum: ['oil', 'gas'] }) fluid: 'oil' | 'gas';
  @ApiProperty() wellCount: number;
  @ApiProperty() staleSources: number;
  @ApiProperty({ type: 'object', nullable: true, additionalProperties: true }) recoverable: { deterministic: number; p90: number; p50: number; p10: number; unit: 'STB' | 'scf' } | null;
  @ApiProperty() resultsCurrent: boolean;
  @ApiProperty() updatedAt: string;
  @ApiProperty({ type: 'object', nullable: true, additionalProperties: true }) createdBy: UserRef | null;
}

export interface CaseAuditEntryDto {
  id: number;
  at: string;
  user: UserRef | null;
  action: string;
  before: unknown;
  after: unknown;
}
