/**
 * Hostile uploads on the three file routes — a phosphor's spectrum, a pump's spectrum, a batch's
 * measured parts — 1,000 generated requests each (see upload-requests.ts): malformed files and form
 * fields, bad query and path parameters, a refused role, broken multipart bodies, and a few valid
 * files. Proves: no answer is an exception or a 500 (streamed answers included); a refused upload
 * answers a JSON error that quotes the first problem's line when the file content is at fault, every
 * line named exists in the file, and a file with known bad lines is refused naming only those; a
 * refused or dry-run upload saves nothing — CHECKSUM TABLE of the feature's tables is unchanged and
 * no object it put stays in storage; an accepted one stores exactly one object, and the baseline is
 * taken again after it. Prints a status tally per route. Needs no fresh database.
 */
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { POST as phosphorUpload } from '../../../src/routes/api/v1/phosphors/[id]/spectrum/+server';
import { POST as pumpUpload } from '../../../src/routes/api/v1/pumps/[id]/spectrum/+server';
import { POST as measurementUpload } from '../../../src/routes/api/v1/measurements/[batchId]/+server';
import { closeDb } from '../../../src/lib/server/db/index';
import * as editing from '../../../src/lib/server/library/editing';
import { decodeText } from '../../../src/lib/spectrum-file/decode';
import { lineCount } from '../../lib/spectrum-file/arbitraries';
import { demoUser, phosphorFields } from '../../server/library/support';
import { completedBatch } from '../../server/measurements/support';
import { expectObjectsGone, objectExists, watchPuts } from '../../support/faults';
import {
  checksums,
  fileBytes,
  markedObjects,
  removeMeasurements,
  send,
  storageMonth,
  uploadArb,
  uploadRequest,
  type Answer,
  type Upload
} from './upload-requests';
import type { User } from '../../../src/lib/server/accounts/users';

const RUNS = 1000;
const run = Date.now().toString(36);
const MATERIAL_QUERIES = [
  '?kind=EMISSION',
  '?kind=both',
  '?kind=',
  '?version=abc',
  '?version=-1',
  '?version=1.5',
  '?version=1e400',
  '?version=0x10',
  '?dryRun=yes',
  '?version=99999999999999999999'
];

interface Route {
  name: string;
  handler: (e: never) => Promise<Response> | Response;
  path: (param: string) => string;
  paramName: string;
  param: () => string;
  user: () => User;
  otherUser: () => User;
  parts: { min: number; max: number };
  cleanQueries: () => string[];
  badQueries: string[];
  /** The feature's tables (CHECKSUM TABLE before and after each upload) and its storage purpose. */
  tables: string[];
  purpose: string;
  labels?: (n: number) => string[];
  ndjson: boolean;
  accepted: (body: { version?: number }) => void;
}

let formulator: User;
let technician: User;
let quality: User;
const material = { phosphor: { id: 0, version: 1 }, pump: { id: 0, version: 1 } };
let batchId = 0;
let uploadsSent = 0;

function materialRoute(kind: 'phosphor' | 'pump', handler: Route['handler']): Route {
  const m = material[kind];
  return {
    name: `${kind} spectrum`,
    handler,
    path: (id) => `/api/v1/${kind}s/${id}/spectrum`,
    paramName: 'id',
    param: () => String(m.id),
    user: () => formulator,
    otherUser: () => technician,
    parts: { min: 1, max: 1 },
    cleanQueries: () => ['', '?kind=emission', '?kind=excitation', '?dryRun=1', '?dryRun=true', `?version=${m.version}`, '?version=1'],
    badQueries: MATERIAL_QUERIES,
    tables: ['materials', 'material_spectra', 'stored_files', 'audit_events'],
    purpose: 'spectrum-source',
    ndjson: false,
    accepted: (body) => {
      m.version = body.version ?? m.version;
    }
  };
}

const ROUTES: Route[] = [
  materialRoute('phosphor', phosphorUpload as Route['handler']),
  materialRoute('pump', pumpUpload as Route['handler']),
  {
    name: 'measurements',
    handler: measurementUpload as Route['handler'],
    path: (id) => `/api/v1/measurements/${id}`,
    paramName: 'batchId',
    param: () => String(batchId),
    user: () => quality,
    otherUser: () => technician,
    parts: { min: 1, max: 3 },
    cleanQueries: () => [''],
    badQueries: ['?dryRun=1', '?kind=x', '?batchId=0'],
    tables: ['measurement_uploads', 'part_measurements', 'stored_files', 'audit_events', 'batches'],
    purpose: 'measurement',
    // Part names new to the batch, so a valid file is not refused as measured already.
    labels: (n) => Array.from({ length: n }, (_, k) => `FZ-${run}-${uploadsSent}-${k + 1}`),
    ndjson: true,
    accepted: () => undefined
  }
];

function describeUpload(u: Upload, a: Answer): string {
  const file = u.file.kind === 'badLines' ? `badLines ${JSON.stringify(u.file.lines)}` : u.file.kind;
  return (
    `${file} file, ${u.envelope.kind} envelope, query ${u.query ?? 'clean'}, param ` +
    `${u.param ?? 'own'}${u.otherRole ? ', other role' : ''}: ${a.status} ` +
    `${JSON.stringify(a.body).slice(0, 1500)}`
  );
}

/** A refusal: a JSON error; lines named exist, the first is quoted; known bad lines are the ones named. */
function expectRefusal(u: Upload, a: Answer, bytes: Uint8Array, context: string): void {
  const message = a.thrown ? a.body?.message : a.body?.error;
  expect(typeof message, context).toBe('string');
  expect(message.length, context).toBeGreaterThan(0);
  if (u.envelope.kind === 'brokenMultipart') return; // the file the server read may differ from the one built
  const issues: { line?: number | null }[] = a.body?.issues ?? [];
  const named = issues.flatMap((i) => (typeof i.line === 'number' ? [i.line] : []));
  if (named.length) {
    expect(message, context).toContain(`Line ${named[0]}:`);
    const lines = lineCount(decodeText(bytes));
    for (const line of named) expect(line >= 1 && line <= lines, `${context} (the file has ${lines} lines)`).toBe(true);
  }
  if (u.file.kind === 'badLines' && a.status === 422) {
    expect(named.length, context).toBeGreaterThan(0);
    for (const line of named) expect(u.file.lines, context).toContain(line);
  }
}

async function fuzzRoute(r: Route): Promise<void> {
  const t0 = performance.now();
  const months = [storageMonth()];
  const mark = `fzu${run}${r.name.replace(/\W/g, '')}`;
  const tally = new Map<number, number>();
  let accepted = 0;
  const acceptedKeys: string[] = [];
  let baseline = await checksums(r.tables);
  const puts = watchPuts();
  try {
    await fc.assert(
      fc.asyncProperty(uploadArb(r.parts, r.badQueries), async (u) => {
        uploadsSent++;
        const bytes = fileBytes(u.file, r.labels);
        const param = u.param ?? r.param();
        const clean = r.cleanQueries();
        const url = `http://local${r.path(encodeURIComponent(param))}${u.query ?? clean[u.pick % clean.length]}`;
        const request = await uploadRequest(url, u, bytes, mark, r.ndjson && u.ndjson);
        puts.keys.length = 0;
        const event = {
          request,
          url: new URL(url),
          params: { [r.paramName]: param },
          locals: { user: u.otherRole ? r.otherUser() : r.user(), viaToken: false, denied: null }
        };
        const a = await send(r.handler, event);
        tally.set(a.status, (tally.get(a.status) ?? 0) + 1);
        const context = describeUpload(u, a);
        expect(a.status, context).toBeLessThan(500);
        if (a.status === 201) {
          accepted++;
          expect(puts.keys, context).toHaveLength(1);
          expect(await objectExists(puts.keys[0]), context).toBe(true);
          acceptedKeys.push(puts.keys[0]);
          r.accepted(a.body);
          const after = await checksums(r.tables);
          expect(after, `${context}: the checksums must see a save`).not.toBe(baseline);
          baseline = after;
          return;
        }
        if (a.status >= 400) expectRefusal(u, a, bytes, context);
        else expect(a.body?.saved, context).toBe(false); // 200: a dry run
        expect(await checksums(r.tables), context).toBe(baseline);
        if (puts.keys.length) await expectObjectsGone(puts.keys);
      }),
      { numRuns: RUNS }
    );
  } finally {
    puts.stop();
  }
  const seconds = ((performance.now() - t0) / 1000).toFixed(1);
  const statuses = [...tally]
    .sort((x, y) => x[0] - y[0])
    .map(([s, n]) => `${s}×${n}`)
    .join(', ');
  console.log(`upload fuzz, ${r.name}: ${RUNS} requests in ${seconds} s — ${statuses}; ${accepted} accepted`);
  expect(accepted).toBeGreaterThan(0);
  expect(accepted).toBeLessThan(RUNS * 0.15);
  // Every object of this run in the bucket belongs to an accepted upload (a changed byte of a broken
  // multipart body may have renamed an accepted file, so the accepted keys are checked one by one).
  months.push(storageMonth());
  const found = await markedObjects(r.purpose, months, mark);
  expect(found.filter((k) => !acceptedKeys.includes(k))).toEqual([]);
  for (const k of acceptedKeys) expect(await objectExists(k), k).toBe(true);
}

describe('upload routes under hostile input: no 500, no partial save, no stored object left behind', () => {
  beforeAll(async () => {
    [formulator, technician, quality] = await Promise.all([demoUser('formulator'), demoUser('technician'), demoUser('quality')]);
    material.phosphor.id = await editing.create(formulator, 'phosphor', phosphorFields(`TST-FZP-${run}`));
    material.pump.id = await editing.create(formulator, 'pump', { ...phosphorFields(`TST-FZB-${run}`), iqe: null });
    batchId = (await completedBatch()).batchId;
  });
  afterAll(async () => {
    // The accepted uploads' objects go too: the development bucket is shared by every sandbox.
    for (const m of Object.values(material)) if (m.id) await editing.remove(formulator, m.id);
    if (batchId) await removeMeasurements(batchId);
    await closeDb();
  });

  it.each(ROUTES)(`$name: ${RUNS} generated uploads`, (route) => fuzzRoute(route), 120_000);
});
