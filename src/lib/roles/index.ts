/** The four roles of Phosforge. A user may hold several. */
export const ROLES = ['formulator', 'technician', 'quality', 'admin'] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  formulator: 'Formulator',
  technician: 'Line technician',
  quality: 'Quality',
  admin: 'Administrator'
};

export function isRole(value: string): value is Role {
  return (ROLES as readonly string[]).includes(value);
}

/** Role groups the policies (./policies.ts) and the route tables are built from. */
export const ALL: readonly Role[] = ['formulator', 'technician', 'quality', 'admin'];
export const ADMIN: readonly Role[] = ['admin'];
export const FORMULATION_EDITORS: readonly Role[] = ['formulator', 'admin'];
export const LINE: readonly Role[] = ['technician', 'admin'];
export const QUALITY: readonly Role[] = ['quality', 'admin'];
/** Who may act on a revision: authors (formulators; quality for correction drafts), quality and admins. */
export const REVISION_ACTORS: readonly Role[] = ['formulator', 'quality', 'admin'];
