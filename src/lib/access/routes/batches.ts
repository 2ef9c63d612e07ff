/** Routes of the batches feature (owned by that feature; merged in ../route-table.ts). */
import { ALL, type RouteTable } from './shared';
import { mayAcceptDeviation, mayPlanBatch, mayWeigh } from '../policies';

const LINE_OR_QUALITY = [...new Set([...mayWeigh.roles, ...mayAcceptDeviation.roles])];

export const BATCHES_ROUTES: RouteTable = {
  '/(app)/batches': { sample: '/batches', methods: { GET: ALL }, nav: { label: 'Weigh-out', order: 40 } },
  '/(app)/batches/new': { sample: '/batches/new', methods: { GET: mayPlanBatch.roles, POST: mayPlanBatch.roles } },
  '/(app)/batches/trace': { sample: '/batches/trace', methods: { GET: ALL } },
  // Form actions: record/mix/complete/scale (line), acceptDeviation (quality); each action checks its own role.
  '/(app)/batches/[id]': { sample: '/batches/999999', methods: { GET: ALL, POST: LINE_OR_QUALITY } },
  '/api/v1/batches': { sample: '/api/v1/batches', methods: { GET: ALL, POST: mayPlanBatch.roles } },
  '/api/v1/batches/preview': { sample: '/api/v1/batches/preview', methods: { POST: ALL } },
  '/api/v1/batches/[id]': { sample: '/api/v1/batches/999999', methods: { GET: ALL } },
  '/api/v1/batches/[id]/lines/[seq]': { sample: '/api/v1/batches/999999/lines/1', methods: { POST: mayWeigh.roles } },
  '/api/v1/batches/[id]/lines/[seq]/override': {
    sample: '/api/v1/batches/999999/lines/1/override',
    methods: { POST: mayAcceptDeviation.roles }
  },
  '/api/v1/batches/[id]/mix': { sample: '/api/v1/batches/999999/mix', methods: { POST: mayWeigh.roles } },
  '/api/v1/batches/[id]/scale': { sample: '/api/v1/batches/999999/scale', methods: { POST: mayWeigh.roles } },
  '/api/v1/batches/[id]/complete': { sample: '/api/v1/batches/999999/complete', methods: { POST: mayWeigh.roles } },
  '/api/v1/batches/[id]/ticket': { sample: '/api/v1/batches/999999/ticket', methods: { GET: ALL } },
  '/api/v1/batches/[id]/record': { sample: '/api/v1/batches/999999/record', methods: { GET: ALL } }
};
