/**
 * Generated upload requests for the route fuzz (tests/routes/api/fuzz-uploads.test.ts): a file
 * (malformed, with known bad lines, or valid) in an envelope — a proper multipart `file` field, or
 * the field missing, sent as text or twice, odd names and types, extra fields, a raw text body, a
 * broken multipart body (no or wrong boundary, truncated, a byte changed), an oversized declared
 * length — with clean or malformed query parameters. Plus the answer read back whatever its form,
 * and what "nothing saved" is measured with: CHECKSUM TABLE (and tests/support/faults.ts watchPuts).
 */
import fc from 'fast-check';
import { db } from '../../../src/lib/server/db/index';
import { deleteStoredObject } from '../../../src/lib/server/storage/objects';
import { keysContaining } from '../../support/faults';
import { fileText, renderSpectrum, spectrumModel, type SpectrumModel } from '../../lib/spectrum-file/arbitraries';
import { badLines, malformedFile } from '../../lib/spectrum-file/corruptions';

export type FileChoice =
  | { kind: 'malformed'; bytes: Uint8Array<ArrayBuffer> }
  | { kind: 'badLines'; text: string; lines: number[] }
  | { kind: 'valid'; model: SpectrumModel };

export type Envelope =
  | { kind: 'form'; name: string; type: string; extra: [string, string][]; twice: boolean }
  | { kind: 'fileAsText' }
  | { kind: 'noFile' }
  | { kind: 'tooLarge' }
  | { kind: 'rawText'; type: string }
  | { kind: 'brokenMultipart'; how: 'noBoundary' | 'wrongBoundary' | 'truncate' | 'flip'; pos: number };

export interface Upload {
  file: FileChoice;
  envelope: Envelope;
  /** Query string, or null for a clean one the route picks with `pick`. */
  query: string | null;
  pick: number;
  /** Path parameter, or null for the route's own record. */
  param: string | null;
  /** Sent by a role the route refuses. */
  otherRole: boolean;
  /** Asks for streamed progress (the measurement route). */
  ndjson: boolean;
}

const ODD_NAMES = [
  'export',
  'spectrum.csv',
  'Messung µW °C.txt',
  '../../etc/passwd',
  'C:\\data\\sphere.csv',
  'x'.repeat(300),
  '"quoted".csv',
  'line\nbreak',
  '   ',
  '🙂',
  '.hidden',
  'a/b/c.csv'
];
const ODD_TYPES = [
  'text/csv',
  'text/plain',
  '',
  'application/octet-stream',
  'application/x-msdownload',
  'text/csv; charset=utf-16',
  'image/png'
];
const EXTRA_FIELDS: [string, string][] = [
  ['notes', 'x'.repeat(5000)],
  ['kind', 'excitation'],
  ['version', '-1'],
  ['notes', "'; DROP TABLE materials; --"],
  ['file2', 'abc'],
  ['batchId', '0']
];
const RAW_TYPES = [
  'text/csv',
  'text/plain; charset=utf-8',
  'text/tab-separated-values',
  'TEXT/CSV',
  'application/json',
  'text/html',
  'application/x-www-form-urlencoded'
];
const BAD_PARAMS = ['abc', '0', '-1', '1e9', '999999999', '1.5', '', '%00', '1 OR 1=1'];

export function uploadArb(parts: { min: number; max: number }, badQueries: string[]): fc.Arbitrary<Upload> {
  const file: fc.Arbitrary<FileChoice> = fc.oneof(
    { arbitrary: malformedFile(parts).map((f) => ({ kind: 'malformed' as const, bytes: f.bytes })), weight: 78 },
    { arbitrary: badLines(parts).map((f) => ({ kind: 'badLines' as const, text: f.text, lines: f.lines })), weight: 14 },
    { arbitrary: spectrumModel(parts).map((model) => ({ kind: 'valid' as const, model })), weight: 8 }
  );
  const envelope: fc.Arbitrary<Envelope> = fc.oneof(
    {
      arbitrary: fc.record({
        kind: fc.constant('form' as const),
        name: fc.oneof(
          { arbitrary: fc.constant('sphere-export.csv'), weight: 3 },
          fc.constantFrom(...ODD_NAMES),
          fc.string({ unit: 'binary', maxLength: 40 })
        ),
        type: fc.constantFrom(...ODD_TYPES),
        extra: fc.subarray(EXTRA_FIELDS, { maxLength: 2 }),
        twice: fc.boolean()
      }),
      weight: 84
    },
    { arbitrary: fc.record({ kind: fc.constantFrom('fileAsText' as const, 'noFile' as const, 'tooLarge' as const) }), weight: 4 },
    { arbitrary: fc.record({ kind: fc.constant('rawText' as const), type: fc.constantFrom(...RAW_TYPES) }), weight: 6 },
    {
      arbitrary: fc.record({
        kind: fc.constant('brokenMultipart' as const),
        how: fc.constantFrom('noBoundary' as const, 'wrongBoundary' as const, 'truncate' as const, 'flip' as const),
        pos: fc.nat()
      }),
      weight: 6
    }
  );
  return fc.record({
    file,
    envelope,
    query: fc.oneof({ arbitrary: fc.constant(null), weight: 9 }, { arbitrary: fc.constantFrom(...badQueries), weight: 1 }),
    pick: fc.nat(),
    param: fc.oneof({ arbitrary: fc.constant(null), weight: 30 }, { arbitrary: fc.constantFrom(...BAD_PARAMS), weight: 1 }),
    otherRole: fc.oneof({ arbitrary: fc.constant(false), weight: 40 }, { arbitrary: fc.constant(true), weight: 1 }),
    ndjson: fc.boolean()
  });
}

/** The bytes of the chosen file; a valid one is written with `labels` for its part columns when given. */
export function fileBytes(file: FileChoice, labels?: (n: number) => string[]): Uint8Array<ArrayBuffer> {
  if (file.kind === 'malformed') return file.bytes;
  if (file.kind === 'badLines') return new TextEncoder().encode(file.text);
  const m = file.model;
  const model = labels ? { ...m, labels: [m.labels[0], ...labels(m.parts.length)] } : m;
  return new TextEncoder().encode(fileText(renderSpectrum(model)));
}

/** The request of an upload; `mark` ends every file name so the test finds its own objects in the shared bucket. */
export async function uploadRequest(
  url: string,
  u: Upload,
  bytes: Uint8Array<ArrayBuffer>,
  mark: string,
  ndjson = false
): Promise<Request> {
  const headers: Record<string, string> = ndjson ? { accept: 'application/x-ndjson' } : {};
  const e = u.envelope;
  const name = `${e.kind === 'form' ? e.name : 'export'}-${mark}.csv`;
  const form = new FormData();
  if (e.kind === 'form') {
    for (const [k, v] of e.extra) form.append(k, v);
    form.append('file', new File([bytes], name, { type: e.type }));
    if (e.twice) form.append('file', new File(['400,1\n'], `second-${mark}.csv`, { type: 'text/csv' }));
  } else if (e.kind === 'fileAsText') form.append('file', new TextDecoder().decode(bytes));
  else if (e.kind === 'noFile') form.append('notes', 'no file here');
  else if (e.kind === 'tooLarge') {
    form.append('file', new File([bytes], name, { type: 'text/csv' }));
    headers['content-length'] = String(50 * 1024 * 1024);
  } else if (e.kind === 'rawText') {
    return new Request(url, { method: 'POST', body: bytes, headers: { ...headers, 'content-type': e.type, 'x-file-name': name } });
  } else {
    form.append('file', new File([bytes], name, { type: 'text/csv' }));
    const framed = new Response(form);
    const type = framed.headers.get('content-type') ?? '';
    let body = new Uint8Array(await framed.arrayBuffer());
    let declared = type;
    if (e.how === 'noBoundary') declared = 'multipart/form-data';
    else if (e.how === 'wrongBoundary') declared = 'multipart/form-data; boundary=not-the-boundary';
    else if (e.how === 'truncate') body = body.slice(0, e.pos % body.length);
    else {
      // A byte of the framing: the first part's headers or the closing boundary.
      const framing = e.pos % 2 === 0 ? e.pos % Math.min(150, body.length) : body.length - 1 - (e.pos % Math.min(60, body.length));
      body[framing] = (body[framing] + 1 + (e.pos % 200)) % 256;
    }
    return new Request(url, { method: 'POST', body, headers: { ...headers, 'content-type': declared } });
  }
  return new Request(url, { method: 'POST', body: form, headers });
}

export interface Answer {
  status: number;
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- JSON answers of several shapes
  body: any;
  /** Thrown with SvelteKit's error() (sign-in and role checks): the framework writes its { message } body. */
  thrown?: boolean;
}

/**
 * Calls a handler and reads its answer: JSON, or NDJSON (its last line: `done` or `error` with the
 * status). A SvelteKit `error()` (401/403) is thrown with its status; anything else thrown is a crash.
 */
export async function send(handler: (e: never) => Promise<Response> | Response, event: unknown): Promise<Answer> {
  let res: Response;
  try {
    res = await handler(event as never);
  } catch (err) {
    const e = err as { status?: number; body?: unknown };
    if (typeof e.status === 'number') return { status: e.status, body: e.body, thrown: true };
    return { status: 500, body: { thrown: err instanceof Error ? `${err.name}: ${err.message}\n${err.stack}` : String(err) } };
  }
  if ((res.headers.get('content-type') ?? '').includes('application/x-ndjson')) {
    const last = JSON.parse((await res.text()).trim().split('\n').at(-1) ?? '{}');
    return last.type === 'done' ? { status: last.status, body: last.result } : { status: last.status, body: last };
  }
  const text = await res.text();
  try {
    return { status: res.status, body: JSON.parse(text) };
  } catch {
    return { status: res.status, body: { notJson: text.slice(0, 200) } };
  }
}

/** One CHECKSUM TABLE statement over the tables: equal strings mean no row was added, removed or changed. */
export async function checksums(tables: readonly string[]): Promise<string> {
  const [rows] = (await db().raw(`CHECKSUM TABLE ${tables.map((t) => `\`${t}\``).join(', ')}`)) as [
    { Table: string; Checksum: string | number | null }[]
  ];
  return rows.map((r) => `${r.Table.split('.').pop()}=${r.Checksum}`).join(' ');
}

/** Keys of the objects whose name holds `mark`, put under `purpose` in the given months (keys are purpose/YYYY-MM/uuid-name). */
export async function markedObjects(purpose: string, months: string[], mark: string): Promise<string[]> {
  const keys: string[] = [];
  for (const month of new Set(months)) keys.push(...(await keysContaining(`${purpose}/${month}/`, mark)));
  return keys;
}

export const storageMonth = () => new Date().toISOString().slice(0, 7);

/** Removes a test batch's measurement uploads: parts, uploads, their stored files and objects. */
export async function removeMeasurements(batchId: number): Promise<void> {
  const files: { id: number; key: string }[] = await db()('measurement_uploads as m')
    .join('stored_files as f', 'f.id', 'm.stored_file_id')
    .where('m.batch_id', batchId)
    .select('f.id', 'f.storage_key as key');
  await db().transaction(async (trx) => {
    await trx('part_measurements').where({ batch_id: batchId }).delete();
    await trx('measurement_uploads').where({ batch_id: batchId }).delete();
    await trx('stored_files')
      .whereIn(
        'id',
        files.map((f) => f.id)
      )
      .delete();
  });
  for (const f of files) await deleteStoredObject(f.key);
}
