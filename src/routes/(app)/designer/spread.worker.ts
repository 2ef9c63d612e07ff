/**
 * Web worker of the designer's production-spread cloud: keeps the loading basis of the loaded
 * component set (sent once per set) and runs each job it is given (`runSpreadJob`), in order. The page
 * sends only the latest job and drops answers it no longer wants.
 */
import type { LoadingBasis } from '$lib/blend/loading/beerLambertPhotonBudget';
import { runSpreadJob, type SpreadJob } from '$lib/designer/spread-cloud';

export type SpreadWorkerMessage = { kind: 'basis'; key: string; basis: LoadingBasis } | { kind: 'job'; key: string; job: SpreadJob };

let current: { key: string; basis: LoadingBasis } | null = null;

self.onmessage = (e: MessageEvent<SpreadWorkerMessage>) => {
  const m = e.data;
  if (m.kind === 'basis') {
    current = { key: m.key, basis: m.basis };
    return;
  }
  if (!current || current.key !== m.key) {
    self.postMessage({ id: m.job.id, ok: false, error: 'the components are still loading' });
    return;
  }
  const out = runSpreadJob(current.basis, m.job);
  if (out.ok) self.postMessage(out, { transfer: [out.x.buffer, out.y.buffer] });
  else self.postMessage(out);
};
