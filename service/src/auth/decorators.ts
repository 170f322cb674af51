import { createParamDecorator, SetMetadata, type ExecutionContext } from '@nestjs/common';
import type { MemberRole } from '@poreline/schema';
import type { AssetAccess, AuthedRequest, AuthUser } from './auth-user.js';

export const IS_PUBLIC = 'poreline:isPublic';
export const REQUIRED_ROLES = 'poreline:roles';

/** The route needs no token (login, health, first-admin setup). */
export const Public = () => SetMetadata(IS_PUBLIC, true);

/**
 * Roles allowed on an asset route (`:assetId` in the path). Without it any member may call.
 * On routes without an asset, `Roles('admin')` means a global admin.
 */
export const Roles = (...roles: MemberRole[]) => SetMetadata(REQUIRED_ROLES, roles);

export const CurrentUser = createParamDecorator((_: unknown, ctx: ExecutionContext): AuthUser => {
  return ctx.switchToHttp().getRequest<AuthedRequest>().user!;
});

export const CurrentAccess = createParamDecorator((_: unknown, ctx: ExecutionContext): AssetAccess => {
  return ctx.switchToHttp().getRequest<AuthedRequest>().assetAccess!;
});
