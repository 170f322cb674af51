import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import type { Asset, MemberRole } from '@poreline/schema';
import type { AuthUser } from '../auth/auth-user.js';
import { UsersRepository } from '../auth/users.repository.js';
import { AssetsRepository } from './assets.repository.js';
import type { CreateAssetDto, UpdateAssetDto } from './dto/asset-input.dto.js';
import type { AssetDto } from './dto/asset.dto.js';

@Injectable()
export class AssetsService {
  constructor(
    private readonly assets: AssetsRepository,
    private readonly users: UsersRepository,
  ) {}

  async list(user: AuthUser): Promise<AssetDto[]> {
    const memberships = await this.users.memberships(user);
    const rows = await Promise.all(memberships.map((m) => this.assets.findById(m.assetId)));
    return memberships.map((m, i) => ({ id: m.assetId, name: m.assetName, description: rows[i]?.description ?? '', role: m.role, isDemo: rows[i]?.isDemo ?? false }));
  }

  /** Access was checked by AssetAccessGuard; `role` is the caller's. */
  async get(assetId: string, role: MemberRole): Promise<AssetDto> {
    const asset = await this.assets.findById(assetId);
    if (!asset) throw new NotFoundException('No such asset.');
    return { id: asset.id, name: asset.name, description: asset.description, role, isDemo: asset.isDemo };
  }

  /** A new asset of the caller's organisation (global admin, checked by the guard); the caller becomes its admin member. Audited. */
  async create(body: CreateAssetDto, user: AuthUser): Promise<AssetDto> {
    const name = body.name.trim();
    if (await this.assets.findByName(user.organisationId, name)) throw new ConflictException(`name: an asset named "${name}" already exists in your organisation.`);
    const asset = await this.assets.insertWithAdmin({ organisationId: user.organisationId, name, description: body.description?.trim() ?? '' }, user.id, (row) => ({
      assetId: row.id,
      userId: user.id,
      action: 'create',
      entity: 'asset',
      entityId: row.id,
      after: { name: row.name, description: row.description },
    }));
    return toAssetDto(asset, 'admin');
  }

  /** Renames or re-describes the asset (asset admin, checked by the guard). Audited with before and after. */
  async update(assetId: string, body: UpdateAssetDto, user: Pick<AuthUser, 'id'>, role: MemberRole): Promise<AssetDto> {
    const asset = await this.assets.findById(assetId);
    if (!asset) throw new NotFoundException('No such asset.');
    const patch: Pick<Partial<Asset>, 'name' | 'description'> = {};
    if (body.name !== undefined) patch.name = body.name.trim();
    if (body.description !== undefined) patch.description = body.description.trim();
    if (patch.name !== undefined && (await this.assets.findByName(asset.organisationId, patch.name, asset.id))) {
      throw new ConflictException(`name: an asset named "${patch.name}" already exists in your organisation.`);
    }
    const fields = (Object.keys(patch) as (keyof typeof patch)[]).filter((f) => patch[f] !== asset[f]);
    if (!fields.length) return toAssetDto(asset, role);
    const pick = (a: Asset) => Object.fromEntries(fields.map((f) => [f, a[f]]));
    const row = await this.assets.update(asset.id, patch, (after) => ({ assetId, userId: user.id, action: 'update', entity: 'asset', entityId: assetId, before: pick(asset), after: pick(after) }));
    return toAssetDto(row, role);
  }
}

function toAssetDto(asset: Asset, role: MemberRole): AssetDto {
  return { id: asset.id, name: asset.name, description: asset.description, role, isDemo: asset.isDemo };
}
