/**
 * Upload-to-summary of a 100,000-part tester table with the database (run inside a sandbox or after
 * `npm start` set the database up: `bash scripts/sandbox.sh bench npx tsx scripts/bench/db/tester-upload.ts`):
 * a completed demo batch gets the table through `uploadMeasurements` (read, metrics, one transaction of
 * batched inserts), then `batchResults` (every part judged, summary, plot model, the first page of parts),
 * then the release e-signature of the lot.
 * Prints the phases and the process's peak memory. Parts invented: a normal spread around 3000 K.
 */
import { closeDb, db } from '../../../src/lib/server/db/index';
import { uploadMeasurements } from '../../../src/lib/server/measurements/upload';
import { batchResults } from '../../../src/lib/server/measurements/results';
import { disposeBatch } from '../../../src/lib/server/measurements/disposition';
import { closeReadPool, readsInWorkers } from '../../../src/lib/server/measurements/read-pool';
import { createTesterProfile } from '../../../src/lib/server/measurements/tester-profiles';
import { testerProfileSchema } from '../../../src/lib/tester-table/profile';
import { seededRandom } from '../../../src/lib/blend/spread/prng';
import * as users from '../../../src/lib/server/accounts/users';
import { createBatch } from '../../../src/lib/server/batches/create';
import { getBatch } from '../../../src/lib/server/batches/read';
import { markMixed, recordLine } from '../../../src/lib/server/batches/weighing';
import { completeBatch } from '../../../src/lib/server/batches/complete';
import { createBatchSchema } from '../../../src/lib/batches/schema';

// Read files in the reader worker thread, as the built app does (config is read on first use, after this line).
process.env.PF_READ_IN_WORKER ??= '1';

const PARTS = Number(process.env.PARTS ?? 100_000);
const rnd = seededRandom(11);
const gauss = () => Math.sqrt(-2 * Math.log(1 - rnd.next())) * Math.cos(2 * Math.PI * rnd.next());

async function completed(): Promise<number> {
  const tech = (await users.findWithHashByEmail('tomas.brand@kestrelhollow.example'))!;
  const rev = await db()('formulation_revisions as r')
    .join('formulations as f', 'f.id', 'r.formulation_id')
    .where({ 'f.code': 'KH-W30-90', 'r.state': 'approved' })
    .first('r.id');
  const { id } = await createBatch(
    tech,
    createBatchSchema.parse({
      revisionId: rev!.id,
      sizing: { kind: 'mass', batchMassG: 10 },
      loading: { mode: 'perPhosphor', basis: 'wtPctOfSlurry' },
      additives: [],
      balance: { resolutionG: 0.001, minWeightG: 0.05, ref: 'BAL-B1' },
      plantLimitMin: 120
    })
  );
  for (const line of (await getBatch(id))!.lines) {
    const lot = line.materialId
      ? await db()('material_lots').where({ material_id: line.materialId }).orderBy('id', 'desc').first('lot_number')
      : null;
    await recordLine(tech, id, line.seq, { actualG: line.targetG, lotNumber: lot?.lot_number ?? 'BS-LX11-2611', version: line.version });
  }
  await markMixed(tech, id, { version: (await getBatch(id))!.batch.version });
  await completeBatch(tech, id, (await getBatch(id))!.batch.version);
  return id;
}

const quality = (await users.findWithHashByEmail('ines.halloran@kestrelhollow.example'))!;
const batchId = await completed();
const profileId = await createTesterProfile(
  quality,
  testerProfileSchema.parse({
    name: `bench ${Date.now().toString(36)}`,
    headerLines: 0,
    delimiter: ',',
    decimalMark: '.',
    chromaticity: 'xy',
    columns: { label: 'Serial', x: 'x', y: 'y', cct: 'CCT', ra: 'Ra', r9: 'R9', flux: 'Flux', forwardVoltage: 'Vf', bin: 'Bin' }
  })
);
const rows = ['Serial,x,y,CCT,Ra,R9,Flux,Vf,Bin'];
for (let i = 0; i < PARTS; i++) {
  const x = 0.4338 + 0.002 * gauss();
  const y = 0.403 + 0.0015 * gauss();
  rows.push(`B${batchId}-${i + 1},${x.toFixed(5)},${y.toFixed(5)},${Math.round(3000 - 30000 * (x - 0.4338))},92.1,52.3,118.2,2.91,A1`);
}
const body = Buffer.from(rows.join('\n'));
const t0 = performance.now();
await uploadMeasurements(quality, batchId, { name: 'lot.csv', contentType: 'text/csv', body, testerProfileId: profileId });
const t1 = performance.now();
const view = await batchResults(batchId);
const t2 = performance.now();
console.log(
  `tester-upload  ${PARTS.toLocaleString('en')} rows (${(body.length / 1024 / 1024).toFixed(1)} MB, read in ` +
    `${readsInWorkers() ? 'the reader thread' : 'this thread'}): upload ${(t1 - t0).toFixed(0)} ms, ` +
    `summary ${(t2 - t1).toFixed(0)} ms, total ${(t2 - t0).toFixed(0)} ms; ` +
    `yield ${((view!.summary.yieldFraction ?? 0) * 100).toFixed(1)} %; ` +
    `rss ${(process.memoryUsage().rss / 1024 / 1024).toFixed(0)} MB`
);
// Then the release e-signature of the whole lot (signed content binding every part, the record PDF, notices).
const version = (await getBatch(batchId))!.batch.version;
const t3 = performance.now();
await disposeBatch(
  quality,
  batchId,
  { decision: 'release', meaning: 'Release approval: the batch meets its revision', comment: 'bench', password: 'phosforge-demo', version },
  'http://localhost'
);
const releaseMs = performance.now() - t3;
const signed = await db()('batch_dispositions').where({ batch_id: batchId }).first('signed_json');
const signedMb = signed!.signed_json.length / 1024 / 1024;
console.log(`tester-upload  release ${releaseMs.toFixed(0)} ms (signed content ${signedMb.toFixed(1)} MB)`);
await closeReadPool();
await closeDb();
