import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional, IsString, Matches, MaxLength } from 'class-validator';

export class UserRefDto {
  @ApiProperty() id: string;
  @ApiProperty() name: string;
}

export class InterpretationDto {
  @ApiProperty() id: string;
  @ApiProperty() wellId: string;
  @ApiProperty() version: number;
  @ApiProperty({ enum: ['draft', 'submitted', 'approved', 'returned'] }) status: 'draft' | 'submitted' | 'approved' | 'returned';
  @ApiProperty({ type: 'object', additionalProperties: true, description: 'Snapshot of everything that produced it: zones with parameters, cutoffs, tops, bindings, survey, log-run sha256s, merged index' })
  inputs: Record<string, unknown>;
  @ApiProperty({ type: 'array', items: { type: 'object' }, description: "core's ZoneSummary per zone" }) summaries: Record<string, unknown>[];
  @ApiProperty({ type: 'array', items: { type: 'object' } }) warnings: Record<string, unknown>[];
  @ApiProperty({ type: UserRefDto, nullable: true }) createdBy: UserRefDto | null;
  @ApiProperty() createdAt: string;
  @ApiProperty() updatedAt: string;
  @ApiProperty({ type: UserRefDto, nullable: true }) submittedBy: UserRefDto | null;
  @ApiProperty({ nullable: true }) submittedAt: string | null;
  @ApiProperty({ type: UserRefDto, nullable: true }) reviewedBy: UserRefDto | null;
  @ApiProperty({ nullable: true }) reviewedAt: string | null;
  @ApiProperty({ nullable: true }) reviewComment: string | null;
}

export class ApproveDto {
  @ApiPropertyOptional({ description: 'Optional note kept with the approval' })
  @IsOptional()
  @IsString({ message: 'comment must be a string' })
  @MaxLength(4000, { message: 'comment must be at most 4000 characters' })
  comment?: string;
}

export class ReturnDto {
  @ApiProperty({ description: 'What the author should change (required)' })
  @IsString({ message: 'comment must be a string' })
  @Matches(/\S/, { message: 'comment must say what to change (it is required when returning)' })
  @MaxLength(4000, { message: 'comment must be at most 4000 characters' })
  comment: string;
}
