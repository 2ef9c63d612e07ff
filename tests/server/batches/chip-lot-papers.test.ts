/**
 * The chip lot and bin on the batch papers and in lot trace: the ticket prints the lot, the bin
 * (code, range, basis) and the bin's predicted point; the batch record carries the lot; tracing the
 * chip lot finds the batch. Bin values from tests/fixtures/recipe-matrix.ts.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb } from '../../../src/lib/server/db/index';
import { createBatch } from '../../../src/lib/server/batches/create';
import { listBatches, traceLot } from '../../../src/lib/server/batches/read';
import { batchRecordPdf, batchTicketPdf } from '../../../src/lib/server/batches/documents';
import { createBatchSchema } from '../../../src/lib/batches/schema';
import { pdfToText } from '../pdf/pdf-text';
import { demoUser, makeFixture, request } from './support';

const chipLot = `KH-CHIP-${Math.random().toString(36).slice(2, 7).toUpperCase()}`;
let id: number;
let plainId: number;

beforeAll(async () => {
  const [fx, plain, tech] = await Promise.all([makeFixture({ matrix: true }), makeFixture(), demoUser('technician')]);
  id = (
    await createBatch(tech, createBatchSchema.parse({ ...request(fx.revisionId), chipLot: { lotNumber: chipLot, wavelengthNm: 453.1 } }))
  ).id;
  plainId = (await createBatch(tech, createBatchSchema.parse({ ...request(plain.revisionId), chipLot: { lotNumber: `${chipLot}-P` } }))).id;
});
afterAll(closeDb);

const text = (pdf: Buffer) => pdfToText(pdf, false).replace(/\s+/g, ' ');

describe('chip lot on the papers', () => {
  it("the ticket prints the chip lot, the bin weighed with its range and basis, and the bin's predicted point", async () => {
    const t = text((await batchTicketPdf(id)).pdf);
    expect(t).toContain(`${chipLot} (measured 453.1 nm peak)`);
    expect(t).toContain('B3 · 452.5–455 nm peak');
    expect(t).toContain('x 0.4345, y 0.4025 · 3000 K, Duv 0.0000 · Ra 90, R9 20 · 0.4 steps from target');
  });

  it('the batch record carries the chip lot; a batch without a matrix prints the lot alone', async () => {
    expect(text((await batchRecordPdf(id)).pdf)).toContain(chipLot);
    const plain = text((await batchTicketPdf(plainId)).pdf);
    expect(plain).toContain(`${chipLot}-P`);
    expect(plain).toContain('Chip lot');
    expect(plain).not.toContain('Chip bin');
  });
});

describe('chip lot in lot trace', () => {
  it('tracing the chip lot finds the batch built with it, and the lot filter finds it too', async () => {
    expect((await traceLot(chipLot)).chipLots.map((b) => b.id)).toEqual([id]);
    expect((await listBatches({ lot: chipLot })).items.map((b) => b.id)).toEqual([id]);
    expect((await listBatches({ lot: `${chipLot}-P` })).items.map((b) => b.id)).toEqual([plainId]);
    expect((await listBatches({ q: chipLot })).items.map((b) => b.id).sort()).toEqual([id, plainId].sort());
  });
});
