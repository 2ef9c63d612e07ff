/**
 * "What a floor costs": the trade-off front of the current aim (bench condition), traced on the
 * server (POST /api/v1/solve/trade-off, src/lib/blend/solver/tradeOff.ts). One point of the front
 * goes onto the mixing desk with one click. Cancellable; a front for other components than the
 * desk's is kept on view but cannot be applied.
 */
import { componentsWithPackageModel } from '$lib/designer/package-model';
import { normaliseShares } from '$lib/designer/shares';
import type { TradeOffMetric, TradeOffResult, TradeOffPoint } from '$lib/blend/solver/tradeOff';
import type { DesignerSession } from './session.svelte';
import { postToSolver } from './solve-client';

export class TradeOffState {
  metric = $state<TradeOffMetric>('rf');
  busy = $state(false);
  error = $state<string | null>(null);
  result = $state.raw<TradeOffResult | null>(null);
  tracedKey = $state('');
  #abort: AbortController | null = null;

  constructor(private readonly session: DesignerSession) {}

  usable = $derived.by(() => this.tracedKey !== '' && this.tracedKey === this.session.loadedKey && this.session.ready);

  async trace(): Promise<void> {
    const s = this.session;
    const aim = s.aimResult;
    if (!s.components || !aim.ok || s.phosphorIds.length < 2 || !s.ready) return;
    this.#abort?.abort();
    const abort = new AbortController();
    this.#abort = abort;
    this.busy = true;
    this.error = null;
    const key = s.loadedKey;
    const model = s.packageModel;
    const modelLoading = model ? { geometry: model.dispenseGeometry, cascade: model.cascade } : {};
    const body = {
      components: model ? componentsWithPackageModel(s.components, s.phosphorIds, model) : s.components,
      target: aim.target,
      floors: aim.floors,
      metric: this.metric,
      points: 20,
      ...(s.pathLengthMm ? { loading: { pathLengthMm: s.pathLengthMm, ...modelLoading } } : {})
    };
    const outcome = await postToSolver<TradeOffResult>('/api/v1/solve/trade-off', body, abort.signal);
    if (this.#abort !== abort) return;
    this.busy = false;
    this.#abort = null;
    if (outcome.ok) {
      this.result = outcome.result;
      this.tracedKey = key;
    } else if (!outcome.aborted) this.error = outcome.error;
  }

  stop(): void {
    this.#abort?.abort();
    this.#abort = null;
    this.busy = false;
  }

  /** Puts a front point's blend on the mixing desk (its optical fractions, pump leak first). */
  apply(p: TradeOffPoint): void {
    if (!this.usable) return;
    this.session.shares = normaliseShares(p.candidate.opticalFractions);
  }
}
