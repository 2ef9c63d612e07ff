/** Routes of the materials feature (owned by that feature; merged in ../route-table.ts). */
import type { RouteTable } from './shared';

export const MATERIALS_ROUTES: RouteTable = {};
