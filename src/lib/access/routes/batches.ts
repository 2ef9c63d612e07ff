/** Routes of the batches feature (owned by that feature; merged in ../route-table.ts). */
import type { RouteTable } from './shared';

export const BATCHES_ROUTES: RouteTable = {};
