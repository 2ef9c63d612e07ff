/** Routes of the designer feature (owned by that feature; merged in ../route-table.ts). */
import { ALL, type RouteTable } from './shared';
import { mayDesign } from '../policies';

export const DESIGNER_ROUTES: RouteTable = {
  '/(app)/designer': {
    sample: '/designer',
    methods: { GET: mayDesign.roles, POST: mayDesign.roles },
    nav: { label: 'Designer', order: 20 }
  },
  // Library spectra as blend components; any role may read the library.
  '/api/v1/blend-components': { sample: '/api/v1/blend-components', methods: { GET: ALL } }
};
