import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { ArrayMaxSize, ArrayMinSize, IsArray, IsIn, IsNumber, IsObject, IsOptional, IsString, IsUUID, Max, MaxLength, Min, ValidateNested } from 'class-validator';
import { CUM_GAS_UNITS, PRESSURE_UNITS, RATE_UNITS, TIME_UNITS } from '../production-units.js';

export const SERIES_KINDS = ['pressure', 'rate'] as const;
export const FLUIDS = ['gas', 'oil'] as const;
const MAX_POINTS = 20_000;

/** JSON entry of a series; `units` and `points` are checked by kind in the service (400 naming the field). */
export class CreateSeriesDto {
  @ApiProperty({ enum: SERIES_KINDS }) @IsIn(SERIES_KINDS, { message: 'kind must be pressure or rate' }) kind: 'pressure' | 'rate';
  @ApiProperty({ enum: FLUIDS }) @IsIn(FLUIDS, { message: 'fluid must be gas or oil' }) fluid: 'gas' | 'oil';
  @ApiProperty({ description: "pressure: { cumGas, pressure }; rate: { time, rate }" }) @IsObject({ message: 'units must be an object' }) units: Record<string, string>;
  @ApiProperty({ description: 'pressure: [{ cumGas, pressure }]; rate: [{ t, rate }]' })
  @IsArray({ message: 'points must be an array' })
  @ArrayMinSize(2, { message: 'points must hold at least 2 points' })
  @ArrayMaxSize(MAX_POINTS, { message: `points must hold at most ${MAX_POINTS} points` })
  points: Record<string, unknown>[];
  @ApiPropertyOptional() @IsOptional() @IsString({ message: 'label must be a string' }) @MaxLength(120, { message: 'label must be at most 120 characters' }) label?: string;
}

/** Text fields of the multipart CSV upload. */
export class UploadSeriesDto {
  @ApiProperty({ enum: SERIES_KINDS }) @IsIn(SERIES_KINDS, { message: 'kind must be pressure or rate' }) kind: 'pressure' | 'rate';
  @ApiProperty({ enum: FLUIDS }) @IsIn(FLUIDS, { message: 'fluid must be gas or oil' }) fluid: 'gas' | 'oil';
  @ApiPropertyOptional({ enum: CUM_GAS_UNITS }) @IsOptional() @IsIn(CUM_GAS_UNITS, { message: `cumGasUnit must be one of ${CUM_GAS_UNITS.join(', ')}` }) cumGasUnit?: string;
  @ApiPropertyOptional({ enum: PRESSURE_UNITS }) @IsOptional() @IsIn(PRESSURE_UNITS, { message: `pressureUnit must be one of ${PRESSURE_UNITS.join(', ')}` }) pressureUnit?: string;
  @ApiPropertyOptional({ enum: TIME_UNITS }) @IsOptional() @IsIn(TIME_UNITS, { message: `timeUnit must be one of ${TIME_UNITS.join(', ')}` }) timeUnit?: string;
  @ApiPropertyOptional({ enum: RATE_UNITS }) @IsOptional() @IsIn(RATE_UNITS, { message: `rateUnit must be one of ${RATE_UNITS.join(', ')}` }) rateUnit?: string;
  @ApiPropertyOptional() @IsOptional() @IsString() @MaxLength(120, { message: 'label must be at most 120 characters' }) label?: string;
}

export class PzFitQueryDto {
  @ApiPropertyOptional({ description: 'Take temperature, gas gravity, z method and volumetric GIP from this case' })
  @IsOptional()
  @IsUUID('all', { message: 'caseId must be a case id (uuid)' })
  caseId?: string;
  @ApiPropertyOptional() @IsOptional() @Type(() => Number) @IsNumber({}, { message: 'temperatureF must be a number' }) temperatureF?: number;
  @ApiPropertyOptional() @IsOptional() @Type(() => Number) @IsNumber({}, { message: 'gasGravity must be a number' }) @Min(0.55, { message: 'gasGravity must be in [0.55, 1.8]' }) @Max(1.8, { message: 'gasGravity must be in [0.55, 1.8]' }) gasGravity?: number;
  @ApiPropertyOptional({ enum: ['dak', 'hall-yarborough'] }) @IsOptional() @IsIn(['dak', 'hall-yarborough'], { message: 'zMethod must be dak or hall-yarborough' }) zMethod?: 'dak' | 'hall-yarborough';
}

export class DeclineFitQueryDto {
  @ApiProperty({ enum: ['exponential', 'hyperbolic', 'harmonic'] })
  @IsIn(['exponential', 'hyperbolic', 'harmonic'], { message: 'kind must be exponential, hyperbolic or harmonic' })
  kind: 'exponential' | 'hyperbolic' | 'harmonic';
  @ApiProperty({ description: 'Economic limit rate, in the series rate unit' })
  @Type(() => Number)
  @IsNumber({}, { message: 'economicLimit must be a number' })
  @Min(0.000001, { message: 'economicLimit must be > 0' })
  economicLimit: number;
}

class HorizontalDto {
  @ApiProperty() @IsNumber({}, { message: 'horizontal.lengthFt must be a number' }) @Min(1, { message: 'horizontal.lengthFt must be >= 1' }) lengthFt: number;
  @ApiPropertyOptional({ description: 'kv, md (default kh)' }) @IsOptional() @IsNumber({}, { message: 'horizontal.kvMd must be a number' }) kvMd?: number;
  @ApiPropertyOptional({ description: 'Drainage radius of the lateral, ft (default the vertical re)' }) @IsOptional() @IsNumber({}, { message: 'horizontal.rehFt must be a number' }) rehFt?: number;
}

export class InflowDto {
  @ApiProperty() @IsNumber({}, { message: 'permeabilityMd must be a number' }) permeabilityMd: number;
  @ApiProperty() @IsNumber({}, { message: 'netPayFt must be a number' }) netPayFt: number;
  @ApiProperty() @IsNumber({}, { message: 'viscosityCp must be a number' }) viscosityCp: number;
  @ApiProperty({ description: 'Bo, rb/STB' }) @IsNumber({}, { message: 'fvf must be a number' }) fvf: number;
  @ApiProperty() @IsNumber({}, { message: 'drawdownPsi must be a number' }) drawdownPsi: number;
  @ApiProperty() @IsNumber({}, { message: 'drainageRadiusFt must be a number' }) drainageRadiusFt: number;
  @ApiProperty() @IsNumber({}, { message: 'wellboreRadiusFt must be a number' }) wellboreRadiusFt: number;
  @ApiPropertyOptional() @IsOptional() @IsNumber({}, { message: 'skin must be a number' }) skin?: number;
  @ApiPropertyOptional({ type: HorizontalDto }) @IsOptional() @ValidateNested() @Type(() => HorizontalDto) horizontal?: HorizontalDto;
}

/** POST /api/assets/:assetId/inflow/gas: a gas well's pseudo-steady-state rate (pressure-squared form). */
export class GasInflowDto {
  @ApiProperty() @IsNumber({}, { message: 'permeabilityMd must be a number' }) permeabilityMd: number;
  @ApiProperty() @IsNumber({}, { message: 'netPayFt must be a number' }) netPayFt: number;
  @ApiProperty({ description: 'Gas viscosity at the average of the two pressures, cp' }) @IsNumber({}, { message: 'viscosityCp must be a number' }) viscosityCp: number;
  @ApiProperty({ description: 'Average reservoir pressure, psia' }) @IsNumber({}, { message: 'reservoirPressurePsia must be a number' }) reservoirPressurePsia: number;
  @ApiProperty({ description: 'Flowing bottom-hole pressure, psia' }) @IsNumber({}, { message: 'bottomholePressurePsia must be a number' }) bottomholePressurePsia: number;
  @ApiProperty() @IsNumber({}, { message: 'temperatureF must be a number' }) temperatureF: number;
  @ApiProperty({ description: 'Gas specific gravity, air = 1 (z at the average pressure from Sutton pseudo-criticals)' })
  @IsNumber({}, { message: 'gasGravity must be a number' })
  gasGravity: number;
  @ApiPropertyOptional({ enum: ['dak', 'hall-yarborough'] }) @IsOptional() @IsIn(['dak', 'hall-yarborough'], { message: 'zMethod must be dak or hall-yarborough' }) zMethod?: 'dak' | 'hall-yarborough';
  @ApiProperty() @IsNumber({}, { message: 'drainageRadiusFt must be a number' }) drainageRadiusFt: number;
  @ApiProperty() @IsNumber({}, { message: 'wellboreRadiusFt must be a number' }) wellboreRadiusFt: number;
  @ApiPropertyOptional() @IsOptional() @IsNumber({}, { message: 'skin must be a number' }) skin?: number;
}

export interface GasInflowResultDto {
  rateMscfPerDay: number;
  absoluteOpenFlowMscfPerDay: number;
  coefficient: number;
  averagePressurePsia: number;
  /** z at the average pressure, with the pseudo-reduced values it came from. */
  pvt: { z: number; zMethod: 'dak' | 'hall-yarborough'; tpr: number; ppr: number };
  equation: string;
  assumptions: string[];
}

export interface SeriesDto {
  id: string;
  wellId: string;
  kind: 'pressure' | 'rate';
  fluid: string;
  units: Record<string, string>;
  points: Record<string, number | string>[];
  fileName: string | null;
  label: string;
  createdAt: string;
  uploadedBy: string | null;
}

export interface PzFitDto {
  seriesId: string;
  temperatureF: number;
  gasGravity: number;
  zMethod: 'dak' | 'hall-yarborough';
  points: { cumGasScf: number; pressurePsia: number; z: number; pOverZ: number }[];
  fit: { intercept: number; slope: number; r2: number; n: number };
  drainedGipScf: number;
  drainedGipM3: number;
  volumetric: { caseId: string; caseName: string; basis: string; gipScf: number; wells: number; ratio: number }[];
  wellsNeeded: number | null;
  method: string;
  assumptions: string[];
  caution: string;
}

export interface DeclineFitDto {
  seriesId: string;
  kind: 'exponential' | 'hyperbolic' | 'harmonic';
  rateUnit: string;
  volumeUnit: string;
  timeUnit: string;
  qi: number;
  b: number;
  diNominalPerYear: number;
  diEffectivePerYear: number;
  r2: number;
  rmse: number;
  atBound: boolean;
  points: { tDays: number; rate: number; fitted: number }[];
  forecast: { tDays: number; rate: number }[];
  economicLimit: number;
  cumulativeToDate: number;
  eur: number;
  remaining: number;
  timeToLimitDays: number;
  notes: string[];
  caution: string;
}

export interface InflowResultDto {
  vertical: { rateStbPerDay: number; productivityIndex: number; equation: string };
  horizontal: null | {
    rateStbPerDay: number;
    productivityIndex: number;
    aFt: number;
    beta: number;
    verticalSteadyStateRateStbPerDay: number;
    productivityRatio: number;
    equation: string;
  };
  assumptions: string[];
}
