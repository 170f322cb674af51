import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import type { Well } from '@poreline/schema';
import { AuditService } from '../audit/audit.service.js';
import type { AuthUser } from '../auth/auth-user.js';
import type { CreateWellDto, UpdateWellDto, WellDetailDto, WellRowDto } from './dto/well.dto.js';
import { toLogRunDetailDto, toLogRunDto, toWellRowDto } from './wells.mapper.js';
import { WellsRepository } from './wells.repository.js';

@Injectable()
export class WellsService {
  constructor(
    private readonly wells: WellsRepository,
    private readonly audit: AuditService,
  ) {}

  async list(assetId: string): Promise<WellRowDto[]> {
    const all = await this.wells.listByAsset(assetId);
    const runs = await this.wells.logRunsOf(all.map((w) => w.id));
    return all.map((w) => toWellRowDto(w, runs.filter((r) => r.wellId === w.id).map(toLogRunDto)));
  }

  async get(assetId: string, wellId: string): Promise<WellDetailDto> {
    const well = await this.require(assetId, wellId);
    const runs = await this.wells.logRunsOf([well.id]);
    const curves = await this.wells.curvesOf(runs.map((r) => r.id));
    return toWellRowDto(
      well,
      runs.map((r) => toLogRunDetailDto(r, curves.filter((c) => c.logRunId === r.id))),
    );
  }

  async create(assetId: string, body: CreateWellDto, user: AuthUser): Promise<WellRowDto> {
    const name = body.name.trim();
    if (await this.wells.findByName(assetId, name)) throw new ConflictException(`A well named "${name}" already exists in this asset.`);
    const well = await this.wells.insert({
      assetId,
      name,
      uwi: body.uwi?.trim() ?? '',
      kbElevation: body.kbElevation ?? null,
      groundElevation: body.groundElevation ?? null,
    });
    await this.audit.record({ assetId, userId: user.id, action: 'create', entity: 'well', entityId: well.id, after: { name: well.name, uwi: well.uwi } });
    return toWellRowDto(well, []);
  }

  /** Changes the well's identity, location, elevations or depth reference; audited with before and after. */
  async update(assetId: string, wellId: string, body: UpdateWellDto, user: Pick<AuthUser, 'id'>): Promise<WellRowDto> {
    const well = await this.require(assetId, wellId);
    const name = body.name?.trim();
    if (name !== undefined && name !== well.name && (await this.wells.findByName(assetId, name))) throw new ConflictException(`A well named "${name}" already exists in this asset.`);
    const patch = Object.fromEntries(
      Object.entries({ ...body, name, uwi: body.uwi?.trim() }).filter(([, v]) => v !== undefined),
    ) as Partial<Well>;
    const fields = Object.keys(patch) as (keyof Well)[];
    const pick = (w: Well) => Object.fromEntries(fields.map((f) => [f, w[f]]));
    const row = await this.wells.update(well.id, patch, (after) => ({ assetId, userId: user.id, action: 'update', entity: 'well', entityId: well.id, before: pick(well), after: pick(after) }));
    const runs = await this.wells.logRunsOf([well.id]);
    return toWellRowDto(row, runs.map(toLogRunDto));
  }

  /** The well, if it belongs to the asset; 404 otherwise (no reading across assets). */
  async require(assetId: string, wellId: string): Promise<Well> {
    const well = /^[0-9a-f-]{36}$/i.test(wellId) ? await this.wells.findInAsset(assetId, wellId) : undefined;
    if (!well) throw new NotFoundException('No such well in this asset.');
    return well;
  }
}
