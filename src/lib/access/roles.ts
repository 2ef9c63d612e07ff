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
