/**
 * Targets of the API fuzz tests, made through the product's own services from the seeded demo data
 * (Kestrel Hollow Lighting, invented): a quality signer with a cheap password hash, probe
 * formulations and revisions in each state, probe batches at each stage of the weigh-out (one
 * shortcut: see probeBatch) and measurement uploads of synthetic parts.
 */
import bcrypt from 'bcryptjs';
import { db } from '../../../src/lib/server/db/index';
import * as users from '../../../src/lib/server/accounts/users';
import type { User } from '../../../src/lib/server/accounts/users';
import { createFormulationWithDraft, createRevision } from '../../../src/lib/server/formulations/save';
import { sign, submit } from '../../../src/lib/server/formulations/workflow';
import { createBatch } from '../../../src/lib/server/batches/create';
import { getBatch } from '../../../src/lib/server/batches/read';
import { markMixed, recordLine } from '../../../src/lib/server/batches/weighing';
import { createBatchSchema } from '../../../src/lib/batches/schema';
import { getRevision } from '../../../src/lib/server/formulations/read';
import { loadBlendComponents } from '../../../src/lib/server/library/components';
import { fractionsWithLeak, materialIdsOf } from '../../../src/lib/recipe';
import { syntheticPartsCsv } from '../../../src/lib/measurements/syntheticParts';
import { uploadMeasurements } from '../../../src/lib/server/measurements/upload';
import { userByEmail } from './fuzz-support';

const AUTHOR_EMAIL = 'rhea.okafor@kestrelhollow.example';
const TECHNICIAN_EMAIL = 'tomas.brand@kestrelhollow.example';
const SIGNER_EMAIL = 'fuzz.signer@kestrelhollow.example';
export const SIGNER_PASSWORD = 'fuzz-probe-signer-password';

/**
 * A quality signer whose password hash has bcrypt cost 4 (the product uses 11), so the thousand
 * signature checks of a fuzz run take milliseconds. Reset on every call; active only while a fuzz
 * file runs (see retireSigner), so other tests never see an extra quality reviewer.
 */
export async function probeSigner(): Promise<User> {
  const hash = bcrypt.hashSync(SIGNER_PASSWORD, 4);
  const old = await db()('users').where({ email: SIGNER_EMAIL }).first('id');
  // Audit rows and signatures keep their signer, so an existing account is reset rather than deleted.
  const id = old?.id ?? (await users.create({ email: SIGNER_EMAIL, name: 'Fuzz Probe Signer', passwordHash: hash, roles: ['quality'] }));
  if (old) {
    await db()('users').where({ id }).update({ password_hash: hash });
    await users.setRoles(id, ['quality']);
    await users.setActive(id, true);
  }
  await forgetSignerFailures();
  return userByEmail(SIGNER_EMAIL);
}

/**
 * The fuzz sends wrong signature passwords on purpose; five of them lock the probe signer for 15
 * minutes (the product's guessing limit). Probes made after such a run start from a clean count.
 */
async function forgetSignerFailures(): Promise<void> {
  await db()('sign_in_attempts').where({ email: SIGNER_EMAIL }).del();
}

export async function retireSigner(): Promise<void> {
  const row = await db()('users').where({ email: SIGNER_EMAIL }).first('id');
  if (row) await users.setActive(row.id, false);
}

/** The content of the seeded, approved KH-W30-90 revision (its materials have current lots). */
async function approvedContent(): Promise<unknown> {
  const row = await db()('formulation_revisions as r')
    .join('formulations as f', 'f.id', 'r.formulation_id')
    .where({ 'f.code': 'KH-W30-90', 'r.state': 'approved' })
    .first('r.content_json');
  if (!row) throw new Error('no approved revision of KH-W30-90: run the tests in a seeded sandbox');
  return JSON.parse(row.content_json);
}

export interface ProbeFormulation {
  formulationId: number;
  firstRevisionId: number;
  content: unknown;
}

/**
 * A new formulation by the demo formulator, its first revision a draft with the KH-W30-90 content.
 * Its code is given (FZ-…): the suggested codes under KH-W30-90 run out after many fuzz runs.
 */
export async function probeFormulation(author: User, label: string): Promise<ProbeFormulation> {
  const content = await approvedContent();
  const stamp = `${Date.now().toString(36)}${Math.floor(Math.random() * 1296).toString(36)}`.toUpperCase();
  const made = await createFormulationWithDraft(author, {
    code: `FZ-${label.toUpperCase()}-${stamp}`,
    name: `Fuzz probe ${label} ${stamp}`,
    description: 'fuzz probe',
    content
  });
  return { formulationId: made.formulationId, firstRevisionId: made.revisionId, content };
}

export async function probeDraft(author: User, f: ProbeFormulation): Promise<number> {
  return (await createRevision(author, f.formulationId, f.content)).revisionId;
}

export async function probeSubmitted(author: User, f: ProbeFormulation): Promise<number> {
  const id = await probeDraft(author, f);
  await submit(author, id);
  return id;
}

/** A probe formulation with an approved revision (written by `author`, approved by `signer`). */
export async function probeApprovedRevision(author: User, signer: User, label: string): Promise<number> {
  const f = await probeFormulation(author, label);
  await submit(author, f.firstRevisionId);
  await forgetSignerFailures();
  await sign(signer, f.firstRevisionId, 'approved', { password: SIGNER_PASSWORD, comment: 'fuzz probe' });
  return f.firstRevisionId;
}

export type BatchStage = 'planned' | 'partB' | 'outOfRange' | 'mixed' | 'complete';

async function currentLot(materialId: number): Promise<string> {
  const lot = await db()('material_lots')
    .where({ material_id: materialId })
    .where((w) => w.whereNull('expires_on').orWhere('expires_on', '>', new Date()))
    .orderBy('id', 'desc')
    .first('lot_number');
  if (!lot) throw new Error(`material ${materialId} has no current lot`);
  return lot.lot_number;
}

/** A valid reading of a line: its target and a current lot (silicone parts take any lot text). */
export async function lineReading(line: { materialId: number | null; targetG: string }): Promise<{ actualG: string; lotNumber: string }> {
  return { actualG: line.targetG, lotNumber: line.materialId ? await currentLot(line.materialId) : 'FZ-SIL-LOT' };
}

/**
 * A 10 g batch of `revisionId` planned by `technician`, taken to `stage`: partB = only part B read;
 * outOfRange = the first phosphor line read 20 % high; mixed = every line read on target and part B
 * noted as mixed in; complete = mixed, then marked complete in the database without its batch
 * record PDF (building that takes about half a second; the complete route itself is fuzzed on
 * mixed batches, and the quality routes do not read the stored record).
 */
export async function probeBatch(technician: User, revisionId: number, stage: BatchStage): Promise<number> {
  const { id } = await createBatch(
    technician,
    createBatchSchema.parse({
      revisionId,
      sizing: { kind: 'mass', batchMassG: 10 },
      loading: { mode: 'perPhosphor', basis: 'wtPctOfSlurry' },
      additives: [],
      balance: { resolutionG: 0.001, minWeightG: 0.05, ref: 'BAL-FZ1' },
      plantLimitMin: 120
    })
  );
  if (stage === 'planned') return id;
  const lines = (await getBatch(id))!.lines;
  const read = async (line: (typeof lines)[number], actualG?: string) =>
    recordLine(technician, id, line.seq, { ...(await lineReading(line)), ...(actualG ? { actualG } : {}), version: line.version });
  if (stage === 'partB') {
    await read(lines.find((l) => l.role === 'siliconeB')!);
    return id;
  }
  if (stage === 'outOfRange') {
    const line = lines.find((l) => l.materialId !== null)!;
    await read(line, (Number(line.targetG) * 1.2).toFixed(3));
    return id;
  }
  for (const line of lines) await read(line);
  await markMixed(technician, id, { version: (await getBatch(id))!.batch.version });
  if (stage === 'complete') {
    await db()('batches')
      .where({ id })
      .update({ state: 'complete', completed_at: new Date(), completed_by: technician.id, version: db().raw('version + 1') });
  }
  return id;
}

/** Uploads `parts` synthetic measured parts of the batch's revision, labelled `${prefix}-001`… */
export async function probeUpload(signer: User, batchId: number, parts: number, prefix: string): Promise<number> {
  const rev = (await getRevision((await getBatch(batchId))!.batch.revisionId))!;
  const ids = materialIdsOf(rev.content);
  const components = await loadBlendComponents(ids.pump, ids.phosphors);
  const fractions = fractionsWithLeak(rev.content);
  const csv = syntheticPartsCsv(components, fractions, { parts, prefix: `${prefix}-` });
  const file = { name: `${prefix}.csv`, contentType: 'text/csv', body: Buffer.from(csv, 'utf8') };
  return (await uploadMeasurements(signer, batchId, file)).uploadId;
}

/**
 * The current version of a row of `table` (the optimistic lock a valid body names), read again only
 * after a success or for another row: a refusal changes nothing (the fuzz loop checks that).
 */
export function versionReader(table: string) {
  let key = '';
  let cached = 0;
  return async (where: Record<string, unknown>, lastStatus: number | undefined): Promise<number> => {
    const k = JSON.stringify(where);
    if (k !== key || lastStatus === undefined || lastStatus < 400) {
      const row = await db()(table).where(where).first('version');
      cached = row ? Number(row.version) : 0;
      key = k;
    }
    return cached;
  };
}

export const technician = () => userByEmail(TECHNICIAN_EMAIL);
export const author = () => userByEmail(AUTHOR_EMAIL);
