import { Injectable, NotFoundException } from '@nestjs/common';
import type { MemberRole } from '@poreline/schema';
import type { AuthUser } from '../auth/auth-user.js';
import { UsersRepository } from '../auth/users.repository.js';
import { AssetsRepository } from './assets.repository.js';
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
}
