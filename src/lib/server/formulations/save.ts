/**
 * Creating and editing formulation drafts (used by the designer, the formulation pages, the API
 * and the quality feature's corrections). Every write validates the content, computes the
 * prediction with the spectral core, runs in one transaction and leaves an audit row.
 */
import { z } from 'zod';
import type { Knex } from 'knex';
import { db } from '../db/index';
import { writeTransaction } from '../db/transaction';
import { record } from '../db/audit';
import type { RevisionContent } from '../../recipe';
import { ConflictError, NotFoundError, ValidationError } from './errors';
import { readableSummary } from '../../errors/readable-issues';
import { plainText } from '../../errors/hidden-characters';
import { checkVersion, enforce, requireRoles, type Caller } from './guard';
import { prepareRevision, type PreparedRevision } from './prepare';
import { mayAuthorFormulations, mayDraftCorrection } from '../../access/policies';

export { ConflictError, ValidationError, NotFoundError, PermissionError } from './errors';

export const formulationMetaSchema = z.object({
  code: z
    .string()
    .trim()
    .toUpperCase()
    .regex(/^[A-Z0-9][A-Z0-9-]{1,39}$/, 'code: 2–40 letters, digits or dashes, e.g. KH-W30-90')
    .optional(),
  name: z.string().trim().min(1, 'name is required').max(200, 'name: at most 200 characters').superRefine(plainText('name')),
  description: z.string().trim().max(5000, 'description: at most 5000 characters').default('')
});

export interface NewFormulationInput {
  code?: string;
  name: string;
  description?: string;
  content: unknown;
}

const AUTHORS = mayAuthorFormulations.roles;
const CORRECTORS = mayDraftCorrection.roles;

/** A free code from the target, e.g. KH-W30-90 (3000 K, Ra floor 90), then -B, -C … */
async function suggestCode(trx: Knex.Transaction, content: RevisionContent, cct: number): Promise<string> {
  const base = `KH-W${Math.round(cct / 100)}${content.floors.raMin ? `-${Math.round(content.floors.raMin)}` : ''}`;
  const taken = new Set((await trx('formulations').where('code', 'like', `${base}%`).pluck('code')) as string[]);
  if (!taken.has(base)) return base;
  for (let i = 1; i < 26 * 26; i++) {
    const suffix =
      i < 26 ? String.fromCharCode(65 + i) : `${String.fromCharCode(65 + Math.floor(i / 26))}${String.fromCharCode(65 + (i % 26))}`;
    if (!taken.has(`${base}-${suffix}`)) return `${base}-${suffix}`;
  }
  throw new ConflictError(`No free code left under ${base}; give a code.`);
}

async function insertDraft(
  trx: Knex.Transaction,
  caller: Caller,
  formulationId: number,
  p: PreparedRevision,
  extra: { basedOnRevisionId?: number | null; sourceBatchId?: number | null } = {}
): Promise<{ revisionId: number; revisionNo: number }> {
  await trx('formulations').where({ id: formulationId }).forUpdate().first('id');
  const max = await trx('formulation_revisions')
    .where({ formulation_id: formulationId })
    .max<{ n: number | null }>('revision_no as n')
    .first();
  const revisionNo = Number(max?.n ?? 0) + 1;
  const [revisionId] = await trx('formulation_revisions').insert({
    formulation_id: formulationId,
    revision_no: revisionNo,
    state: 'draft',
    content_json: JSON.stringify(p.content),
    predicted_json: JSON.stringify(p.predicted),
    core_version: p.coreVersion,
    content_sha256: p.sha256,
    created_by: caller.id,
    based_on_revision_id: extra.basedOnRevisionId ?? null,
    source_batch_id: extra.sourceBatchId ?? null
  });
  await trx('formulations').where({ id: formulationId }).update({ updated_at: new Date() });
  await record(
    {
      actorId: caller.id,
      actorEmail: caller.email,
      entityType: 'formulation_revision',
      entityId: revisionId,
      action: 'create',
      after: {
        formulationId,
        revisionNo,
        state: 'draft',
        contentSha256: p.sha256,
        basedOnRevisionId: extra.basedOnRevisionId ?? null,
        sourceBatchId: extra.sourceBatchId ?? null,
        content: p.content
      }
    },
    trx
  );
  return { revisionId, revisionNo };
}

function isDuplicate(err: unknown): boolean {
  return (err as { code?: string } | null)?.code === 'ER_DUP_ENTRY';
}

export async function createFormulationWithDraft(
  caller: Caller,
  input: NewFormulationInput
): Promise<{ formulationId: number; revisionId: number; revisionNo: number; code: string }> {
  requireRoles(caller, AUTHORS, 'Creating a formulation');
  const meta = formulationMetaSchema.safeParse(input);
  if (!meta.success) {
    const issues = meta.error.issues.map((i) => ({ path: i.path.join('.'), message: i.message }));
    throw new ValidationError(readableSummary(issues), issues);
  }
  const prepared = await prepareRevision(db(), input.content);
  // A suggested code can be taken by a concurrent request between the check and the insert: try the next one.
  for (let attempt = 0; ; attempt++) {
    try {
      return await writeTransaction(async (trx) => {
        const code = meta.data.code ?? (await suggestCode(trx, prepared.content, prepared.predicted.target.cct));
        if (await trx('formulations').where({ code }).first('id'))
          throw new ConflictError(`The code ${code} is already taken; choose another.`);
        const [formulationId] = await trx('formulations').insert({
          code,
          name: meta.data.name,
          description: meta.data.description || null,
          created_by: caller.id
        });
        await record(
          {
            actorId: caller.id,
            actorEmail: caller.email,
            entityType: 'formulation',
            entityId: formulationId,
            action: 'create',
            after: { code, name: meta.data.name, description: meta.data.description }
          },
          trx
        );
        const draft = await insertDraft(trx, caller, formulationId, prepared);
        return { formulationId, code, ...draft };
      });
    } catch (err) {
      if (isDuplicate(err) && meta.data.code === undefined && attempt < 5) continue;
      if (isDuplicate(err)) throw new ConflictError('The code is already taken; choose another.');
      throw err;
    }
  }
}

export async function createRevision(
  caller: Caller,
  formulationId: number,
  content: unknown,
  basedOnRevisionId?: number | null
): Promise<{ revisionId: number; revisionNo: number }> {
  requireRoles(caller, AUTHORS, 'Starting a revision');
  const f = await db()('formulations').where({ id: formulationId }).first('id');
  if (!f) throw new NotFoundError(`Formulation ${formulationId} does not exist.`);
  if (basedOnRevisionId != null) {
    const base = await db()('formulation_revisions').where({ id: basedOnRevisionId }).first('formulation_id');
    if (!base || base.formulation_id !== formulationId)
      throw new ValidationError(`basedOnRevisionId: revision ${basedOnRevisionId} does not belong to this formulation`);
  }
  const prepared = await prepareRevision(db(), content);
  return writeTransaction((trx) => insertDraft(trx, caller, formulationId, prepared, { basedOnRevisionId }));
}

/** A draft made from a batch's results (quality's correction); based on the revision the batch was built from. */
export async function createCorrectionDraft<T>(
  caller: Caller,
  revisionId: number,
  content: unknown,
  sourceBatchId: number,
  /** Writes that belong with the draft (the batch's correction record): same transaction, so both or neither. */
  alongside: (trx: Knex.Transaction, draft: { revisionId: number; revisionNo: number }) => Promise<T>
): Promise<{ revisionId: number; revisionNo: number; alongside: T }> {
  requireRoles(caller, CORRECTORS, 'A correction draft');
  if (!Number.isSafeInteger(sourceBatchId) || sourceBatchId <= 0) throw new ValidationError('sourceBatchId: a batch id is required');
  const base = await db()('formulation_revisions').where({ id: revisionId }).first('formulation_id');
  if (!base) throw new NotFoundError(`Revision ${revisionId} does not exist.`);
  const prepared = await prepareRevision(db(), content);
  return writeTransaction(async (trx) => {
    const draft = await insertDraft(trx, caller, base.formulation_id, prepared, { basedOnRevisionId: revisionId, sourceBatchId });
    return { ...draft, alongside: await alongside(trx, draft) };
  });
}

/** Saves a draft's new content if `version` is still current; otherwise ConflictError and nothing changes. */
export async function updateDraft(
  caller: Caller,
  revisionId: number,
  version: number,
  content: unknown
): Promise<{ revisionId: number; version: number }> {
  const found = await db()('formulation_revisions').where({ id: revisionId }).first('state', 'created_by', 'version');
  if (!found) throw new NotFoundError(`Revision ${revisionId} does not exist.`);
  enforce('edit', caller, { state: found.state, createdBy: found.created_by, version: found.version });
  checkVersion(version, found.version, found.state);
  const prepared = await prepareRevision(db(), content);
  return writeTransaction(async (trx) => {
    const row = await trx('formulation_revisions').where({ id: revisionId }).forUpdate().first();
    if (!row) throw new NotFoundError(`Revision ${revisionId} does not exist.`);
    enforce('edit', caller, { state: row.state, createdBy: row.created_by, version: row.version });
    checkVersion(version, row.version, row.state);
    const changed = await trx('formulation_revisions')
      .where({ id: revisionId, version, state: 'draft' })
      .update({
        content_json: JSON.stringify(prepared.content),
        predicted_json: JSON.stringify(prepared.predicted),
        core_version: prepared.coreVersion,
        content_sha256: prepared.sha256,
        version: version + 1,
        updated_at: new Date()
      });
    if (changed !== 1) throw new ConflictError('The draft changed while saving; nothing was saved. Reload and try again.');
    await record(
      {
        actorId: caller.id,
        actorEmail: caller.email,
        entityType: 'formulation_revision',
        entityId: revisionId,
        action: 'update-draft',
        // The audit keeps the stored document as it was (its own version), not what the recipe reader makes of it.
        before: { version: row.version, contentSha256: row.content_sha256, content: JSON.parse(row.content_json) },
        after: { version: version + 1, contentSha256: prepared.sha256, content: prepared.content }
      },
      trx
    );
    return { revisionId, version: version + 1 };
  });
}
