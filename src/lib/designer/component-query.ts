/** Query of GET /api/v1/blend-components: `pump=<id>&phosphors=<id>,<id>,…` (0–5 distinct phosphors; none = the pump alone). */
import { z } from 'zod';

const id = z.coerce.number('ids are numbers').int('ids are whole numbers').positive('ids are positive');
const listedId = z.number('ids are numbers').int('ids are whole numbers').positive('ids are positive');

export const componentQuerySchema = z.object({
  pump: id,
  phosphors: z
    .string('phosphors: give up to 5 material ids separated by commas')
    .default('')
    .transform((s) =>
      s
        .split(',')
        .filter((p) => p.trim() !== '')
        .map(Number)
    )
    .pipe(z.array(listedId).max(5, 'phosphors: at most 5'))
    .refine((ids) => new Set(ids).size === ids.length, 'phosphors: each phosphor may appear only once')
});

export function componentQueryString(pumpId: number, phosphorIds: readonly number[]): string {
  return `pump=${pumpId}&phosphors=${phosphorIds.join(',')}`;
}
