/** Routes of the quality feature (owned by that feature; merged in ../route-table.ts). */
import { ALL, type RouteTable } from './shared';
import { mayJudgeBatches } from '../policies';

// Samples with an id point at a batch that does not exist: allowed callers get 404/400, nothing demo-seeded changes.
const B = '999999';

export const MEASUREMENTS_ROUTES: RouteTable = {
  '/(app)/measurements': { sample: '/measurements', methods: { GET: mayJudgeBatches.roles }, nav: { label: 'Measurements', order: 60 } },
  '/(app)/measurements/[batchId]': { sample: `/measurements/${B}`, methods: { GET: ALL, POST: mayJudgeBatches.roles } },
  '/(app)/measurements/[batchId]/parts.csv': { sample: `/measurements/${B}/parts.csv`, methods: { GET: ALL } },
  '/(app)/measurements/[batchId]/files/[fileId]': { sample: `/measurements/${B}/files/${B}`, methods: { GET: ALL } },
  '/(app)/measurements/tester-profiles': { sample: '/measurements/tester-profiles', methods: { GET: ALL, POST: mayJudgeBatches.roles } },
  '/api/v1/tester-profiles': { sample: '/api/v1/tester-profiles', methods: { GET: ALL, POST: mayJudgeBatches.roles } },
  '/api/v1/tester-profiles/[id]': { sample: `/api/v1/tester-profiles/${B}`, methods: { GET: ALL, PUT: mayJudgeBatches.roles } },
  '/api/v1/measurements/[batchId]': { sample: `/api/v1/measurements/${B}`, methods: { GET: ALL, POST: mayJudgeBatches.roles } },
  '/api/v1/measurements/[batchId]/acceptance': { sample: `/api/v1/measurements/${B}/acceptance`, methods: { PUT: mayJudgeBatches.roles } },
  '/api/v1/measurements/[batchId]/spread-fit': { sample: `/api/v1/measurements/${B}/spread-fit`, methods: { POST: mayJudgeBatches.roles } },
  '/api/v1/measurements/[batchId]/correction': { sample: `/api/v1/measurements/${B}/correction`, methods: { POST: mayJudgeBatches.roles } },
  '/api/v1/measurements/[batchId]/disposition': {
    sample: `/api/v1/measurements/${B}/disposition`,
    methods: { POST: mayJudgeBatches.roles }
  },
  '/api/v1/measurements/[batchId]/uploads/[uploadId]/tm27': {
    sample: `/api/v1/measurements/${B}/uploads/${B}/tm27`,
    methods: { GET: ALL }
  },
  '/api/v1/measurements/[batchId]/uploads/[uploadId]/withdraw': {
    sample: `/api/v1/measurements/${B}/uploads/${B}/withdraw`,
    methods: { POST: mayJudgeBatches.roles }
  }
};
