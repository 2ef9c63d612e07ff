/** Badge colours of the batch states (Tailwind theme classes), shared by the list and the batch page. */
import type { BatchState } from './schema';

export const BATCH_STATE_CLASS: Record<BatchState, string> = {
  planned: 'bg-ink-100 text-ink-800',
  weighing: 'bg-pump-100 text-pump-800',
  complete: 'bg-green-50 text-pass',
  released: 'bg-green-100 text-pass',
  rejected: 'bg-red-50 text-fail'
};
