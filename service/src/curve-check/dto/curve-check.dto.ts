import { ApiProperty } from '@nestjs/swagger';

export class CoverageDto {
  @ApiProperty({ nullable: true, description: 'Depth of the first sample with a value' }) first: number | null;
  @ApiProperty({ nullable: true, description: 'Depth of the last sample with a value' }) last: number | null;
  @ApiProperty({ description: 'Samples with a value / all samples of the run' }) fraction: number;
}

export class NullRunDto {
  @ApiProperty() from: number;
  @ApiProperty() to: number;
  @ApiProperty() samples: number;
}

export class RangeViolationsDto {
  @ApiProperty() below: number;
  @ApiProperty() above: number;
  @ApiProperty({ nullable: true }) min: number | null;
  @ApiProperty({ nullable: true }) max: number | null;
  @ApiProperty({ nullable: true, description: "Plausible range of the curve class, in the curve's unit" }) expectedMin: number | null;
  @ApiProperty({ nullable: true }) expectedMax: number | null;
}

export class CurveCheckDto {
  @ApiProperty() logRunId: string;
  @ApiProperty() fileName: string;
  @ApiProperty({ description: "The run's depth unit as written" }) depthUnit: string;
  @ApiProperty() mnemonic: string;
  @ApiProperty() unit: string;
  @ApiProperty({ nullable: true }) curveClass: string | null;
  @ApiProperty({ type: CoverageDto }) coverage: CoverageDto;
  @ApiProperty({ type: [NullRunDto], description: 'Gaps between the first and last value (at most 100 listed)' }) nullRuns: NullRunDto[];
  @ApiProperty() nullRunsTruncated: boolean;
  @ApiProperty({ type: RangeViolationsDto }) rangeViolations: RangeViolationsDto;
}
