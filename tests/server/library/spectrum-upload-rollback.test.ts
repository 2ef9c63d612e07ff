/**
 * A spectrum upload is four writes after the object is put into storage (stored_files row,
 * material_spectra row, the material's pointer/peak/FWHM/version, the audit event). Whichever of
 * them fails, the tables must hold exactly the rows they held before and the object must not stay
 * in storage. Each failure is injected by a trigger that refuses that one write.
 */
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { PutObjectCommand } from '@aws-sdk/client-s3';
import { db, closeDb } from '../../../src/lib/server/db/index';
import * as editing from '../../../src/lib/server/library/editing';
import { uploadSpectrum } from '../../../src/lib/server/library/spectrum-upload';
import { s3 } from '../../../src/lib/server/storage/client';
import { demoUser, gaussianCsv, phosphorFields, removeTestMaterials } from './support';
import {
  INJECTED,
  dropLeftoverFaults,
  expectObjectsGone,
  failureWithPuts,
  keysContaining,
  snapshot,
  withFailingWrite,
  type Fault
} from '../../support/faults';
import type { User } from '../../../src/lib/server/accounts/users';

const TABLES = ['materials', 'material_spectra', 'stored_files', 'audit_events'] as const;
const FAULTS: Fault[] = [
  { label: 'its stored_files row', table: 'stored_files', event: 'INSERT' },
  { label: 'its material_spectra row', table: 'material_spectra', event: 'INSERT' },
  {
    label: "the material's pointer, peak and version",
    table: 'materials',
    event: 'UPDATE',
    when: 'NOT (NEW.emission_spectrum_id <=> OLD.emission_spectrum_id)'
  },
  { label: 'its audit event', table: 'audit_events', event: 'INSERT', when: "NEW.action = 'emission-spectrum-upload'" }
];

let rhea: User;
let id = 0;
const run = Date.now().toString(36);

describe('spectrum upload: a failure after the first write leaves no rows and no stored object', () => {
  beforeAll(async () => {
    await dropLeftoverFaults();
    await removeTestMaterials();
    rhea = await demoUser('formulator');
    id = await editing.create(rhea, 'phosphor', phosphorFields('TST-RB1'));
  });
  afterAll(async () => {
    await dropLeftoverFaults();
    await removeTestMaterials();
    await closeDb();
  });

  it.each(FAULTS)('fails while writing $label: nothing saved, object removed', async (fault) => {
    const name = `rollback-${run}-${fault.table}.csv`;
    const before = await snapshot(TABLES);
    const { error, keys } = await withFailingWrite(fault, () =>
      failureWithPuts(() =>
        uploadSpectrum(rhea, id, 'emission', { name, contentType: 'text/csv', body: Buffer.from(gaussianCsv(560, 45)) }, 1)
      )
    );
    expect(error.message).toContain(INJECTED);
    // The object really went to storage before the failing write (one put), so clean-up is what is tested.
    expect(keys).toHaveLength(1);
    expect(await snapshot(TABLES)).toEqual(before);
    expect(await db()('stored_files').where({ original_name: name }).count({ n: '*' }).first()).toEqual({ n: 0 });
    const waited = await expectObjectsGone(keys);
    expect(await keysContaining('spectrum-source/', name)).toEqual([]);
    console.log(
      `spectrum upload, failure at ${fault.table} ${fault.event.toLowerCase()}: tables unchanged, object gone ${waited} ms after the error`
    );
  });

  it('object storage refusing the file: nothing saved', async () => {
    const name = `rollback-${run}-s3-down.csv`;
    const before = await snapshot(TABLES);
    const send = s3().send.bind(s3());
    const spy = vi.spyOn(s3(), 'send').mockImplementation(((command: unknown, ...rest: unknown[]) => {
      if (command instanceof PutObjectCommand) return Promise.reject(new Error('object storage unavailable (test)'));
      return (send as (...a: unknown[]) => unknown)(command, ...rest);
    }) as typeof send);
    try {
      await expect(
        uploadSpectrum(rhea, id, 'emission', { name, contentType: 'text/csv', body: Buffer.from(gaussianCsv(560, 45)) }, 1)
      ).rejects.toThrow('object storage unavailable (test)');
    } finally {
      spy.mockRestore();
    }
    expect(await snapshot(TABLES)).toEqual(before);
  });

  it('after the failures the same upload with the same version goes through', async () => {
    const r = await uploadSpectrum(
      rhea,
      id,
      'emission',
      { name: `rollback-${run}-ok.csv`, contentType: 'text/csv', body: Buffer.from(gaussianCsv(560, 45)) },
      1
    );
    expect(r.version).toBe(2);
    expect(await db()('material_spectra').where({ material_id: id }).count({ n: '*' }).first()).toEqual({ n: 1 });
    expect(await keysContaining('spectrum-source/', `rollback-${run}-ok.csv`)).toHaveLength(1);
  });
});
