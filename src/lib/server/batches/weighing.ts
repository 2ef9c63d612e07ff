/**
 * Weighing commands: record a line's reading and lot, accept an out-of-range reading (quality,
 * e-signed with the password), note the time part B was mixed in. Each runs in one transaction
 * with the batch row locked, checks the version the caller read, and is audited.
 */
import { writeTransaction } from '../db/transaction';
import { record } from '../db/audit';
import { checkSigningPassword } from '../auth/signing-password';
import type { User } from '../accounts/users';
import { checkActual, parseReadingG, type ActualCheck } from '../../batches/weighout/actual';
import { slurryExpiry } from '../../batches/weighout/potlife';
import { forbidden } from '../../errors/domain-error';
import { mayAcceptDeviation } from '../../access/policies';
import { conflict, invalid } from './errors';
import { checkLot } from './lots';
import { expectState, expectVersion, lockBatch, lockLine } from './lock';
import { decimalText, placesOf } from './records';

export interface RecordLineInput {
  actualG: string;
  lotNumber: string;
  version: number;
}

export async function recordLine(
  user: User,
  batchId: number,
  seq: number,
  input: RecordLineInput
): Promise<ActualCheck & { lineVersion: number }> {
  const reading = parseReadingG(input.actualG);
  if (!reading)
    throw invalid(`"${input.actualG}" is not a balance reading: enter grams, e.g. 12.345.`, [
      { path: 'actualG', message: 'not a reading in g' }
    ]);
  return writeTransaction(async (trx) => {
    const batch = await lockBatch(trx, batchId);
    expectState(batch, ['planned', 'weighing'], 'take new readings');
    const line = await lockLine(trx, batchId, seq);
    expectVersion(line, input.version, `Line ${seq} (${line.code})`);
    const lot = await checkLot(trx, line, input.lotNumber);
    const places = placesOf(batch.resolution_g);
    const check = checkActual(reading, {
      targetG: decimalText(line.target_g, places),
      lowG: decimalText(line.low_g, places),
      highG: decimalText(line.high_g, places)
    });
    const after = {
      actual_g: reading.toDecimal(7),
      actual_status: check.status,
      lot_id: lot.lotId,
      lot_number: lot.lotNumber,
      weighed_by: user.id,
      weighed_at: new Date(),
      override_by: null,
      override_at: null,
      override_reason: null,
      version: line.version + 1
    };
    await trx('batch_lines').where({ id: line.id }).update(after);
    if (batch.state === 'planned') {
      await trx('batches')
        .where({ id: batchId })
        .update({ state: 'weighing', version: batch.version + 1, updated_at: new Date() });
      await record(
        {
          actorId: user.id,
          actorEmail: user.email,
          entityType: 'batch',
          entityId: batchId,
          action: 'start_weighing',
          before: { state: 'planned' },
          after: { state: 'weighing' }
        },
        trx
      );
    }
    await record(
      {
        actorId: user.id,
        actorEmail: user.email,
        entityType: 'batch_line',
        entityId: line.id,
        action: 'record_reading',
        before: { actualG: line.actual_g, lot: line.lot_number, status: line.actual_status, override: line.override_reason },
        after: { batchId, seq, actualG: after.actual_g, lot: lot.lotNumber, status: check.status, deviationG: check.deviationG }
      },
      trx
    );
    return { ...check, lineVersion: after.version };
  });
}

export interface OverrideInput {
  reason: string;
  password: string;
  version: number;
}

export async function acceptDeviation(user: User, batchId: number, seq: number, input: OverrideInput): Promise<void> {
  if (!mayAcceptDeviation(user)) throw forbidden('Only quality can accept a reading outside its range.');
  if (!(await checkSigningPassword(user, input.password, { entityType: 'batch', entityId: batchId }))) {
    throw forbidden('The password is not correct: the decision was not signed and nothing was saved.', [
      { path: 'password', message: 'wrong password' }
    ]);
  }
  await writeTransaction(async (trx) => {
    const batch = await lockBatch(trx, batchId);
    expectState(batch, ['weighing'], 'accept deviations');
    const line = await lockLine(trx, batchId, seq);
    expectVersion(line, input.version, `Line ${seq} (${line.code})`);
    if (line.actual_status !== 'below' && line.actual_status !== 'above')
      throw conflict(`Line ${seq} (${line.code}) is not out of range: there is nothing to accept.`);
    if (line.weighed_by === user.id) throw forbidden('A deviation must be accepted by someone other than the person who weighed the line.');
    await trx('batch_lines')
      .where({ id: line.id })
      .update({ override_by: user.id, override_at: new Date(), override_reason: input.reason, version: line.version + 1 });
    await record(
      {
        actorId: user.id,
        actorEmail: user.email,
        entityType: 'batch_line',
        entityId: line.id,
        action: 'accept_deviation',
        before: { status: line.actual_status, actualG: line.actual_g },
        after: { batchId, seq, reason: input.reason, meaning: 'deviation accepted by quality' }
      },
      trx
    );
  });
}

export async function markMixed(
  user: User,
  batchId: number,
  input: { version: number; mixedAt?: Date }
): Promise<{ mixedAt: Date; expiresAt: Date }> {
  return writeTransaction(async (trx) => {
    const batch = await lockBatch(trx, batchId);
    expectVersion(batch, input.version, `Batch ${batch.batch_number}`);
    expectState(batch, ['weighing'], 'be marked as mixed');
    if (batch.mixed_at) throw conflict(`Part B was already noted as mixed in at ${new Date(batch.mixed_at).toISOString()}.`);
    const partB = await trx('batch_lines').where({ batch_id: batchId, role: 'siliconeB' }).first('actual_g');
    if (!partB || partB.actual_g === null) throw conflict('Record the part B reading before noting the mixing time.');
    const now = new Date();
    const mixedAt = input.mixedAt ?? now;
    if (mixedAt.getTime() > now.getTime() + 60_000) throw invalid('The mixing time cannot be in the future.');
    if (mixedAt.getTime() < new Date(batch.created_at).getTime()) throw invalid('The mixing time cannot be before the batch was planned.');
    const limit = slurryExpiry(mixedAt, batch.pot_life_min, batch.plant_limit_min);
    await trx('batches')
      .where({ id: batchId })
      .update({ mixed_at: mixedAt, slurry_expires_at: limit.expiresAt, mixed_by: user.id, version: batch.version + 1, updated_at: now });
    await record(
      {
        actorId: user.id,
        actorEmail: user.email,
        entityType: 'batch',
        entityId: batchId,
        action: 'mixed',
        after: { mixedAt, expiresAt: limit.expiresAt, limitedBy: limit.limitedBy }
      },
      trx
    );
    return { mixedAt, expiresAt: limit.expiresAt };
  });
}
