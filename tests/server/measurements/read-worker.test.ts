/**
 * The measurement reader in a real worker thread (the bundle `npm run build` makes, built here with the same
 * esbuild settings): a tester table read with its profile, the same table gzip-compressed (RFC 1952), a table
 * with a bad cell refused as the same DomainError naming the line, and a spectra file measured with progress
 * reported back. Values invented; the Gaussian test spectra are not a product's.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { gzipSync } from 'node:zlib';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { build } from 'esbuild';
import { DomainError } from '../../../src/lib/errors/domain-error';
import { readerPool, readOn } from '../../../src/lib/server/measurements/read-pool';
import type { UploadProgress } from '../../../src/lib/server/measurements/read-file';
import { testerProfileSchema } from '../../../src/lib/tester-table/profile';

const file = join(tmpdir(), `measure-worker-${process.pid}.mjs`);
let readers: ReturnType<typeof readerPool>;
const profile = {
  id: 7,
  version: 2,
  profile: testerProfileSchema.parse({
    name: 'Line 3 tester',
    headerLines: 0,
    delimiter: ',',
    decimalMark: '.',
    chromaticity: 'xy',
    columns: { label: 'Serial', x: 'x', y: 'y', ra: 'Ra' }
  })
};
const metricsOf = (r: { metricsJson: string }) => r.metricsJson.split('\n').map((j) => JSON.parse(j));
const bytes = (text: string | Buffer) => new Uint8Array(typeof text === 'string' ? Buffer.from(text) : text);
const table = ['Serial,x,y,Ra', 'W1,0.4338,0.4030,91', 'W2,0.4340,0.4031,92.5', 'W3,0.4336,0.4029,90'].join('\n');

beforeAll(async () => {
  await build({
    entryPoints: ['src/lib/server/measurements/read-worker.ts'],
    bundle: true,
    platform: 'node',
    format: 'esm',
    target: 'node20',
    outfile: file,
    logLevel: 'warning'
  });
  readers = readerPool(file, 1);
}, 60_000);
afterAll(async () => {
  await readers?.close();
});

describe('the measurement reader thread', () => {
  it('reads a tester table with its profile, and the same table gzip-compressed', async () => {
    const progress: UploadProgress[] = [];
    const r = await readOn(readers, { kind: 'table', name: 't.csv', body: bytes(table), profile }, (p) => progress.push(p));
    expect(r.labels).toEqual(['W1', 'W2', 'W3']);
    expect(metricsOf(r)[1]).toMatchObject({ x: 0.434, y: 0.4031, ra: 92.5, source: 'table' });
    // Stored columns: x, y, …, Ra; the table's line numbers (header on line 1); ANSI C78.377-2017 Table 1 3000 K bin.
    expect([r.numbers[8], r.numbers[9], r.numbers[12]]).toEqual([0.434, 0.4031, 92.5]);
    expect(r.numbers[15]).toBe(3000);
    expect([...r.columnNo]).toEqual([2, 3, 4]);
    expect(r.profile).toEqual({ id: 7, version: 2 });
    expect(progress[0]).toEqual({ phase: 'parsing' });
    const gz = await readOn(readers, { kind: 'table', name: 't.csv.gz', body: bytes(gzipSync(table)), profile });
    expect(gz.metricsJson).toBe(r.metricsJson);
  });

  it('refuses a bad cell as the same DomainError, naming the line', async () => {
    const bad = table.replace('0.4031', 'abc');
    const err = await readOn(readers, { kind: 'table', name: 'bad.csv', body: bytes(bad), profile }).catch((e) => e);
    expect(err).toBeInstanceOf(DomainError);
    expect(err.kind).toBe('unprocessable');
    expect(err.issues[0].line).toBe(3);
    expect(err.message).toContain('bad.csv was not saved');
  });

  it('refuses a gzip file unpacking past the limit (413) and one cut short (422), across the thread', async () => {
    // 60,000 rows of 200 bytes (12 MB) pack to a few hundred kB; the tester-table limit is 11 MB
    // (src/lib/measurements/schema.ts), reached before the 100,000-row limit.
    const pad = 'n'.repeat(170);
    const rows = Array.from({ length: 60_000 }, (_, k) => `P${k},0.4338,0.4030,91,${pad}`);
    const bomb = bytes(gzipSync(['Serial,x,y,Ra,Note', ...rows].join('\n')));
    const big = await readOn(readers, { kind: 'table', name: 'big.csv.gz', body: bomb, profile }).catch((e) => e);
    expect(big).toBeInstanceOf(DomainError);
    expect(big.kind).toBe('too_large');
    expect(big.message).toContain('big.csv.gz unpacks to more than');
    // A gzip stream cut short fails its length and CRC trailer (RFC 1952 §2.3.1).
    const gz = gzipSync(table);
    const cut = await readOn(readers, { kind: 'table', name: 'cut.csv.gz', body: bytes(gz.subarray(0, gz.length - 6)), profile }).catch(
      (e) => e
    );
    expect(cut).toBeInstanceOf(DomainError);
    expect(cut.kind).toBe('unprocessable');
    expect(cut.message).toContain('damaged or incomplete gzip file');
  });

  it('reads a Windows-1252 table (not UTF-8) read again from the start, as decodeText does', async () => {
    // 0xB5 is µ in Windows-1252 (the WHATWG Encoding Standard index) and not valid UTF-8 on its own.
    const body = Buffer.from('Serial,x,y,Ra\nW1,0.4338,0.4030,91\nW\xb5,0.4340,0.4031,92\n', 'latin1');
    const r = await readOn(readers, { kind: 'table', name: 'w.csv', body: bytes(body), profile });
    expect(r.labels).toEqual(['W1', 'Wµ']);
  });

  it('measures spectra and reports progress per part', async () => {
    // Two parts: a yellow band with a blue peak (Gaussian shapes, invented), 380–780 nm at 5 nm.
    const rows = ['nm,A,B'];
    for (let l = 380; l <= 780; l += 5) {
      const a = Math.exp(-(((l - 565) / 70) ** 2)) + 0.6 * Math.exp(-(((l - 450) / 10) ** 2));
      rows.push(`${l},${a.toFixed(6)},${(0.95 * a).toFixed(6)}`);
    }
    const progress: UploadProgress[] = [];
    const r = await readOn(readers, { kind: 'spectra', name: 's.csv', body: bytes(rows.join('\n')) }, (p) => progress.push(p));
    expect(r.labels).toEqual(['A', 'B']);
    const [a, b] = metricsOf(r);
    // Scaling a spectrum leaves its chromaticity alone (CIE 15:2004 §7.3: x, y are ratios of the tristimulus values).
    expect(b.x).toBeCloseTo(a.x, 6); // 6 decimals in the file
    expect(JSON.parse(r.valuesJson.split('\n')[0])).toHaveLength(81);
    expect(progress.at(-1)).toEqual({ phase: 'measuring', done: 2, total: 2 });
  });
});
