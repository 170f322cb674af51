import { BadRequestException, Injectable } from '@nestjs/common';
import type { Well } from '@poreline/schema';
import type { AuthUser } from '../auth/auth-user.js';
import { isUuid } from '../common/ids.js';
import { loggedRange, wellDepthUnit } from '../common/well-depth.js';
import { FormationsRepository } from '../formations/formations.repository.js';
import { WellsRepository } from '../wells/wells.repository.js';
import { WellsService } from '../wells/wells.service.js';
import type { PutTopsDto, TopDto, ZoneDto } from './dto/tops.dto.js';
import { topsOrderProblem } from './tops-order.js';
import { TopsRepository, type TopRow } from './tops.repository.js';
import { zonesFromTops } from './zones.js';

const toTopDto = (t: TopRow): TopDto => ({ formationId: t.formationId, formationName: t.formationName, colour: t.colour, md: t.md, source: t.source });
const auditView = (tops: readonly { formationName: string; md: number; source: string }[]) => tops.map((t) => ({ formation: t.formationName, md: t.md, source: t.source }));

@Injectable()
export class TopsService {
  constructor(
    private readonly tops: TopsRepository,
    private readonly wells: WellsService,
    private readonly wellRows: WellsRepository,
    private readonly formations: FormationsRepository,
  ) {}

  async list(assetId: string, wellId: string): Promise<TopDto[]> {
    await this.wells.require(assetId, wellId);
    return (await this.tops.listByWell(wellId)).map(toTopDto);
  }

  /** Replaces the well's tops: each formation of this asset at most once, deepening in formation order. */
  async replace(assetId: string, wellId: string, body: PutTopsDto, user: Pick<AuthUser, 'id'>): Promise<TopDto[]> {
    await this.wells.require(assetId, wellId);
    const formations = await this.formations.list(assetId);
    const byId = new Map(formations.map((f) => [f.id, f]));
    const seen = new Set<string>();
    body.tops.forEach((t, i) => {
      const f = isUuid(t.formationId) ? byId.get(t.formationId) : undefined;
      if (!f) throw new BadRequestException(`tops[${i}].formationId is not a formation of this asset`);
      if (seen.has(f.id)) throw new BadRequestException(`tops[${i}].formationId repeats "${f.name}": a formation has one top per well`);
      seen.add(f.id);
    });
    const problem = topsOrderProblem(body.tops, formations);
    if (problem) throw new BadRequestException(`tops: ${problem} (tops must deepen in formation order)`);
    const before = await this.tops.listByWell(wellId);
    const after = body.tops
      .map((t) => ({ formationId: t.formationId, formationName: byId.get(t.formationId)!.name, md: t.md, source: t.source ?? 'table' }))
      .sort((a, b) => a.md - b.md);
    if (JSON.stringify(auditView(before)) !== JSON.stringify(auditView(after))) {
      await this.tops.replace(
        wellId,
        after.map((t) => ({ formationId: t.formationId, md: t.md, source: t.source })),
        { assetId, userId: user.id, action: 'replace', entity: 'well_tops', entityId: wellId, before: auditView(before), after: auditView(after) },
      );
    }
    return (await this.tops.listByWell(wellId)).map(toTopDto);
  }

  async zones(assetId: string, wellId: string): Promise<ZoneDto[]> {
    return this.zonesOf(await this.wells.require(assetId, wellId));
  }

  /** The well's zones (the caller has checked the well belongs to the asset). */
  async zonesOf(well: Well): Promise<ZoneDto[]> {
    const runs = await this.wellRows.logRunsOf([well.id]);
    const unit = wellDepthUnit(runs);
    const range = unit ? loggedRange(runs, unit) : null;
    const tops = await this.tops.listByWell(well.id);
    return zonesFromTops(
      tops.map((t) => ({ formationId: t.formationId, name: t.formationName, colour: t.colour, md: t.md })),
      range?.base ?? null,
    );
  }
}
