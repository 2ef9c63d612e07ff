/** Server-side filtered, sorted and paged lists of formulations and revisions. */
import { z } from 'zod';
import type { Knex } from 'knex';
import { db } from '../db/index';
import { REVISION_STATES, type RevisionState } from '../../formulations/workflow-rules';
import type { RevisionRecord } from './records';

const paging = {
  page: z.coerce.number().int().min(1, 'page: 1 or more').default(1),
  pageSize: z.coerce.number().int().min(1).max(100, 'pageSize: at most 100').default(20),
  dir: z.enum(['asc', 'desc'], 'dir: asc or desc').default('asc')
};

export const FORMULATION_STATUS = ['any', 'current', 'in-review', 'draft', 'no-approved'] as const;

export const formulationListSchema = z.object({
  q: z.string().trim().max(100).default(''),
  status: z.enum(FORMULATION_STATUS, `status: one of ${FORMULATION_STATUS.join(', ')}`).default('any'),
  sort: z.enum(['code', 'name', 'updated', 'created'], 'sort: code, name, updated or created').default('code'),
  ...paging
});

export const revisionListSchema = z.object({
  q: z.string().trim().max(100).default(''),
  state: z.enum(['any', ...REVISION_STATES], `state: any or one of ${REVISION_STATES.join(', ')}`).default('any'),
  formulationId: z.coerce.number().int().positive().optional(),
  author: z.coerce.number().int().positive().optional(),
  sort: z
    .enum(['updated', 'created', 'submitted', 'code', 'revision', 'state'], 'sort: updated, created, submitted, code, revision or state')
    .default('updated'),
  ...paging,
  dir: z.enum(['asc', 'desc'], 'dir: asc or desc').default('desc')
});

export type FormulationListQuery = z.infer<typeof formulationListSchema>;
export type RevisionListQuery = z.infer<typeof revisionListSchema>;

export interface Page<T> {
  rows: T[];
  total: number;
  page: number;
  pageSize: number;
  pages: number;
}

/** Query-string parameters → list query; unknown or bad values fall back to the defaults for pages. */
export function parseListQuery<S extends z.ZodType>(schema: S, params: URLSearchParams): { query: z.infer<S>; error: string | null } {
  const raw = Object.fromEntries([...params.entries()].filter(([, v]) => v !== ''));
  const parsed = schema.safeParse(raw);
  if (parsed.success) return { query: parsed.data, error: null };
  return { query: schema.parse({}), error: parsed.error.issues.map((i) => i.message).join('; ') };
}

const num = (v: unknown): number | null => (v === null || v === undefined || v === 'null' ? null : Number(v));
const metric = (col: string, key: string) => db().raw(`JSON_VALUE(${col}, '$.${key}') as ${key}`);
const likeEscaped = (q: string) => `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;

async function paged<T>(
  query: Knex.QueryBuilder,
  count: Knex.QueryBuilder,
  page: number,
  pageSize: number,
  map: (r: Record<string, unknown>) => T
): Promise<Page<T>> {
  const [{ n }] = await count.count({ n: '*' });
  const total = Number(n);
  const rows = await query.limit(pageSize).offset((page - 1) * pageSize);
  return { rows: rows.map(map), total, page, pageSize, pages: Math.max(1, Math.ceil(total / pageSize)) };
}

export interface FormulationListRow {
  id: number;
  code: string;
  name: string;
  updatedAt: Date;
  currentRevisionId: number | null;
  currentRevisionNo: number | null;
  cct: number | null;
  ra: number | null;
  r9: number | null;
  latestRevisionNo: number | null;
  inReview: number;
  drafts: number;
}

export async function listFormulations(q: FormulationListQuery): Promise<Page<FormulationListRow>> {
  const count = (state: RevisionState) =>
    db().raw(
      `(SELECT COUNT(*) FROM formulation_revisions x WHERE x.formulation_id = f.id AND ` +
        `x.state = '${state}') as ${state === 'submitted' ? 'in_review' : 'drafts'}`
    );
  const base = db()('formulations as f').leftJoin('formulation_revisions as cur', (j) =>
    j.on('cur.formulation_id', 'f.id').andOnVal('cur.state', 'approved')
  );
  if (q.q) base.where((w) => w.where('f.code', 'like', likeEscaped(q.q)).orWhere('f.name', 'like', likeEscaped(q.q)));
  const has = (state: RevisionState) =>
    db()('formulation_revisions as x').whereRaw('x.formulation_id = f.id').where('x.state', state).select(db().raw('1'));
  if (q.status === 'current') base.whereNotNull('cur.id');
  if (q.status === 'no-approved') base.whereNull('cur.id');
  if (q.status === 'in-review') base.whereExists(has('submitted'));
  if (q.status === 'draft') base.whereExists(has('draft'));
  const sortCol = { code: 'f.code', name: 'f.name', updated: 'f.updated_at', created: 'f.created_at' }[q.sort];
  const rows = base
    .clone()
    .select(
      'f.id',
      'f.code',
      'f.name',
      'f.updated_at',
      'cur.id as current_id',
      'cur.revision_no as current_no',
      metric('cur.predicted_json', 'cct'),
      metric('cur.predicted_json', 'ra'),
      metric('cur.predicted_json', 'r9'),
      db().raw('(SELECT MAX(x.revision_no) FROM formulation_revisions x WHERE x.formulation_id = f.id) as latest_no'),
      count('submitted'),
      count('draft')
    )
    .orderBy([
      { column: sortCol, order: q.dir },
      { column: 'f.id', order: q.dir }
    ]);
  return paged(rows, base.clone(), q.page, q.pageSize, (r) => ({
    id: Number(r.id),
    code: String(r.code),
    name: String(r.name),
    updatedAt: r.updated_at as Date,
    currentRevisionId: num(r.current_id),
    currentRevisionNo: num(r.current_no),
    cct: num(r.cct),
    ra: num(r.ra),
    r9: num(r.r9),
    latestRevisionNo: num(r.latest_no),
    inReview: Number(r.in_review),
    drafts: Number(r.drafts)
  }));
}

export type RevisionListRow = Pick<
  RevisionRecord,
  | 'id'
  | 'formulationId'
  | 'formulationCode'
  | 'formulationName'
  | 'revisionNo'
  | 'state'
  | 'version'
  | 'createdBy'
  | 'createdByName'
  | 'createdAt'
  | 'updatedAt'
  | 'submittedAt'
  | 'decidedAt'
> & {
  cct: number | null;
  duv: number | null;
  ra: number | null;
  r9: number | null;
  sdcm: number | null;
};

export async function listRevisions(q: RevisionListQuery): Promise<Page<RevisionListRow>> {
  const base = db()('formulation_revisions as r')
    .join('formulations as f', 'f.id', 'r.formulation_id')
    .leftJoin('users as u', 'u.id', 'r.created_by');
  if (q.q) base.where((w) => w.where('f.code', 'like', likeEscaped(q.q)).orWhere('f.name', 'like', likeEscaped(q.q)));
  if (q.state !== 'any') base.where('r.state', q.state);
  if (q.formulationId) base.where('r.formulation_id', q.formulationId);
  if (q.author) base.where('r.created_by', q.author);
  const sortCol = {
    updated: 'r.updated_at',
    created: 'r.created_at',
    submitted: 'r.submitted_at',
    code: 'f.code',
    revision: 'r.revision_no',
    state: 'r.state'
  }[q.sort];
  const rows = base
    .clone()
    .select(
      'r.id',
      'r.formulation_id',
      'f.code',
      'f.name',
      'r.revision_no',
      'r.state',
      'r.version',
      'r.created_by',
      'u.name as author',
      'r.created_at',
      'r.updated_at',
      'r.submitted_at',
      'r.decided_at',
      metric('r.predicted_json', 'cct'),
      metric('r.predicted_json', 'duv'),
      metric('r.predicted_json', 'ra'),
      metric('r.predicted_json', 'r9'),
      metric('r.predicted_json', 'sdcm')
    )
    .orderBy([
      { column: sortCol, order: q.dir },
      { column: 'r.id', order: q.dir }
    ]);
  return paged(rows, base.clone(), q.page, q.pageSize, (r) => ({
    id: Number(r.id),
    formulationId: Number(r.formulation_id),
    formulationCode: String(r.code),
    formulationName: String(r.name),
    revisionNo: Number(r.revision_no),
    state: r.state as RevisionState,
    version: Number(r.version),
    createdBy: Number(r.created_by),
    createdByName: String(r.author ?? ''),
    createdAt: r.created_at as Date,
    updatedAt: r.updated_at as Date,
    submittedAt: (r.submitted_at as Date | null) ?? null,
    decidedAt: (r.decided_at as Date | null) ?? null,
    cct: num(r.cct),
    duv: num(r.duv),
    ra: num(r.ra),
    r9: num(r.r9),
    sdcm: num(r.sdcm)
  }));
}
