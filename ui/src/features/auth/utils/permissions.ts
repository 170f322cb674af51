import type { Me, Role } from '../../../types/api';

/** Roles that may load LAS files and create wells in an asset. */
const EDITING_ROLES: readonly Role[] = ['admin', 'petrophysicist'];

/** The user's role in an asset: 'admin' for a global admin, else the membership role, else null. */
export function roleInAsset(me: Me, assetId: string): Role | null {
  if (me.isAdmin) return 'admin';
  return me.memberships.find((m) => m.assetId === assetId)?.role ?? null;
}

/** Whether the user may create wells and load LAS files in the asset (petrophysicist or admin). */
export function canEditWells(me: Me, assetId: string): boolean {
  const role = roleInAsset(me, assetId);
  return role !== null && EDITING_ROLES.includes(role);
}

/** A short label of the user's standing: the role in the current asset, or every distinct role held. */
export function roleLabel(me: Me, assetId?: string): string {
  if (me.isAdmin) return 'admin';
  if (assetId) return roleInAsset(me, assetId) ?? 'no access';
  const roles = [...new Set(me.memberships.map((m) => m.role))];
  return roles.length ? roles.join(' · ') : 'no assets yet';
}
