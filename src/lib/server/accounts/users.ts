/** Users and their roles. */
import { db } from '../db/index';
import { writeTransaction } from '../db/transaction';
import { isRole, type Role } from '../../roles';

export interface User {
  id: number;
  email: string;
  name: string;
  active: boolean;
  roles: Role[];
  createdAt: Date;
}

interface UserRow {
  id: number;
  email: string;
  name: string;
  active: number | boolean;
  created_at: Date;
  password_hash?: string;
}

async function rolesOf(ids: number[]): Promise<Map<number, Role[]>> {
  const map = new Map<number, Role[]>();
  if (ids.length === 0) return map;
  const rows: { user_id: number; role: string }[] = await db()('user_roles').whereIn('user_id', ids).orderBy('role');
  for (const r of rows) if (isRole(r.role)) map.set(r.user_id, [...(map.get(r.user_id) ?? []), r.role]);
  return map;
}

function toUser(row: UserRow, roles: Role[]): User {
  return { id: row.id, email: row.email, name: row.name, active: Boolean(row.active), roles, createdAt: row.created_at };
}

/** One user with roles in a single round trip (runs on every request). */
export async function get(id: number): Promise<User | null> {
  const row: (UserRow & { roles: string | null }) | undefined = await db()('users as u')
    .leftJoin('user_roles as r', 'r.user_id', 'u.id')
    .where('u.id', id)
    .groupBy('u.id')
    .first('u.id', 'u.email', 'u.name', 'u.active', 'u.created_at', db().raw('GROUP_CONCAT(r.role ORDER BY r.role) AS roles'));
  if (!row) return null;
  return toUser(row, (row.roles ?? '').split(',').filter(isRole));
}

export async function findWithHashByEmail(email: string): Promise<(User & { passwordHash: string }) | null> {
  const row: UserRow | undefined = await db()('users').where({ email: email.toLowerCase() }).first();
  if (!row) return null;
  return { ...toUser(row, (await rolesOf([row.id])).get(row.id) ?? []), passwordHash: row.password_hash ?? '' };
}

export async function list(): Promise<User[]> {
  const rows: UserRow[] = await db()('users').orderBy('name').select('id', 'email', 'name', 'active', 'created_at');
  const roles = await rolesOf(rows.map((r) => r.id));
  return rows.map((r) => toUser(r, roles.get(r.id) ?? []));
}

export async function create(input: { email: string; name: string; passwordHash: string; roles: Role[] }): Promise<number> {
  return writeTransaction(async (trx) => {
    const [id] = await trx('users').insert({ email: input.email.toLowerCase(), name: input.name, password_hash: input.passwordHash });
    if (input.roles.length) await trx('user_roles').insert(input.roles.map((role) => ({ user_id: id, role })));
    return id;
  });
}

export async function setRoles(id: number, roles: Role[]): Promise<void> {
  await writeTransaction(async (trx) => {
    await trx('user_roles').where({ user_id: id }).delete();
    if (roles.length) await trx('user_roles').insert(roles.map((role) => ({ user_id: id, role })));
    await trx('users').where({ id }).update({ updated_at: trx.fn.now() });
  });
}

export async function setActive(id: number, active: boolean): Promise<void> {
  await db()('users')
    .where({ id })
    .update({ active, deactivated_at: active ? null : db().fn.now(), updated_at: db().fn.now() });
}

export async function byRole(role: Role): Promise<User[]> {
  const ids: { user_id: number }[] = await db()('user_roles').where({ role }).select('user_id');
  const all = await list();
  const wanted = new Set(ids.map((r) => r.user_id));
  return all.filter((u) => wanted.has(u.id) && u.active);
}
