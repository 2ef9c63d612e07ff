/** Who acts on a batch's measurements, and the role rule: quality (and admins) act, everyone reads. */
import type { Role } from '../../access/roles';
import { QUALITY } from '../../access/routes/shared';
import { forbidden } from './errors';

export interface Caller {
  id: number;
  name: string;
  email: string;
  roles: readonly Role[];
}

export const QUALITY_ROLES = QUALITY;

export function canActOnMeasurements(caller: Pick<Caller, 'roles'>): boolean {
  return QUALITY_ROLES.some((r) => caller.roles.includes(r));
}

export function requireQuality(caller: Caller, what: string): void {
  if (!canActOnMeasurements(caller)) throw forbidden(`${what} needs one of the roles: ${QUALITY_ROLES.join(', ')}.`);
}
