/** Routes of the designer feature (owned by that feature; merged in ../route-table.ts). */
import type { RouteTable } from './shared';

export const DESIGNER_ROUTES: RouteTable = {};
