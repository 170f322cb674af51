import { ApiProperty } from '@nestjs/swagger';

export class DemoZoneRowDto {
  @ApiProperty() well: string;
  @ApiProperty({ description: "Formation name, or a fluid zone such as 'Wren Sand oil'" }) zone: string;
  @ApiProperty({ enum: ['formation', 'fluid'] }) zoneKind: 'formation' | 'fluid';
  @ApiProperty({ enum: ['net reservoir', 'net pay', 'mean porosity', 'mean Sw'] }) quantity: 'net reservoir' | 'net pay' | 'mean porosity' | 'mean Sw';
  @ApiProperty({ enum: ['ft', 'v/v'], description: 'Thickness rows in ft (MD) whatever the well unit' }) unit: 'ft' | 'v/v';
  @ApiProperty() model: number;
  @ApiProperty({ nullable: true }) evaluated: number | null;
  @ApiProperty({ nullable: true, description: 'evaluated - model' }) difference: number | null;
  @ApiProperty({ description: 'Largest accepted |difference| (one sample step for thickness)' }) tolerance: number;
  @ApiProperty() pass: boolean;
}

export class DemoVolumeRowDto {
  @ApiProperty() accumulation: string;
  @ApiProperty({ enum: ['gas', 'oil'] }) fluid: 'gas' | 'oil';
  @ApiProperty({ enum: ['scf', 'STB'] }) unit: 'scf' | 'STB';
  @ApiProperty({ description: 'In place from the model' }) model: number;
  @ApiProperty({ nullable: true, description: 'In place from the evaluated fluid zones' }) evaluated: number | null;
  @ApiProperty({ nullable: true, description: '(evaluated - model) / model' }) relativeDifference: number | null;
  @ApiProperty() tolerance: number;
  @ApiProperty() pass: boolean;
  @ApiProperty({ type: [String] }) wells: string[];
  @ApiProperty({ type: [String] }) missingWells: string[];
  @ApiProperty({ description: 'Map area, acres (the model’s)' }) areaAcres: number;
  @ApiProperty({ description: 'Formation volume factor: Bg rcf/scf or Bo rb/STB' }) fvf: number;
  @ApiProperty() modelInputs: { netPayFt: number; porosity: number; sw: number };
  @ApiProperty({ nullable: true }) evaluatedInputs: { netPayFt: number; porosity: number; sw: number } | null;
}

export class DemoNotEvaluatedDto {
  @ApiProperty() well: string;
  @ApiProperty() zone: string;
  @ApiProperty() reason: string;
}

export class DemoCheckSummaryDto {
  @ApiProperty() zoneRows: number;
  @ApiProperty() zoneRowsPassed: number;
  @ApiProperty() volumeRows: number;
  @ApiProperty() volumeRowsPassed: number;
  @ApiProperty({ description: 'Formation zones of the model that were evaluated / that exist' }) zonesEvaluated: number;
  @ApiProperty() zonesInModel: number;
  @ApiProperty() allPass: boolean;
  @ApiProperty({ description: 'Largest |difference| per quantity over the zone rows, and the largest |relative difference| of the volumes' })
  largest: { netReservoirFt: number; netPayFt: number; porosity: number; sw: number; volumeRelative: number };
}

export class DemoCheckDto {
  @ApiProperty() assetId: string;
  @ApiProperty() generatedAt: string;
  @ApiProperty({ description: 'What the check is' }) explanation: string;
  @ApiProperty({ type: [String], description: 'What was evaluated, with what' }) basis: string[];
  @ApiProperty() tolerances: { thickness: string; porosity: number; sw: number; volumeRelative: number };
  @ApiProperty({ type: DemoCheckSummaryDto }) summary: DemoCheckSummaryDto;
  @ApiProperty({ type: [DemoZoneRowDto] }) zones: DemoZoneRowDto[];
  @ApiProperty({ type: [DemoVolumeRowDto] }) volumes: DemoVolumeRowDto[];
  @ApiProperty({ type: [DemoNotEvaluatedDto] }) notEvaluated: DemoNotEvaluatedDto[];
  @ApiProperty() caution: string;
}
