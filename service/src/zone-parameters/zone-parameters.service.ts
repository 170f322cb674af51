import { BadRequestException, Injectable } from '@nestjs/common';
import { defaultZoneParameters, formatIssue, validateZoneParameters, type ZoneParameters } from '@poreline/core';
import type { Formation, Well } from '@poreline/schema';
import type { AuthUser } from '../auth/auth-user.js';
import { wellDepthUnit } from '../common/well-depth.js';
import { FormationsService } from '../formations/formations.service.js';
import type { FormationLithology } from '../formations/lithologies.js';
import { WellsRepository } from '../wells/wells.repository.js';
import { WellsService } from '../wells/wells.service.js';
import type { PutZoneParametersDto, ZoneParametersDto } from './dto/zone-parameters.dto.js';
import { ZoneParametersRepository } from './zone-parameters.repository.js';

/** The fields of core's ZoneParameters (read from a default set). */
const parameterKeys = (): string[] => Object.keys(defaultZoneParameters('sandstone'));

@Injectable()
export class ZoneParametersService {
  constructor(
    private readonly repository: ZoneParametersRepository,
    private readonly wells: WellsService,
    private readonly wellRows: WellsRepository,
    private readonly formations: FormationsService,
  ) {}

  async get(assetId: string, wellId: string, formationId: string): Promise<ZoneParametersDto> {
    const well = await this.wells.require(assetId, wellId);
    const formation = await this.formations.require(assetId, formationId);
    const [result] = await this.forZones(well, [formation]);
    return result;
  }

  /**
   * Stores a zone's parameters after core's validation: every field present, none unknown,
   * each value in range. 400 lists every issue, each naming the zone and the field.
   */
  async put(assetId: string, wellId: string, formationId: string, body: PutZoneParametersDto, user: Pick<AuthUser, 'id'>): Promise<ZoneParametersDto> {
    const well = await this.wells.require(assetId, wellId);
    const formation = await this.formations.require(assetId, formationId);
    const zone = `zone '${formation.name}'`;
    const keys = parameterKeys();
    const missing = keys.filter((k) => !(k in body.params));
    const unknown = Object.keys(body.params).filter((k) => !keys.includes(k));
    const shapeIssues = [...missing.map((k) => `${zone}: params.${k} is missing`), ...unknown.map((k) => `${zone}: params.${k} is not a zone parameter`)];
    if (shapeIssues.length) throw new BadRequestException(shapeIssues);
    const params = body.params as unknown as ZoneParameters;
    const issues = validateZoneParameters(params, formation.name);
    if (issues.length) throw new BadRequestException({ statusCode: 400, error: 'Bad Request', message: issues.map(formatIssue), issues });
    const before = await this.repository.find(well.id, formation.id);
    await this.repository.upsert(well.id, formation.id, body.params, {
      assetId,
      userId: user.id,
      action: before ? 'update' : 'create',
      entity: 'zone_parameters',
      entityId: `${well.id}:${formation.id}`,
      before: before ? { well: well.name, formation: formation.name, params: before.params } : null,
      after: { well: well.name, formation: formation.name, params: body.params },
    });
    return { params: body.params, isDefault: false };
  }

  /** Stored parameters of each formation's zone in the well, or the lithology defaults (in the well's depth unit). */
  async forZones(well: Well, formations: readonly Formation[]): Promise<ZoneParametersDto[]> {
    const stored = await this.repository.listByWell(well.id);
    const unit = wellDepthUnit(await this.wellRows.logRunsOf([well.id])) ?? 'ft';
    return formations.map((f) => {
      const row = stored.find((s) => s.formationId === f.id);
      return row
        ? { params: row.params, isDefault: false }
        : { params: defaultZoneParameters(f.lithology as FormationLithology, unit) as unknown as Record<string, unknown>, isDefault: true };
    });
  }
}
