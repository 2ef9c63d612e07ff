/** Form and API schemas for accounts (shared by pages and endpoints). */
import { z } from 'zod';
import { ROLES } from '../roles';
import { plainText } from '../errors/hidden-characters';

export const rolesField = z.array(z.enum(ROLES, 'Unknown role')).min(1, 'Pick at least one role');

export const inviteSchema = z.object({
  email: z.string().trim().toLowerCase().max(254).pipe(z.email('Enter a valid e-mail address')),
  roles: rolesField
});

export const rolesSchema = z.object({ userId: z.coerce.number().int().positive(), roles: rolesField });

export const activeSchema = z.object({ userId: z.coerce.number().int().positive(), active: z.enum(['true', 'false']) });

export const acceptSchema = z
  .object({
    name: z.string().trim().min(2, 'Enter your name').max(120, 'At most 120 characters').superRefine(plainText('Name')),
    password: z.string().min(12, 'At least 12 characters').max(200, 'At most 200 characters'),
    confirm: z.string()
  })
  .refine((v) => v.password === v.confirm, { message: 'The two passwords differ', path: ['confirm'] });
