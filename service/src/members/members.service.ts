import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import type { AuthUser } from '../auth/auth-user.js';
import { isUuid } from '../common/ids.js';
import type { MemberDto, PutMemberDto } from './dto/member.dto.js';
import { MembersRepository } from './members.repository.js';

@Injectable()
export class MembersService {
  constructor(private readonly members: MembersRepository) {}

  list(assetId: string): Promise<MemberDto[]> {
    return this.members.list(assetId);
  }

  /** Gives a user of the organisation a role in the asset (adds them, or changes their role). */
  async put(assetId: string, body: PutMemberDto, user: Pick<AuthUser, 'id'>): Promise<MemberDto[]> {
    const target = await this.members.userInAssetOrganisation(assetId, body.email);
    if (!target) throw new NotFoundException(`No user with the e-mail ${body.email} in this organisation; they need an account first.`);
    const before = await this.members.roleOf(assetId, target.id);
    if (before === body.role) return this.list(assetId);
    await this.refuseLastAdmin(assetId, target.id, body.role);
    await this.members.upsert(assetId, target.id, body.role, {
      assetId,
      userId: user.id,
      action: before ? 'update' : 'create',
      entity: 'asset_member',
      entityId: target.id,
      before: before ? { email: target.email, role: before } : null,
      after: { email: target.email, role: body.role },
    });
    return this.list(assetId);
  }

  async remove(assetId: string, userId: string, user: Pick<AuthUser, 'id'>): Promise<MemberDto[]> {
    const role = isUuid(userId) ? await this.members.roleOf(assetId, userId) : undefined;
    if (!role) throw new NotFoundException('No such member of this asset.');
    await this.refuseLastAdmin(assetId, userId, null);
    const member = (await this.list(assetId)).find((m) => m.userId === userId)!;
    await this.members.remove(assetId, userId, { assetId, userId: user.id, action: 'delete', entity: 'asset_member', entityId: userId, before: { email: member.email, role }, after: null });
    return this.list(assetId);
  }

  /** An asset keeps at least one member with the admin role. */
  private async refuseLastAdmin(assetId: string, userId: string, newRole: string | null): Promise<void> {
    if (newRole === 'admin') return;
    const admins = (await this.list(assetId)).filter((m) => m.role === 'admin');
    if (admins.length === 1 && admins[0].userId === userId) throw new ConflictException('This is the last admin of the asset; give another member the admin role first.');
  }
}
