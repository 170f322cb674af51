import type { MemberRole } from '@poreline/schema';

/** The signed-in user, as the guards put it on the request. */
export interface AuthUser {
  id: string;
  email: string;
  name: string;
  organisationId: string;
  isAdmin: boolean;
}

/** What the asset guard adds for routes under /assets/:assetId. */
export interface AssetAccess {
  assetId: string;
  role: MemberRole;
}

export interface AuthedRequest {
  user?: AuthUser;
  assetAccess?: AssetAccess;
  params: Record<string, string>;
  headers: Record<string, string | string[] | undefined>;
}

export const ROLES = ['admin', 'petrophysicist', 'engineer', 'reviewer', 'viewer'] as const satisfies readonly MemberRole[];
