/** Routes of the formulations feature (owned by that feature; merged in ../route-table.ts). */
import { ALL, type RouteTable } from './shared';
import { mayActOnRevisions, mayApprove, mayAuthorFormulations, mayReadAudit, maySetVariationModel, maySignRevisions } from '../policies';

const AUTHORS = mayAuthorFormulations.roles;
const ACTORS = mayActOnRevisions.roles;
const API_REV = '/api/v1/formulations/999999/revisions/999999';

export const FORMULATIONS_ROUTES: RouteTable = {
  '/(app)/formulations': { sample: '/formulations', methods: { GET: ALL }, nav: { label: 'Formulations', order: 30 } },
  '/(app)/formulations/new': { sample: '/formulations/new', methods: { GET: AUTHORS, POST: AUTHORS } },
  '/(app)/formulations/revisions': { sample: '/formulations/revisions', methods: { GET: ALL } },
  '/(app)/formulations/compare': { sample: '/formulations/compare', methods: { GET: ALL } },
  '/(app)/formulations/[id]': { sample: '/formulations/1', methods: { GET: ALL } },
  '/(app)/formulations/[id]/revisions/[revisionId]': {
    sample: '/formulations/999999/revisions/999999',
    methods: { GET: ALL, POST: ACTORS }
  },
  '/(app)/formulations/[id]/revisions/[revisionId]/record': {
    sample: '/formulations/999999/revisions/999999/record',
    methods: { GET: ALL }
  },
  '/(app)/formulations/[id]/revisions/[revisionId]/attachments/[attachmentId]': {
    sample: '/formulations/999999/revisions/999999/attachments/999999',
    methods: { GET: ALL }
  },
  '/(app)/audit': { sample: '/audit', methods: { GET: mayReadAudit.roles }, nav: { label: 'Audit trail', order: 75 } },
  '/(app)/audit/export': { sample: '/audit/export', methods: { GET: mayReadAudit.roles } },
  '/api/v1/formulations': { sample: '/api/v1/formulations', methods: { GET: ALL, POST: AUTHORS } },
  '/api/v1/formulations/[id]': { sample: '/api/v1/formulations/1', methods: { GET: ALL } },
  '/api/v1/formulations/[id]/revisions': { sample: '/api/v1/formulations/999999/revisions', methods: { GET: ALL, POST: AUTHORS } },
  '/api/v1/formulations/[id]/revisions/[revisionId]': { sample: API_REV, methods: { GET: ALL, PUT: ACTORS } },
  '/api/v1/formulations/[id]/revisions/[revisionId]/spectrum/tm27': { sample: `${API_REV}/spectrum/tm27`, methods: { GET: ALL } },
  '/api/v1/formulations/[id]/revisions/[revisionId]/variation-model': {
    sample: `${API_REV}/variation-model`,
    methods: { GET: ALL, PUT: maySetVariationModel.roles }
  },
  '/api/v1/formulations/[id]/revisions/[revisionId]/submit': { sample: `${API_REV}/submit`, methods: { POST: ACTORS } },
  '/api/v1/formulations/[id]/revisions/[revisionId]/review': { sample: `${API_REV}/review`, methods: { POST: maySignRevisions.roles } },
  '/api/v1/formulations/[id]/revisions/[revisionId]/approve': { sample: `${API_REV}/approve`, methods: { POST: mayApprove.roles } },
  '/api/v1/formulations/[id]/revisions/[revisionId]/return': { sample: `${API_REV}/return`, methods: { POST: maySignRevisions.roles } },
  '/api/v1/formulations/[id]/revisions/[revisionId]/withdraw': { sample: `${API_REV}/withdraw`, methods: { POST: ACTORS } },
  '/api/v1/silicone-systems': { sample: '/api/v1/silicone-systems', methods: { GET: ALL } }
};
