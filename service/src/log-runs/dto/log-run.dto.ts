import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';

export class DiagnosticDto {
  @ApiProperty({ enum: ['error', 'warning', 'info'] }) severity: 'error' | 'warning' | 'info';
  @ApiProperty({ nullable: true, description: 'Line of the file, 1-based' }) line: number | null;
  @ApiProperty() message: string;
}

export class CurveDto {
  @ApiProperty() id: string;
  @ApiProperty() mnemonic: string;
  @ApiProperty() unit: string;
  @ApiProperty() description: string;
  @ApiProperty({ nullable: true, description: 'Recognised curve class (gamma_ray, bulk_density, ...)' }) curveClass: string | null;
  @ApiProperty() nullCount: number;
  @ApiProperty({ nullable: true }) min: number | null;
  @ApiProperty({ nullable: true }) max: number | null;
}

export class LogRunDto {
  @ApiProperty() id: string;
  @ApiProperty() wellId: string;
  @ApiProperty() fileName: string;
  @ApiProperty() sha256: string;
  @ApiProperty() sizeBytes: number;
  @ApiProperty() lasVersion: string;
  @ApiProperty() wrapped: boolean;
  @ApiProperty() depthUnit: string;
  @ApiProperty() start: number;
  @ApiProperty() stop: number;
  @ApiProperty({ nullable: true, description: 'null when sampling is irregular' }) step: number | null;
  @ApiProperty() rowCount: number;
  @ApiProperty() curveCount: number;
  @ApiProperty() uploadedAt: string;
  @ApiProperty({ nullable: true }) uploadedBy: string | null;
  @ApiProperty({ nullable: true, description: 'Name of the user who uploaded the file' }) uploadedByName: string | null;
}

export class LogRunDetailDto extends LogRunDto {
  @ApiProperty({ type: [CurveDto] }) curves: CurveDto[];
  @ApiProperty({ type: [DiagnosticDto] }) diagnostics: DiagnosticDto[];
}

export class UploadResultDto {
  @ApiProperty() fileName: string;
  @ApiProperty({ enum: ['stored', 'duplicate', 'rejected'] }) status: 'stored' | 'duplicate' | 'rejected';
  @ApiPropertyOptional() logRunId?: string;
  @ApiPropertyOptional({ description: 'Why the file was rejected, or which run it duplicates' }) message?: string;
  @ApiPropertyOptional({ nullable: true, description: 'Line of the file the rejection points at' }) line?: number | null;
  @ApiProperty({ type: [DiagnosticDto] }) diagnostics: DiagnosticDto[];
}

export class UploadResponseDto {
  @ApiProperty({ type: [UploadResultDto] }) results: UploadResultDto[];
}
