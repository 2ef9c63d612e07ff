/**
 * Demo people of Kestrel Hollow Lighting, an invented maker of LED modules.
 * Every name is invented. Password for all: phosforge-demo. Idempotent (keyed by e-mail).
 */
import type { Knex } from 'knex';
import bcrypt from 'bcryptjs';

export const DEMO_PASSWORD = 'phosforge-demo';

export const DEMO_USERS = [
  { email: 'rhea.okafor@kestrelhollow.example', name: 'Rhea Okafor', roles: ['formulator'] },
  { email: 'jonah.pell@kestrelhollow.example', name: 'Jonah Pell', roles: ['formulator'] },
  { email: 'tomas.brand@kestrelhollow.example', name: 'Tomas Brand', roles: ['technician'] },
  { email: 'mira.castellan@kestrelhollow.example', name: 'Mira Castellan', roles: ['technician'] },
  { email: 'ines.halloran@kestrelhollow.example', name: 'Ines Halloran', roles: ['quality'] },
  { email: 'admin@kestrelhollow.example', name: 'Sam Ardent', roles: ['admin'] }
] as const;

export async function seed(knex: Knex): Promise<void> {
  const hash = await bcrypt.hash(DEMO_PASSWORD, 11);
  for (const u of DEMO_USERS) {
    const existing = await knex('users').where({ email: u.email }).first('id');
    if (existing) continue;
    await knex.transaction(async (trx) => {
      const [id] = await trx('users').insert({ email: u.email, name: u.name, password_hash: hash });
      await trx('user_roles').insert(u.roles.map((role) => ({ user_id: id, role })));
    });
  }
}
