/**
 * A revision's own variation model for its yield forecasts: read (the defaults while none is kept), and
 * replace — by hand or fitted to a measured batch — with an optimistic lock on the version read and the
 * audit event in the same transaction. A forecast input, not signed content: a signed revision's model may change.
 */
import { db } from '../db/index';
import { writeTransaction } from '../db/transaction';
import * as audit from '../db/audit';
import { conflict, notFound } from '../../errors/domain-error';
import { parseRecipe, type RevisionContent } from '../../recipe';
import { variationModelSchema, type VariationModel } from '../../blend/spread/model';

export type VariationModelSource = 'default' | 'edited' | 'fitted';

export interface RevisionVariationModel {
  revisionId: number;
  model: VariationModel;
  source: VariationModelSource;
  /** The batch the spread was fitted to (source 'fitted'). */
  fittedBatch: { id: number; batchNumber: string } | null;
  /** 0 while the defaults are in force. */
  version: number;
  updatedAt: Date | null;
  updatedBy: string | null;
}

/** The defaults for a revision: with a recipe matrix, the chip wavelength is drawn from its bins by their shares. */
export function defaultVariationModel(content: Pick<RevisionContent, 'binRecipes'>): VariationModel {
  const bins = (content.binRecipes ?? []).map((b) => ({
    code: b.bin.code,
    fromNm: b.bin.fromNm,
    toNm: b.bin.toNm,
    sharePct: b.bin.sharePct
  }));
  return variationModelSchema.parse(bins.length ? { pump: { kind: 'bins', bins } } : {});
}

export async function getRevisionVariationModel(revisionId: number): Promise<RevisionVariationModel> {
  const rev = await db()('formulation_revisions').where({ id: revisionId }).first('id', 'content_json');
  if (!rev) throw notFound('revision not found');
  const row = await db()('revision_variation_models as m')
    .leftJoin('users as u', 'u.id', 'm.updated_by')
    .leftJoin('batches as b', 'b.id', 'm.fitted_batch_id')
    .where('m.revision_id', revisionId)
    .first('m.model_json', 'm.source', 'm.version', 'm.updated_at', 'm.fitted_batch_id', 'u.name as updated_by_name', 'b.batch_number');
  if (!row) {
    return {
      revisionId,
      model: defaultVariationModel(parseRecipe(rev.content_json)),
      source: 'default',
      fittedBatch: null,
      version: 0,
      updatedAt: null,
      updatedBy: null
    };
  }
  return {
    revisionId,
    model: variationModelSchema.parse(JSON.parse(row.model_json)),
    source: row.source === 'fitted' ? 'fitted' : 'edited',
    fittedBatch: row.fitted_batch_id ? { id: row.fitted_batch_id, batchNumber: String(row.batch_number) } : null,
    version: row.version,
    updatedAt: row.updated_at,
    updatedBy: row.updated_by_name ?? null
  };
}

export interface VariationModelWrite {
  model: VariationModel;
  /** The version read (0 = the defaults); a different stored version refuses the write. */
  version: number;
  /** Set when the model was fitted to a measured batch. */
  fit?: { batchId: number; batchNumber: string; detail: Record<string, unknown> };
}

/** Replaces the revision's variation model; returns the new version. */
export async function putRevisionVariationModel(
  actor: { id: number; email: string },
  revisionId: number,
  write: VariationModelWrite
): Promise<number> {
  const model = variationModelSchema.parse(write.model);
  return writeTransaction(async (trx) => {
    const rev = await trx('formulation_revisions').where({ id: revisionId }).forUpdate().first('id', 'revision_no');
    if (!rev) throw notFound('revision not found');
    const row = await trx('revision_variation_models').where({ revision_id: revisionId }).forUpdate().first();
    const current = row?.version ?? 0;
    if (current !== write.version)
      throw conflict(
        `The variation model of revision ${rev.revision_no} was changed by someone else since you opened it (you edited version ` +
          `${write.version}, it is now at version ${current}). Nothing was saved: reload, then make your change again.`
      );
    const values = {
      model_json: JSON.stringify(model),
      source: write.fit ? 'fitted' : 'edited',
      fitted_batch_id: write.fit?.batchId ?? null,
      version: current + 1,
      updated_by: actor.id
    };
    if (row) {
      await trx('revision_variation_models')
        .where({ revision_id: revisionId, version: current })
        .update({ ...values, updated_at: trx.fn.now(3) });
    } else {
      await trx('revision_variation_models').insert({ revision_id: revisionId, ...values });
    }
    await audit.record(
      {
        actorId: actor.id,
        actorEmail: actor.email,
        entityType: 'formulation_revision',
        entityId: revisionId,
        action: write.fit ? 'variation-model-fit' : 'variation-model',
        before: row ? JSON.parse(row.model_json) : null,
        after: write.fit ? { model, batch: write.fit.batchNumber, ...write.fit.detail } : model
      },
      trx
    );
    return current + 1;
  });
}
