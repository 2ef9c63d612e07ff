/**
 * Tester profiles: list, read, create and change (optimistic lock on the version read, audit event in
 * the same transaction). A name is unique; a profile in use keeps its history through the uploads'
 * recorded profile version.
 */
import { db } from '../db/index';
import { writeTransaction } from '../db/transaction';
import * as audit from '../db/audit';
import { conflict, notFound } from '../../errors/domain-error';
import { testerProfileSchema, type TesterProfile } from '../../tester-table/profile';

export interface TesterProfileRecord {
  id: number;
  version: number;
  profile: TesterProfile;
  updatedAt: Date;
}

const toRecord = (r: { id: number; version: number; profile_json: string; updated_at: Date }): TesterProfileRecord => ({
  id: r.id,
  version: r.version,
  profile: testerProfileSchema.parse(JSON.parse(r.profile_json)),
  updatedAt: r.updated_at
});

export async function listTesterProfiles(): Promise<TesterProfileRecord[]> {
  return (await db()('tester_profiles').orderBy('name')).map(toRecord);
}

export async function getTesterProfile(id: number): Promise<TesterProfileRecord> {
  const row = await db()('tester_profiles').where({ id }).first();
  if (!row) throw notFound(`Tester profile ${id}`);
  return toRecord(row);
}

async function nameTaken(name: string, except: number | null): Promise<boolean> {
  const q = db()('tester_profiles').where({ name });
  if (except !== null) q.whereNot({ id: except });
  return !!(await q.first('id'));
}

export async function createTesterProfile(actor: { id: number; email: string }, profile: TesterProfile): Promise<number> {
  const p = testerProfileSchema.parse(profile);
  if (await nameTaken(p.name, null)) throw conflict(`A tester profile named "${p.name}" already exists: choose another name, or edit it.`);
  return writeTransaction(async (trx) => {
    const [id] = await trx('tester_profiles').insert({
      name: p.name,
      profile_json: JSON.stringify(p),
      version: 1,
      created_by: actor.id,
      updated_by: actor.id
    });
    await audit.record(
      { actorId: actor.id, actorEmail: actor.email, entityType: 'tester-profile', entityId: id, action: 'create', after: p },
      trx
    );
    return id;
  });
}

/** Replaces a profile; `version` is the version read. Returns the new version. */
export async function updateTesterProfile(
  actor: { id: number; email: string },
  id: number,
  version: number,
  profile: TesterProfile
): Promise<number> {
  const p = testerProfileSchema.parse(profile);
  if (await nameTaken(p.name, id)) throw conflict(`A tester profile named "${p.name}" already exists: choose another name.`);
  return writeTransaction(async (trx) => {
    const row = await trx('tester_profiles').where({ id }).forUpdate().first();
    if (!row) throw notFound(`Tester profile ${id}`);
    if (row.version !== version)
      throw conflict(
        `Tester profile "${row.name}" was changed by someone else since you opened it (you edited version ${version}, it is now at ` +
          `version ${row.version}). Nothing was saved: reload, then make your change again.`
      );
    await trx('tester_profiles')
      .where({ id, version })
      .update({ name: p.name, profile_json: JSON.stringify(p), version: version + 1, updated_by: actor.id, updated_at: trx.fn.now(3) });
    await audit.record(
      {
        actorId: actor.id,
        actorEmail: actor.email,
        entityType: 'tester-profile',
        entityId: id,
        action: 'update',
        before: JSON.parse(row.profile_json),
        after: p
      },
      trx
    );
    return version + 1;
  });
}
