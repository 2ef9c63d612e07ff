/** Routes of the quality feature (owned by that feature; merged in ../route-table.ts). */
import type { RouteTable } from './shared';

export const QUALITY_ROUTES: RouteTable = {};
