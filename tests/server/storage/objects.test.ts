import { afterAll, describe, expect, it } from 'vitest';
import { createHash } from 'node:crypto';
import { db, closeDb } from '../../../src/lib/server/db/index';
import { deleteFile, deleteStoredObject, getFile, putFile, safeFileName } from '../../../src/lib/server/storage/objects';

describe('object storage (S3 API, local fake)', () => {
  afterAll(closeDb);

  it('stores a file, records its metadata and hash, and reads it back byte for byte', async () => {
    const body = Buffer.from('wavelength,intensity\n450,1\n', 'utf8');
    const id = await putFile({
      body,
      originalName: 'blue chip.csv',
      contentType: 'text/csv',
      purpose: 'spectrum-source',
      entityType: 'probe',
      entityId: 1
    });
    const got = await getFile(id);
    expect(got?.body.equals(body)).toBe(true);
    expect(got?.row).toMatchObject({
      originalName: 'blue chip.csv',
      bytes: body.length,
      purpose: 'spectrum-source',
      entityType: 'probe',
      entityId: '1'
    });
    expect(got?.row.sha256).toBe(createHash('sha256').update(body).digest('hex'));
    expect(await deleteFile(id)).toBe(true);
    expect(await getFile(id)).toBeNull();
  });

  it('removes the object again when the surrounding transaction rolls back', async () => {
    let key = '';
    await expect(
      db().transaction(async (trx) => {
        const id = await putFile({ body: Buffer.from('x'), originalName: 'x.txt', contentType: 'text/plain', purpose: 'attachment' }, trx);
        key = (await trx('stored_files').where({ id }).first())!.storage_key;
        throw new Error('later step failed');
      })
    ).rejects.toThrow('later step failed');
    expect(await db()('stored_files').where({ storage_key: key }).first()).toBeUndefined();
    await new Promise((r) => setTimeout(r, 100));
    const { s3, bucket } = await import('../../../src/lib/server/storage/client');
    const { HeadObjectCommand } = await import('@aws-sdk/client-s3');
    await expect(s3().send(new HeadObjectCommand({ Bucket: bucket(), Key: key }))).rejects.toMatchObject({
      $metadata: { httpStatusCode: 404 }
    });
    await deleteStoredObject(key); // repeating the clean-up is harmless
  });

  it('makes file names safe for keys', () => {
    expect(safeFileName('../../etc/passwd')).toBe('passwd');
    expect(safeFileName('Lot 7 — CoA (final).pdf')).toBe('Lot_7_CoA_final_.pdf');
  });
});
