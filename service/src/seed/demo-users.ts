import type { MemberRole } from '@poreline/schema';

/**
 * Demo accounts, one per role (listed in README). Only created in demo mode (DEMO_MODE unset
 * or true); a real deployment sets DEMO_MODE=false and creates its first admin at /setup.
 */
export const DEMO_USERS: { email: string; name: string; password: string; role: MemberRole; isAdmin: boolean }[] = [
  { email: 'admin@poreline.demo', name: 'Ada Admin', password: 'admin-demo-2026', role: 'admin', isAdmin: true },
  { email: 'petro@poreline.demo', name: 'Pia Petro', password: 'petro-demo-2026', role: 'petrophysicist', isAdmin: false },
  { email: 'engineer@poreline.demo', name: 'Eli Engineer', password: 'engineer-demo-2026', role: 'engineer', isAdmin: false },
  { email: 'reviewer@poreline.demo', name: 'Rui Reviewer', password: 'reviewer-demo-2026', role: 'reviewer', isAdmin: false },
  { email: 'viewer@poreline.demo', name: 'Vic Viewer', password: 'viewer-demo-2026', role: 'viewer', isAdmin: false },
];

/** The invented demo organisation and asset. */
export const DEMO_ORGANISATION = 'Sablefin Energy (demo operator)';
export const DEMO_ASSET = {
  name: 'Wrenmoor Field',
  description: 'Invented demo field: a layered sand-shale reservoir with a gas cap over an oil leg. Not a real place or company.',
};
