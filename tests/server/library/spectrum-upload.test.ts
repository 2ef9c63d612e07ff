import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db, closeDb } from '../../../src/lib/server/db/index';
import * as editing from '../../../src/lib/server/library/editing';
import * as records from '../../../src/lib/server/library/records';
import { uploadSpectrum } from '../../../src/lib/server/library/spectrum-upload';
import { getFile } from '../../../src/lib/server/storage/objects';
import { counts, demoUser, gaussianCsv, phosphorFields, removeTestMaterials } from './support';
import type { User } from '../../../src/lib/server/accounts/users';

let rhea: User;
let id = 0;
const file = (text: string, name = 'band.csv') => ({ name, contentType: 'text/csv', body: Buffer.from(text, 'utf8') });

describe('spectrum upload: a valid file is stored, a bad file saves nothing', () => {
  beforeAll(async () => {
    await removeTestMaterials();
    rhea = await demoUser('formulator');
    id = await editing.create(rhea, 'phosphor', phosphorFields('TST-U1'));
  });
  afterAll(async () => {
    await removeTestMaterials();
    await closeDb();
  });

  it('stores the original file, the parsed spectrum, peak and FWHM, and bumps the version', async () => {
    const text = gaussianCsv(550, 40);
    const r = await uploadSpectrum(rhea, id, 'emission', file(text), 1);
    expect(r.version).toBe(2);
    const m = await records.get(id);
    // Hand-worked: exp(−((λ−550)/40)²) peaks at 550 nm; half maximum where ((λ−550)/40)² = ln 2,
    // so FWHM = 2·40·√ln2 = 66.60 nm (linear interpolation of 5 nm samples adds < 0.3 nm).
    expect(m?.peakNm).toBeCloseTo(550, 1);
    expect(m?.fwhmNm).toBeGreaterThan(66.3);
    expect(m?.fwhmNm).toBeLessThan(66.9);
    expect(m?.emissionSpectrumId).toBe(r.spectrumId);
    const spectrum = (await db()('material_spectra').where({ id: r.spectrumId }).first())!;
    expect(spectrum).toMatchObject({ kind: 'emission', points: 81, origin: 'upload' });
    const stored = await getFile(spectrum.source_file_id!);
    expect(stored?.body.toString('utf8')).toBe(text);
    expect(stored?.row).toMatchObject({ purpose: 'spectrum-source', entityType: 'material', entityId: String(id) });
    const ev = (await db()('audit_events')
      .where({ entity_type: 'material', entity_id: String(id), action: 'emission-spectrum-upload' })
      .first())!;
    expect(JSON.parse(ev.after_json!)).toMatchObject({ file: 'band.csv', points: 81 });
  });

  it('accepts an excitation spectrum without touching peak and FWHM', async () => {
    const before = await records.get(id);
    await uploadSpectrum(rhea, id, 'excitation', file(gaussianCsv(450, 30, ';').replace(/\./g, ',')), before!.version);
    const after = await records.get(id);
    expect(after?.excitationSpectrumId).not.toBeNull();
    expect(after?.peakNm).toBe(before?.peakNm);
  });

  // Each bad file: the error names the line (counted by hand: header on line 1, 380 nm on line 2,
  // 380 + 5·k nm on line k + 2), and the database is unchanged afterwards.
  const lines = gaussianCsv().split('\n');
  const replaced = (index: number, row: string) => lines.map((l, i) => (i === index ? row : l)).join('\n');
  const bad = [
    { name: 'non-numeric value', text: replaced(10, '425,high'), line: 11, message: /"high" is not a number/ },
    { name: 'decreasing wavelengths', text: replaced(10, '410,0.1'), line: 11, message: /lower than 420 nm on line 10/ },
    { name: 'duplicate wavelength', text: replaced(10, '420,0.1'), line: 11, message: /repeats line 10/ },
    { name: 'negative intensity beyond noise', text: replaced(10, '425,-0.2'), line: 11, message: /negative beyond noise/ },
    { name: 'too few points', text: lines.slice(0, 8).join('\n'), line: null, message: /7 data points; at least 20/ },
    { name: 'wavelength outside 300–900 nm', text: `${lines.join('\n')}\n950,0.001`, line: 83, message: /950 nm is outside 300–900 nm/ }
  ];

  it.each(bad)('refuses a file with a $name and saves nothing', async ({ text, line, message }) => {
    const before = await counts(id);
    const version = (await records.get(id))!.version;
    const attempt = uploadSpectrum(rhea, id, 'emission', file(text, 'bad.csv'), version);
    await expect(attempt).rejects.toMatchObject({ status: 422, message: expect.stringMatching(/bad\.csv was not saved/) });
    const err = await uploadSpectrum(rhea, id, 'emission', file(text, 'bad.csv'), version).catch((e) => e);
    expect(err.issues[0].line).toBe(line);
    expect(err.issues[0].message).toMatch(message);
    expect(await counts(id)).toEqual(before);
  });

  it('refuses a file above 2 MB and saves nothing', async () => {
    const before = await counts(id);
    const big = `${gaussianCsv()}\n${'# padding\n'.repeat(220_000)}`;
    await expect(uploadSpectrum(rhea, id, 'emission', file(big), before.version)).rejects.toMatchObject({
      status: 413,
      message: expect.stringMatching(/limit is 2\.0 MB/)
    });
    expect(await counts(id)).toEqual(before);
  });

  it('refuses an upload based on a stale version and saves nothing', async () => {
    const before = await counts(id);
    await expect(uploadSpectrum(rhea, id, 'emission', file(gaussianCsv(560)), before.version - 1)).rejects.toMatchObject({ status: 409 });
    expect(await counts(id)).toEqual(before);
    const orphans = await db()('stored_files')
      .where({ entity_type: 'material', entity_id: String(id) })
      .count({ n: '*' })
      .first();
    expect(Number(orphans?.n)).toBe(before.files);
  });
});
