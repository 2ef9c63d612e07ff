/** Approved revisions a batch can be planned from (newest decision first). */
import { db } from '../db/index';

export interface ApprovedRevisionOption {
  id: number;
  formulationCode: string;
  formulationName: string;
  revisionNo: number;
}

export async function listApprovedRevisions(): Promise<ApprovedRevisionOption[]> {
  const rows = await db()('formulation_revisions as r')
    .join('formulations as f', 'f.id', 'r.formulation_id')
    .where('r.state', 'approved')
    .orderBy('f.code')
    .select('r.id', 'r.revision_no', 'f.code', 'f.name');
  return rows.map((r) => ({ id: r.id, formulationCode: r.code, formulationName: r.name, revisionNo: r.revision_no }));
}
