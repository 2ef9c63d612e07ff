/** Row → record mapping of formulation revisions (snake_case columns to camelCase; content read through the recipe reader). */
import { parseRecipe } from '../../recipe';
import type { RevisionRecord } from '../../formulations/types';
import type { RevisionState } from '../../formulations/workflow-rules';

export type { RevisionRecord } from '../../formulations/types';

/** Columns selected for a revision record (joined with its formulation and people). */
export const REVISION_COLUMNS = [
  'r.*',
  'f.code as formulation_code',
  'f.name as formulation_name',
  'cu.name as created_by_name',
  'du.name as decided_by_name'
];

export interface RevisionRow {
  id: number;
  formulation_id: number;
  formulation_code: string;
  formulation_name: string;
  revision_no: number;
  state: RevisionState;
  content_json: string;
  predicted_json: string;
  core_version: string;
  content_sha256: string;
  version: number;
  created_by: number;
  created_by_name: string;
  created_at: Date;
  updated_at: Date;
  submitted_at: Date | null;
  submitted_by: number | null;
  decided_at: Date | null;
  decided_by: number | null;
  decided_by_name: string | null;
  superseded_at: Date | null;
  supersedes_revision_id: number | null;
  based_on_revision_id: number | null;
  source_batch_id: number | null;
  return_reason: string | null;
  withdraw_reason: string | null;
  off_aim_reason?: string | null;
}

export function toRevisionRecord(r: RevisionRow): RevisionRecord {
  return {
    id: r.id,
    formulationId: r.formulation_id,
    formulationCode: r.formulation_code,
    formulationName: r.formulation_name,
    revisionNo: r.revision_no,
    state: r.state,
    content: parseRecipe(r.content_json),
    predicted: JSON.parse(r.predicted_json),
    coreVersion: r.core_version,
    contentSha256: r.content_sha256,
    version: r.version,
    createdBy: r.created_by,
    createdByName: r.created_by_name,
    createdAt: r.created_at,
    updatedAt: r.updated_at,
    submittedAt: r.submitted_at,
    submittedBy: r.submitted_by,
    decidedAt: r.decided_at,
    decidedBy: r.decided_by,
    decidedByName: r.decided_by_name,
    supersededAt: r.superseded_at,
    supersedesRevisionId: r.supersedes_revision_id,
    basedOnRevisionId: r.based_on_revision_id,
    sourceBatchId: r.source_batch_id,
    returnReason: r.return_reason,
    withdrawReason: r.withdraw_reason,
    offAimReason: r.off_aim_reason ?? null
  };
}
