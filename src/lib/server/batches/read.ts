/**
 * Read side of batches for every feature (quality builds its release on it): one batch with its
 * lines, lots and revision; lists with filters; lot traceability in both directions.
 */
import type { Knex } from 'knex';
import { massAtStep } from '../../batches/weighout/mass-at-step';
import { db } from '../db/index';
import { getRevision, type RevisionRecord } from '../formulations/read';
import { toBatch, toLine, toSummary, type Batch, type BatchLine, type BatchSummary } from './records';
import type { BatchState } from '../../batches/schema';
import type { BatchLineRow } from '../db/tables';

export type { Batch, BatchLine, BatchSummary } from './records';

type Q = Knex | Knex.Transaction;

export interface LotRef {
  id: number;
  lotNumber: string;
  materialId: number;
  materialCode: string;
  supplier: string | null;
  expiresOn: Date | null;
}

export interface BatchDetail {
  batch: Batch;
  lines: (BatchLine & { lot: LotRef | null })[];
  revision: RevisionRecord | null;
  silicone: { cure: string; degasNotes: string | null; safetyNote: string | null };
}

export function batchQuery(k: Q = db()): Knex.QueryBuilder {
  return k('batches as b')
    .leftJoin('users as cu', 'cu.id', 'b.created_by')
    .leftJoin('users as mu', 'mu.id', 'b.mixed_by')
    .leftJoin('users as du', 'du.id', 'b.completed_by')
    .select('b.*', 'cu.name as created_by_name', 'mu.name as mixed_by_name', 'du.name as completed_by_name');
}

/** A batch line as read with its people and its lot (joined). */
export type LineReadRow = BatchLineRow & {
  weighed_by_name: string | null;
  override_by_name: string | null;
  lot_supplier: string | null;
  lot_expires_on: Date | null;
  lot_material_code: string | null;
  lot_material_id: number | null;
};

export async function lineRows(batchId: number, k: Q = db()): Promise<LineReadRow[]> {
  return k('batch_lines as l')
    .leftJoin('users as wu', 'wu.id', 'l.weighed_by')
    .leftJoin('users as ou', 'ou.id', 'l.override_by')
    .leftJoin('material_lots as ml', 'ml.id', 'l.lot_id')
    .leftJoin('materials as m', 'm.id', 'ml.material_id')
    .where('l.batch_id', batchId)
    .orderBy('l.seq')
    .select(
      'l.*',
      'wu.name as weighed_by_name',
      'ou.name as override_by_name',
      'ml.supplier as lot_supplier',
      'ml.expires_on as lot_expires_on',
      'm.code as lot_material_code',
      'ml.material_id as lot_material_id'
    );
}

/** The batch with its lines (each with its lot), its revision and the silicone handling notes; null if absent. */
export async function getBatch(id: number, k: Q = db()): Promise<BatchDetail | null> {
  if (!Number.isSafeInteger(id) || id <= 0) return null;
  const row = await batchQuery(k).where('b.id', id).first();
  if (!row) return null;
  const batch = toBatch(row);
  const lines = (await lineRows(id, k)).map((r) => ({
    ...toLine(r, batch.places),
    lot: r.lot_id
      ? {
          id: r.lot_id as number,
          lotNumber: r.lot_number as string,
          materialId: r.lot_material_id as number,
          materialCode: r.lot_material_code as string,
          supplier: (r.lot_supplier as string | null) ?? null,
          expiresOn: (r.lot_expires_on as Date | null) ?? null
        }
      : null
  }));
  const sys = batch.siliconeSystemId
    ? await k('silicone_systems').where({ id: batch.siliconeSystemId }).first('cure', 'degas_notes', 'safety_note')
    : null;
  const revision = await getRevision(batch.revisionId, k);
  return {
    batch,
    lines,
    revision,
    silicone: {
      cure: sys?.cure ?? revision?.content.silicone.cure ?? '',
      degasNotes: sys?.degas_notes ?? null,
      safetyNote: sys?.safety_note ?? null
    }
  };
}

export async function getBatchIdByNumber(batchNumber: string): Promise<number | null> {
  const row = await db()('batches').where({ batch_number: batchNumber.trim() }).first('id');
  return row?.id ?? null;
}

export interface BatchFilter {
  state?: BatchState;
  q?: string;
  lot?: string;
  revisionId?: number;
  limit?: number;
  offset?: number;
}

const like = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);

/** Batches newest first; `q` matches the batch number or a lot used (chip lot included); `lot` is an exact lot number. */
export async function listBatches(f: BatchFilter = {}): Promise<{ items: BatchSummary[]; total: number }> {
  const base = db()('batches as b');
  if (f.state) base.where('b.state', f.state);
  if (f.revisionId) base.where('b.revision_id', f.revisionId);
  if (f.q) {
    const q = f.q;
    base.where((w) =>
      w
        .where('b.batch_number', 'like', `%${like(q)}%`)
        .orWhere('b.chip_lot', 'like', `${like(q)}%`)
        .orWhereExists((s) =>
          s
            .select(db().raw('1'))
            .from('batch_lines as l')
            .whereRaw('l.batch_id = b.id')
            .andWhere('l.lot_number', 'like', `${like(q)}%`)
        )
    );
  }
  if (f.lot) {
    const lot = f.lot;
    base.where((w) =>
      w
        .where('b.chip_lot', lot)
        .orWhereExists((s) => s.select(db().raw('1')).from('batch_lines as l').whereRaw('l.batch_id = b.id').andWhere('l.lot_number', lot))
    );
  }
  const [{ n }] = await base.clone().count({ n: '*' });
  const rows = await base
    .leftJoin('users as cu', 'cu.id', 'b.created_by')
    .select('b.*', 'cu.name as created_by_name')
    .orderBy('b.created_at', 'desc')
    .orderBy('b.id', 'desc')
    .limit(f.limit ?? 50)
    .offset(f.offset ?? 0);
  return { items: rows.map(toSummary), total: Number(n) };
}

export interface LotTrace {
  lot: LotRef;
  batches: (BatchSummary & { lines: { seq: number; code: string; actualG: string | null }[] })[];
}

/**
 * From a lot number to every batch that used it: per material lot with that number, the batches
 * that recorded it as text on a silicone or additive line, and the batches built with it as chip lot.
 */
export async function traceLot(lotNumber: string): Promise<{ lots: LotTrace[]; unlinked: BatchSummary[]; chipLots: BatchSummary[] }> {
  const lots = await db()('material_lots as ml')
    .join('materials as m', 'm.id', 'ml.material_id')
    .where('ml.lot_number', lotNumber.trim())
    .select('ml.*', 'm.code as material_code');
  const out: LotTrace[] = [];
  for (const l of lots) {
    const rows = await db()('batch_lines as bl')
      .join('batches as b', 'b.id', 'bl.batch_id')
      .leftJoin('users as cu', 'cu.id', 'b.created_by')
      .where('bl.lot_id', l.id)
      .orderBy('b.created_at', 'desc')
      .select('b.*', 'cu.name as created_by_name', 'bl.seq as line_seq', 'bl.code as line_code', 'bl.actual_g as line_actual_g');
    const byBatch = new Map<number, LotTrace['batches'][number]>();
    for (const r of rows) {
      const entry = byBatch.get(r.id) ?? { ...toSummary(r), lines: [] };
      // Masses at the batch balance's step, so "64.900" and "2.857" read alike.
      entry.lines.push({
        seq: r.line_seq,
        code: r.line_code,
        actualG: r.line_actual_g === null ? null : massAtStep(r.line_actual_g, r.resolution_g)
      });
      byBatch.set(r.id, entry);
    }
    out.push({
      lot: {
        id: l.id,
        lotNumber: l.lot_number,
        materialId: l.material_id,
        materialCode: l.material_code,
        supplier: l.supplier,
        expiresOn: l.expires_on
      },
      batches: [...byBatch.values()]
    });
  }
  // Lines without a library material (silicone parts, additives) keep the lot as text only.
  const unlinked = await db()('batches as b')
    .leftJoin('users as cu', 'cu.id', 'b.created_by')
    .whereExists((s) =>
      s
        .select(db().raw('1'))
        .from('batch_lines as l')
        .whereRaw('l.batch_id = b.id')
        .whereNull('l.lot_id')
        .andWhere('l.lot_number', lotNumber.trim())
    )
    .select('b.*', 'cu.name as created_by_name')
    .orderBy('b.created_at', 'desc');
  const chipLots = await db()('batches as b')
    .leftJoin('users as cu', 'cu.id', 'b.created_by')
    .where('b.chip_lot', lotNumber.trim())
    .select('b.*', 'cu.name as created_by_name')
    .orderBy('b.created_at', 'desc');
  return { lots: out, unlinked: unlinked.map(toSummary), chipLots: chipLots.map(toSummary) };
}
