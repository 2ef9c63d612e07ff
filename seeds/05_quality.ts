/**
 * Demo measurements of Kestrel Hollow Lighting (invented): 24 parts of the completed demo batch
 * BT-261201-001, as one multi-column sphere export. The parts are synthetic (the blend model of the
 * batch's revision with the red phosphor 4 % high and a ±2 % scatter, src/lib/measurements/syntheticParts.ts),
 * so a few miss the 3-step ellipse; the batch is left waiting for quality's decision. The raw file
 * goes to object storage like an upload, so the fakes (or the real store) must be up: without them the
 * seed fails with the reason rather than leave the demo without its measurements.
 * Idempotent: a batch that already has measurements is left alone.
 */
import type { Knex } from 'knex';
import { fractionsWithLeak, parseRecipe } from '../src/lib/recipe';
import { loadRevisionComponents } from '../src/lib/server/formulations/components';
import { syntheticPartsCsv } from '../src/lib/measurements/syntheticParts';
import { insertMeasurements, readFile } from '../src/lib/server/measurements/upload';

const BATCH = 'BT-261201-001';

export async function seed(knex: Knex): Promise<void> {
  if (!(await knex.schema.hasTable('measurement_uploads'))) return;
  const batch = await knex('batches as b')
    .join('formulation_revisions as r', 'r.id', 'b.revision_id')
    .where({ 'b.batch_number': BATCH, 'b.state': 'complete' })
    .first('b.id', 'r.content_json');
  const quality = await knex('users').where({ email: 'ines.halloran@kestrelhollow.example' }).first('id');
  if (!batch || !quality) throw new Error(`seed 05_quality: no completed ${BATCH} or no quality user; the earlier seeds did not load.`);
  if (await knex('measurement_uploads').where({ batch_id: batch.id }).first('id')) return;
  const content = parseRecipe(batch.content_json);
  const loaded = await loadRevisionComponents(knex, content);
  const fractions = fractionsWithLeak(content);
  const text =
    `# Integrating sphere export, ${BATCH}, 24 parts at 25 °C\n` +
    syntheticPartsCsv(loaded.components, fractions, { parts: 24, prefix: `${BATCH}-P`, lastPhosphorScale: 1.04, scatter: 0.02 });
  const file = { name: `${BATCH}-sphere.csv`, contentType: 'text/csv', body: Buffer.from(text, 'utf8') };
  const measured = await readFile(file);
  try {
    await knex.transaction(async (trx) => {
      const { uploadId } = await insertMeasurements(trx, batch.id, file, measured, quality.id);
      await trx('audit_events').insert({
        actor_id: quality.id,
        actor_email: 'ines.halloran@kestrelhollow.example',
        entity_type: 'batch',
        entity_id: String(batch.id),
        action: 'measurements-upload',
        after_json: JSON.stringify({ uploadId, parts: measured.count, seed: true })
      });
    });
    console.log(`seed 05_quality: ${BATCH} measured (${measured.count} parts), waiting for a decision.`);
  } catch (err) {
    const reason = (err as Error).message;
    throw new Error(`seed 05_quality: the demo measurements could not be stored (is object storage up at S3_ENDPOINT?): ${reason}`, {
      cause: err
    });
  }
}
