import { ForbiddenException, Injectable, NotFoundException, type CanActivate, type ExecutionContext } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import type { MemberRole } from '@poreline/schema';
import { AssetsRepository } from '../assets/assets.repository.js';
import type { AuthedRequest } from './auth-user.js';
import { IS_PUBLIC, REQUIRED_ROLES } from './decorators.js';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/**
 * Global guard after JwtAuthGuard. On routes with `:assetId` it looks up the caller's role in
 * that asset: not a member -> 404 (the asset's existence is not revealed); a role outside
 * @Roles(...) -> 403. On other routes, @Roles('admin') requires a global admin.
 */
@Injectable()
export class AssetAccessGuard implements CanActivate {
  constructor(
    private readonly reflector: Reflector,
    private readonly assets: AssetsRepository,
  ) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    if (this.reflector.getAllAndOverride<boolean>(IS_PUBLIC, [context.getHandler(), context.getClass()])) return true;
    const req = context.switchToHttp().getRequest<AuthedRequest>();
    const user = req.user;
    if (!user) return false;
    const roles = this.reflector.getAllAndOverride<MemberRole[] | undefined>(REQUIRED_ROLES, [context.getHandler(), context.getClass()]);
    const assetId = req.params?.assetId;
    if (assetId === undefined) {
      if (roles?.length && !(roles.includes('admin') && user.isAdmin)) {
        throw new ForbiddenException(`This needs one of the roles: ${roles.join(', ')}.`);
      }
      return true;
    }
    if (!UUID.test(assetId)) throw new NotFoundException('No such asset.');
    const role = await this.assets.roleOf(user, assetId);
    if (!role) throw new NotFoundException('No such asset.');
    if (roles?.length && !roles.includes(role)) {
      throw new ForbiddenException(`Your role in this asset (${role}) cannot do this; it needs one of: ${roles.join(', ')}.`);
    }
    req.assetAccess = { assetId, role };
    return true;
  }
}
