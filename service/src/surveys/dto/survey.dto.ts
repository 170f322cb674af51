import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional } from 'class-validator';

export class SurveyStationDto {
  @ApiProperty() md: number;
  @ApiProperty({ description: 'degrees from vertical' }) inclination: number;
  @ApiProperty({ description: 'degrees clockwise from north' }) azimuth: number;
}

export class SurveyDto {
  @ApiProperty() fileName: string;
  @ApiProperty({ enum: ['ft', 'm'] }) depthUnit: 'ft' | 'm';
  @ApiProperty({ type: [SurveyStationDto] }) stations: SurveyStationDto[];
  @ApiProperty({ type: [Number], description: 'TVD at each station by minimum curvature (vertical above the first station)' }) tvdAtStations: number[];
  @ApiProperty() uploadedAt: string;
}

/** Form fields sent beside the file. */
export class SurveyUploadDto {
  @ApiPropertyOptional({ enum: ['ft', 'm'], description: "Depth unit of the md column; defaults to the unit in the md header, then the well's log depth unit" })
  @IsOptional()
  @IsIn(['ft', 'm'], { message: "depthUnit must be 'ft' or 'm'" })
  depthUnit?: 'ft' | 'm';
}
