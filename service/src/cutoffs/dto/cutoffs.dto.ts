import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { FormationDto } from '../../formations/dto/formation.dto.js';

export class RecomputedWellDto {
  @ApiProperty() wellId: string;
  @ApiProperty() wellName: string;
  @ApiProperty({ nullable: true, description: 'The newest version of the well (null: never saved)' }) interpretationId: string | null;
  @ApiProperty({ nullable: true }) version: number | null;
  @ApiProperty({ nullable: true, enum: ['draft', 'submitted', 'approved', 'returned'] }) status: string | null;
  @ApiProperty({ nullable: true, description: "Net pay (MD) of this formation's zone before, in the well's depth unit" }) netPayBefore: number | null;
  @ApiProperty({ nullable: true }) netPayAfter: number | null;
  @ApiProperty({ description: "True when the formation's zone summary changed" }) changed: boolean;
  @ApiProperty({ description: 'Recomputed (a draft or returned version); approved and submitted versions are left as they are' }) recomputed: boolean;
  @ApiPropertyOptional({ description: 'Why the version could not be recomputed' }) error?: string;
}

export class CutoffsResultDto {
  @ApiProperty({ type: FormationDto }) formation: FormationDto;
  @ApiProperty({ type: [RecomputedWellDto] }) recomputed: RecomputedWellDto[];
}
