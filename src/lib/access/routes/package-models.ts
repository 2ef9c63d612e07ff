/** Routes of the package-models feature (owned by that feature; merged in ../route-table.ts). */
import { ALL, type RouteTable } from './shared';
import { mayEditLibrary } from '../policies';

export const PACKAGE_MODELS_ROUTES: RouteTable = {
  '/(app)/library/packages': { sample: '/library/packages', methods: { GET: ALL, POST: mayEditLibrary.roles } },
  '/(app)/library/packages/[id]': { sample: '/library/packages/999999', methods: { GET: ALL } },
  '/api/v1/package-models': { sample: '/api/v1/package-models', methods: { GET: ALL, POST: mayEditLibrary.roles } },
  '/api/v1/package-models/[id]': { sample: '/api/v1/package-models/999999', methods: { GET: ALL } }
};
