import { ApiProperty } from '@nestjs/swagger';
import { BindingDto } from '../../bindings/dto/bindings.dto.js';
import { CutoffsDto } from '../../formations/dto/formation.dto.js';
import { InterpretationDto } from '../../interpretations/dto/interpretation.dto.js';
import { WellDetailDto } from '../../wells/dto/well.dto.js';

export class WorkbenchZoneDto {
  @ApiProperty() formationId: string;
  @ApiProperty({ description: 'Zone name = formation name' }) name: string;
  @ApiProperty({ description: 'Formation whose cutoffs apply (the key into `cutoffs`)' }) formation: string;
  @ApiProperty() colour: string;
  @ApiProperty({ description: 'Top, clipped to the merged index' }) top: number;
  @ApiProperty({ description: 'Base, clipped to the merged index' }) base: number;
  @ApiProperty({ type: 'object', additionalProperties: true, description: "core's ZoneParameters" }) params: Record<string, unknown>;
  @ApiProperty({ description: 'True when the parameters are the lithology defaults (nothing stored)' }) isDefault: boolean;
}

export class SurveyStationCoreDto {
  @ApiProperty() md: number;
  @ApiProperty({ description: 'inclination, degrees' }) inc: number;
  @ApiProperty({ description: 'azimuth, degrees' }) azi: number;
}

export class WorkbenchSurveyDto {
  @ApiProperty({ enum: ['ft', 'm'] }) depthUnit: 'ft' | 'm';
  @ApiProperty({ type: [SurveyStationCoreDto], description: "Stations in the well's depth unit, in core's SurveyStation shape: pass them as evaluateWell's survey" })
  stations: SurveyStationCoreDto[];
  @ApiProperty({ type: [Number] }) md: number[];
  @ApiProperty({ type: [Number], description: 'TVD at each station by minimum curvature' }) tvd: number[];
}

export class MergedIndexDto {
  @ApiProperty() start: number;
  @ApiProperty() stop: number;
  @ApiProperty() step: number;
  @ApiProperty() samples: number;
}

export class WorkbenchDto {
  @ApiProperty({ type: WellDetailDto }) well: WellDetailDto;
  @ApiProperty({ nullable: true, enum: ['ft', 'm'] }) depthUnit: 'ft' | 'm' | null;
  @ApiProperty({ type: [WorkbenchZoneDto], description: 'Exactly the zones evaluateWell runs on (the server evaluates these too)' }) zones: WorkbenchZoneDto[];
  @ApiProperty({ type: [String], description: 'Zones left out or clipped, and why; merge problems' }) notes: string[];
  @ApiProperty({ type: 'object', additionalProperties: { $ref: '#/components/schemas/CutoffsDto' }, description: 'Cutoffs per formation name' })
  cutoffs: Record<string, CutoffsDto>;
  @ApiProperty({ type: [BindingDto] }) bindings: BindingDto[];
  @ApiProperty({ type: WorkbenchSurveyDto, nullable: true }) survey: WorkbenchSurveyDto | null;
  @ApiProperty({ type: MergedIndexDto, nullable: true, description: 'The merged depth index of merged-samples' }) merged: MergedIndexDto | null;
  @ApiProperty({ type: 'array', items: { type: 'object', properties: { key: { type: 'string' }, statement: { type: 'string' } } } }) conventions: { key: string; statement: string }[];
  @ApiProperty({ type: InterpretationDto, nullable: true }) latest: InterpretationDto | null;
}
