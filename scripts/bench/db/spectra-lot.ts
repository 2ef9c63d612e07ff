/**
 * A 10,000-part lot of measured spectra with the database, from upload to release (run by `npm run bench:db`):
 * five uploads of 2,000 parts (380–780 nm at 1 nm, the per-upload limit; about 7.5 MB each), every metric
 * computed and stored; then the batch page's summary; then the release e-signature (signed content of every
 * part, the batch record PDF, the notices). Parts invented: the seeded 3000 K revision with a small scatter.
 */
import { closeDb, db } from '../../../src/lib/server/db/index';
import { uploadMeasurements } from '../../../src/lib/server/measurements/upload';
import { batchResults } from '../../../src/lib/server/measurements/results';
import { disposeBatch } from '../../../src/lib/server/measurements/disposition';
import { getBatch } from '../../../src/lib/server/batches/read';
import { closeReadPool } from '../../../src/lib/server/measurements/read-pool';
import { completedBatch, csvFile, demoUser, DEMO_PASSWORD, partsCsv } from '../../../tests/server/measurements/support';

// Read files in the reader worker thread, as the built app does (config is read on first use, after this line).
process.env.PF_READ_IN_WORKER ??= '1';

const UPLOADS = Number(process.env.UPLOADS ?? 5);
const PER_UPLOAD = 2000;
const quality = await demoUser('quality');
const b = await completedBatch();
const files: string[] = [];
for (let u = 0; u < UPLOADS; u++) files.push(await partsCsv(b.revisionId, PER_UPLOAD, `S${b.batchId}-${u + 1}`, 1, 0.01));
const mb = files.reduce((a, f) => a + f.length, 0) / 1024 / 1024;

const t0 = performance.now();
const each: number[] = [];
for (const [u, text] of files.entries()) {
  const s = performance.now();
  await uploadMeasurements(quality, b.batchId, csvFile(text, `sphere-${u + 1}.csv`));
  each.push(performance.now() - s);
}
const t1 = performance.now();
const view = await batchResults(b.batchId);
const t2 = performance.now();
const version = (await getBatch(b.batchId))!.batch.version;
await disposeBatch(
  quality,
  b.batchId,
  { decision: 'release', meaning: 'Release approval: the batch meets its revision', comment: 'bench', password: DEMO_PASSWORD, version },
  'http://localhost'
);
const t3 = performance.now();
const row = await db()('batch_dispositions').where({ batch_id: b.batchId }).first('signed_json');
console.log(
  `spectra-lot    ${(UPLOADS * PER_UPLOAD).toLocaleString('en')} spectra in ${UPLOADS} uploads (${mb.toFixed(1)} MB): ` +
    `uploads ${(t1 - t0).toFixed(0)} ms (each ${each.map((e) => e.toFixed(0)).join(', ')}), summary ${(t2 - t1).toFixed(0)} ms, ` +
    `release ${(t3 - t2).toFixed(0)} ms (signed content ${(row!.signed_json.length / 1024 / 1024).toFixed(1)} MB); ` +
    `yield ${((view!.summary.yieldFraction ?? 0) * 100).toFixed(1)} %; rss ${(process.memoryUsage().rss / 1024 / 1024).toFixed(0)} MB`
);
await closeReadPool();
await closeDb();
