/** Who acts on a batch's measurements, and the role rule: quality (and admins) act, everyone reads. */
import type { Role } from '../../roles';
import { mayJudgeBatches } from '../../access/policies';
import { forbidden } from './errors';

export interface Caller {
  id: number;
  name: string;
  email: string;
  roles: readonly Role[];
}

export const QUALITY_ROLES = mayJudgeBatches.roles;

export function canActOnMeasurements(caller: Pick<Caller, 'roles'>): boolean {
  return mayJudgeBatches(caller);
}

export function requireQuality(caller: Caller, what: string): void {
  if (!canActOnMeasurements(caller)) throw forbidden(`${what} needs one of the roles: ${QUALITY_ROLES.join(', ')}.`);
}
