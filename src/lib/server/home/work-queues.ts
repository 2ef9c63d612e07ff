/** Fills the home page's work queues from the database: counts and the oldest items of each. */
import type { Knex } from 'knex';
import { db } from '../db/index';
import { QUEUE_PREVIEW, SLURRY_WARNING_MIN, queuesFor, type QueueKind, type QueueItem, type WorkQueue } from '../../home/work-queue';
import type { Role } from '../../roles';

interface QueueSource {
  title: string;
  href: string;
  empty: string;
  /** The rows of the queue (count and oldest come from the same query). */
  query: (k: Knex, userId: number) => Knex.QueryBuilder;
  since: string;
  item: (row: Record<string, unknown>, now: Date) => Omit<QueueItem, 'since'>;
}

const revisions = (k: Knex) => k('formulation_revisions as r').join('formulations as f', 'f.id', 'r.formulation_id');
const revisionItem = (row: Record<string, unknown>) => ({
  label: `${row.code} rev. ${row.revision_no} — ${row.name}`,
  href: `/formulations/${row.formulation_id}/revisions/${row.id}`
});
const REVISION_COLUMNS = ['r.id', 'r.formulation_id', 'r.revision_no', 'f.code', 'f.name'];

const SOURCES: Record<QueueKind, QueueSource> = {
  revisionsToReview: {
    title: 'Revisions waiting for review',
    href: '/formulations?status=in-review',
    empty: 'No revision is waiting for a signature.',
    query: (k) =>
      revisions(k)
        .where('r.state', 'submitted')
        .select(...REVISION_COLUMNS, 'r.submitted_at as since'),
    since: 'r.submitted_at',
    item: revisionItem
  },
  batchesToDecide: {
    title: 'Batches waiting for a decision',
    href: '/measurements',
    empty: 'No completed batch is waiting for release or rejection.',
    query: (k) => k('batches as b').where('b.state', 'complete').select('b.id', 'b.batch_number', 'b.completed_at as since'),
    since: 'b.completed_at',
    item: (row) => ({ label: String(row.batch_number), href: `/measurements/${row.id}` })
  },
  deviationsToAccept: {
    title: 'Deviations waiting for acceptance',
    href: '/batches?state=weighing',
    empty: 'No weighing outside its range is waiting for acceptance.',
    query: (k) =>
      k('batch_lines as l')
        .join('batches as b', 'b.id', 'l.batch_id')
        .where('b.state', 'weighing')
        .whereIn('l.actual_status', ['below', 'above'])
        .whereNull('l.override_by')
        .select('b.id', 'b.batch_number', 'l.seq', 'l.code', 'l.actual_status', 'l.weighed_at as since'),
    since: 'l.weighed_at',
    item: (row) => ({
      label: `${row.batch_number} line ${row.seq} (${row.code})`,
      href: `/batches/${row.id}`,
      note: `${row.actual_status} its range`
    })
  },
  batchesToWeigh: {
    title: 'Batches planned or being weighed',
    href: '/batches?state=planned',
    empty: 'No batch is planned or being weighed.',
    query: (k) =>
      k('batches as b').whereIn('b.state', ['planned', 'weighing']).select('b.id', 'b.batch_number', 'b.state', 'b.created_at as since'),
    since: 'b.created_at',
    item: (row) => ({
      label: String(row.batch_number),
      href: `/batches/${row.id}`,
      note: row.state === 'weighing' ? 'weighing' : 'planned'
    })
  },
  slurriesNearLimit: {
    title: `Slurries with under ${SLURRY_WARNING_MIN} min left`,
    href: '/batches?state=weighing',
    empty: 'No mixed slurry is near the end of its pot life.',
    query: (k) =>
      k('batches as b')
        .where('b.state', 'weighing')
        .whereNotNull('b.slurry_expires_at')
        .where('b.slurry_expires_at', '<', k.raw('UTC_TIMESTAMP() + INTERVAL ? MINUTE', [SLURRY_WARNING_MIN]))
        .select('b.id', 'b.batch_number', 'b.slurry_expires_at', 'b.mixed_at as since'),
    since: 'b.slurry_expires_at',
    item: (row, now) => {
      const left = Math.floor((new Date(row.slurry_expires_at as Date).getTime() - now.getTime()) / 60_000);
      return { label: String(row.batch_number), href: `/batches/${row.id}`, note: left > 0 ? `${left} min left` : 'past its limit' };
    }
  },
  drafts: {
    title: 'Your drafts',
    href: '/formulations?status=draft',
    empty: 'You have no open draft.',
    query: (k, userId) =>
      revisions(k)
        .where({ 'r.state': 'draft', 'r.created_by': userId })
        .whereNull('r.source_batch_id')
        .select(...REVISION_COLUMNS, 'r.updated_at as since'),
    since: 'r.updated_at',
    item: revisionItem
  },
  returnedRevisions: {
    title: 'Revisions returned to you',
    href: '/formulations',
    empty: 'No revision of yours has been returned.',
    query: (k, userId) =>
      revisions(k)
        .where({ 'r.state': 'returned', 'r.created_by': userId })
        .select(...REVISION_COLUMNS, 'r.return_reason', 'r.decided_at as since'),
    since: 'r.decided_at',
    item: (row) => ({ ...revisionItem(row), note: row.return_reason ? String(row.return_reason).slice(0, 80) : undefined })
  },
  correctionDrafts: {
    title: 'Correction drafts from quality',
    href: '/formulations?status=draft',
    empty: 'No correction draft is waiting.',
    query: (k) =>
      revisions(k)
        .where('r.state', 'draft')
        .whereNotNull('r.source_batch_id')
        .select(...REVISION_COLUMNS, 'r.created_at as since'),
    since: 'r.created_at',
    item: revisionItem
  }
};

async function fill(kind: QueueKind, userId: number, now: Date): Promise<WorkQueue> {
  const source = SOURCES[kind];
  const k = db();
  const [counted, rows] = await Promise.all([
    k.from(source.query(k, userId).as('q')).count({ n: '*' }),
    source.query(k, userId).orderBy(source.since, 'asc').limit(QUEUE_PREVIEW)
  ]);
  return {
    kind,
    title: source.title,
    href: source.href,
    empty: source.empty,
    count: Number(counted[0].n),
    oldest: (rows as Record<string, unknown>[]).map((row) => ({ ...source.item(row, now), since: new Date(row.since as Date) }))
  };
}

/** The queues of a user's roles, filled. */
export async function workQueues(user: { id: number; roles: readonly Role[] }, now = new Date()): Promise<WorkQueue[]> {
  return Promise.all(queuesFor(user.roles).map((kind) => fill(kind, user.id, now)));
}
