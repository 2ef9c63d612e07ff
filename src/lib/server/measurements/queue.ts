/** The measurements work list: batches waiting for a quality decision, and recent decisions. */
import { db } from '../db/index';

export interface QueueRow {
  id: number;
  batchNumber: string;
  state: string;
  formulationCode: string;
  formulationName: string;
  revisionNo: number;
  completedAt: string | null;
  parts: number;
  decision: { decision: string; signerName: string; signedAt: string } | null;
}

const iso = (d: Date | null) => (d ? new Date(d).toISOString() : null);

async function rows(states: string[], limit: number): Promise<QueueRow[]> {
  const list = await db()('batches as b')
    .leftJoin('batch_dispositions as d', 'd.batch_id', 'b.id')
    .whereIn('b.state', states)
    .select(
      'b.id',
      'b.batch_number',
      'b.state',
      'b.formulation_code',
      'b.formulation_name',
      'b.revision_no',
      'b.completed_at',
      'd.decision',
      'd.signer_name',
      'd.signed_at'
    )
    .select(
      db().raw(`(SELECT COUNT(*) FROM part_measurements p JOIN measurement_uploads m ON m.id = p.upload_id
      WHERE p.batch_id = b.id AND m.withdrawn_at IS NULL) AS parts`)
    )
    .orderByRaw('COALESCE(d.signed_at, b.completed_at, b.created_at) DESC')
    .orderBy('b.id', 'desc')
    .limit(limit);
  return list.map((r) => ({
    id: r.id,
    batchNumber: r.batch_number,
    state: r.state,
    formulationCode: r.formulation_code,
    formulationName: r.formulation_name,
    revisionNo: r.revision_no,
    completedAt: iso(r.completed_at),
    parts: Number(r.parts),
    decision: r.decision ? { decision: r.decision, signerName: r.signer_name, signedAt: iso(r.signed_at)! } : null
  }));
}

export async function measurementQueue(): Promise<{ awaiting: QueueRow[]; decided: QueueRow[] }> {
  const [awaiting, decided] = await Promise.all([rows(['complete'], 200), rows(['released', 'rejected'], 50)]);
  return { awaiting, decided };
}
