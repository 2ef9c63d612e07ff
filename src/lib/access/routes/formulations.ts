/** Routes of the formulations feature (owned by that feature; merged in ../route-table.ts). */
import type { RouteTable } from './shared';

export const FORMULATIONS_ROUTES: RouteTable = {};
