/** Yield predictions kept with a revision (not in its signed content): store one with its audit event, list them. */
import * as audit from '../db/audit';
import { db } from '../db/index';
import { writeTransaction } from '../db/transaction';
import { notFound } from '../../errors/domain-error';
import { variationModelSchema, type VariationModel } from '../../blend/spread/model';

export interface StoredYieldPrediction {
  id: number;
  revisionId: number;
  model: VariationModel;
  seed: number;
  parts: number;
  figures: unknown;
  source: 'predicted' | 'fitted';
  computedBy: number;
  computedAt: Date;
}

export interface YieldPredictionInput {
  revisionId: number;
  model: VariationModel;
  seed: number;
  parts: number;
  figures: unknown;
  source: 'predicted' | 'fitted';
}

export async function storeYieldPrediction(actor: { id: number; email: string }, input: YieldPredictionInput): Promise<number> {
  return writeTransaction(async (trx) => {
    const revision = await trx('formulation_revisions').where({ id: input.revisionId }).first('id');
    if (!revision) throw notFound('revision not found');
    const [id] = await trx('yield_predictions').insert({
      revision_id: input.revisionId,
      model_json: JSON.stringify(variationModelSchema.parse(input.model)),
      seed: input.seed,
      parts: input.parts,
      figures_json: JSON.stringify(input.figures),
      source: input.source,
      computed_by: actor.id
    });
    await audit.record(
      {
        actorId: actor.id,
        actorEmail: actor.email,
        entityType: 'yield-prediction',
        entityId: id,
        action: input.source === 'fitted' ? 'fit-to-batch' : 'predict',
        after: { revisionId: input.revisionId, seed: input.seed, parts: input.parts, model: input.model }
      },
      trx
    );
    return id;
  });
}

/** A revision's stored predictions, newest first. */
export async function listYieldPredictions(revisionId: number): Promise<StoredYieldPrediction[]> {
  const rows = await db()('yield_predictions')
    .where({ revision_id: revisionId })
    .orderBy([
      { column: 'computed_at', order: 'desc' },
      { column: 'id', order: 'desc' }
    ]);
  return rows.map((r) => ({
    id: r.id,
    revisionId: r.revision_id,
    model: variationModelSchema.parse(JSON.parse(r.model_json)),
    seed: r.seed,
    parts: r.parts,
    figures: JSON.parse(r.figures_json) as unknown,
    source: r.source === 'fitted' ? 'fitted' : 'predicted',
    computedBy: r.computed_by,
    computedAt: r.computed_at
  }));
}
