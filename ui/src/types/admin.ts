import type { Membership, Role } from './api';

/** GET /api/setup: whether the installation still needs its first admin (DEMO_MODE=false, no users). */
export interface SetupStatus {
  needsFirstAdmin: boolean;
}

/** An account of the admin's organisation (GET /api/users). */
export interface UserAccount {
  id: string;
  email: string;
  name: string;
  /** Global admin: sees every asset of the organisation as admin. */
  isAdmin: boolean;
  createdAt: string;
  /** Explicit asset memberships with the role held. */
  memberships: Membership[];
}

/** A member of an asset (GET /api/assets/:assetId/members). */
export interface AssetMember {
  userId: string;
  name: string;
  email: string;
  role: Role;
  isAdmin: boolean;
}

/** The five roles in the order the design lists them. */
export const ROLES: readonly Role[] = ['admin', 'petrophysicist', 'engineer', 'reviewer', 'viewer'];
