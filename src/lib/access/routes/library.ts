/** Routes of the materials feature (owned by that feature; merged in ../route-table.ts). */
import { ALL, type RouteTable } from './shared';
import { mayEditLibrary } from '../policies';

export const LIBRARY_ROUTES: RouteTable = {
  '/(app)/library': { sample: '/library', methods: { GET: ALL }, nav: { label: 'Library', order: 10 } },
  '/(app)/library/new': { sample: '/library/new?kind=phosphor', methods: { GET: mayEditLibrary.roles, POST: mayEditLibrary.roles } },
  '/(app)/library/[id]': { sample: '/library/1', methods: { GET: ALL, POST: mayEditLibrary.roles } },
  '/(app)/library/[id]/edit': { sample: '/library/1/edit', methods: { GET: mayEditLibrary.roles, POST: mayEditLibrary.roles } },
  '/(app)/library/[id]/spectrum': { sample: '/library/1/spectrum', methods: { GET: mayEditLibrary.roles, POST: mayEditLibrary.roles } },
  '/(app)/library/[id]/files/[fileId]': { sample: '/library/1/files/999999', methods: { GET: ALL } },
  '/api/v1/phosphors': { sample: '/api/v1/phosphors', methods: { GET: ALL, POST: mayEditLibrary.roles } },
  '/api/v1/phosphors/[id]': {
    sample: '/api/v1/phosphors/999999',
    methods: { GET: ALL, PUT: mayEditLibrary.roles, DELETE: mayEditLibrary.roles }
  },
  '/api/v1/phosphors/[id]/spectrum': { sample: '/api/v1/phosphors/999999/spectrum', methods: { POST: mayEditLibrary.roles } },
  '/api/v1/phosphors/[id]/spectrum/tm27': { sample: '/api/v1/phosphors/999999/spectrum/tm27', methods: { GET: ALL } },
  '/api/v1/phosphors/[id]/thermal': {
    sample: '/api/v1/phosphors/999999/thermal',
    methods: { GET: ALL, PUT: mayEditLibrary.roles, POST: mayEditLibrary.roles }
  },
  '/api/v1/pumps': { sample: '/api/v1/pumps', methods: { GET: ALL, POST: mayEditLibrary.roles } },
  '/api/v1/pumps/[id]': { sample: '/api/v1/pumps/999999', methods: { GET: ALL, PUT: mayEditLibrary.roles, DELETE: mayEditLibrary.roles } },
  '/api/v1/pumps/[id]/spectrum': { sample: '/api/v1/pumps/999999/spectrum', methods: { POST: mayEditLibrary.roles } },
  '/api/v1/pumps/[id]/spectrum/tm27': { sample: '/api/v1/pumps/999999/spectrum/tm27', methods: { GET: ALL } },
  '/api/v1/pumps/[id]/bins': { sample: '/api/v1/pumps/999999/bins', methods: { GET: ALL, PUT: mayEditLibrary.roles } },
  '/api/v1/pumps/[id]/thermal': {
    sample: '/api/v1/pumps/999999/thermal',
    methods: { GET: ALL, PUT: mayEditLibrary.roles, POST: mayEditLibrary.roles }
  }
};
