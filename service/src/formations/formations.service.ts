import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import type { Formation } from '@poreline/schema';
import type { AuthUser } from '../auth/auth-user.js';
import { isUuid } from '../common/ids.js';
import { topsOrderProblem } from '../tops/tops-order.js';
import type { CreateFormationDto, FormationDto, UpdateFormationDto } from './dto/formation.dto.js';
import { nextPaletteColour } from './formation-palette.js';
import { formationAuditView, toFormationDto } from './formations.mapper.js';
import { FormationsRepository } from './formations.repository.js';

@Injectable()
export class FormationsService {
  constructor(private readonly formations: FormationsRepository) {}

  async list(assetId: string): Promise<FormationDto[]> {
    return (await this.formations.list(assetId)).map(toFormationDto);
  }

  async create(assetId: string, body: CreateFormationDto, user: Pick<AuthUser, 'id'>): Promise<FormationDto> {
    const name = body.name.trim();
    await this.refuseDuplicateName(assetId, name);
    const existing = await this.formations.list(assetId);
    const row = await this.formations.create(
      { assetId, name, colour: body.colour?.toLowerCase() ?? nextPaletteColour(existing.map((f) => f.colour)), lithology: body.lithology ?? 'sandstone' },
      body.ordinal,
      (created) => ({ assetId, userId: user.id, action: 'create', entity: 'formation', entityId: created.id, after: formationAuditView(created) }),
    );
    return toFormationDto(row);
  }

  async update(assetId: string, formationId: string, body: UpdateFormationDto, user: Pick<AuthUser, 'id'>): Promise<FormationDto> {
    const formation = await this.require(assetId, formationId);
    const name = body.name?.trim();
    if (name !== undefined && name.toLowerCase() !== formation.name.toLowerCase()) await this.refuseDuplicateName(assetId, name);
    if (body.ordinal !== undefined) await this.refuseOrderBreakingTops(assetId, formation, body.ordinal);
    const patch = { ...(name !== undefined && { name }), ...(body.colour && { colour: body.colour.toLowerCase() }), ...(body.lithology && { lithology: body.lithology }) };
    const row = await this.formations.update(formation, patch, body.ordinal, (updated) => ({
      assetId,
      userId: user.id,
      action: 'update',
      entity: 'formation',
      entityId: formation.id,
      before: formationAuditView(formation),
      after: formationAuditView(updated),
    }));
    return toFormationDto(row);
  }

  /** The formation, if it belongs to the asset; 404 otherwise. */
  async require(assetId: string, formationId: string): Promise<Formation> {
    const row = isUuid(formationId) ? await this.formations.find(assetId, formationId) : undefined;
    if (!row) throw new NotFoundException('No such formation in this asset.');
    return row;
  }

  private async refuseDuplicateName(assetId: string, name: string): Promise<void> {
    if (await this.formations.findByName(assetId, name)) throw new ConflictException(`A formation named "${name}" already exists in this asset.`);
  }

  /** Moving a formation must not put any well's tops out of depth order. */
  private async refuseOrderBreakingTops(assetId: string, formation: Formation, position: number): Promise<void> {
    const order = (await this.formations.list(assetId)).filter((f) => f.id !== formation.id);
    order.splice(Math.min(Math.max(position - 1, 0), order.length), 0, formation);
    const reordered = order.map((f, i) => ({ id: f.id, name: f.name, ordinal: i + 1 }));
    const tops = await this.formations.topsOfAsset(assetId);
    for (const wellId of new Set(tops.map((t) => t.wellId))) {
      const own = tops.filter((t) => t.wellId === wellId);
      const problem = topsOrderProblem(own, reordered);
      if (problem) throw new ConflictException(`Moving "${formation.name}" to position ${position} would break the tops of well ${own[0].wellName}: ${problem}. Fix the tops first.`);
    }
  }
}
