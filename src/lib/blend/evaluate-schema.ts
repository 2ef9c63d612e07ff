/** Body of `POST /api/v1/evaluate`: a spectrum and which metric families to compute. */
import { z } from 'zod';
import { spdSchema } from './schemas';

export const evaluateRequestSchema = z.object({
  spd: spdSchema,
  options: z.object({ cri: z.boolean().optional(), tm30: z.boolean().optional() }).strict().optional()
});
export type EvaluateRequest = z.infer<typeof evaluateRequestSchema>;
