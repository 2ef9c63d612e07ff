/** Query of GET /api/v1/blend-components: `pump=<id>&phosphors=<id>,<id>,…` (1–5 distinct phosphors). */
import { z } from 'zod';

const id = z.coerce.number('ids are numbers').int('ids are whole numbers').positive('ids are positive');

export const componentQuerySchema = z.object({
  pump: id,
  phosphors: z
    .string('phosphors: give 1–5 material ids separated by commas')
    .transform((s) => s.split(',').filter((p) => p.trim() !== ''))
    .pipe(z.array(id).min(1, 'phosphors: at least one').max(5, 'phosphors: at most 5'))
    .refine((ids) => new Set(ids).size === ids.length, 'phosphors: each phosphor may appear only once')
});

export function componentQueryString(pumpId: number, phosphorIds: readonly number[]): string {
  return `pump=${pumpId}&phosphors=${phosphorIds.join(',')}`;
}
