/**
 * The designer's production spread, beside the session: the predicted cloud of built parts (run in a web
 * worker, `spread.worker.ts`: latest wins — while a job runs only the newest request waits, and an answer
 * older than the one shown is dropped), and the blend's point on each chip bin of the pump.
 * 2,000 parts while the desk moves, the chosen count (10,000 by default) once it rests for 400 ms.
 */
import { untrack } from 'svelte';
import { variationModelSchema, type VariationModel } from '$lib/blend/spread';
import { pumpBinSetSchema, type PumpBinSet } from '$lib/pump-bins/schema';
import { binPoints, type BinPoint } from '$lib/designer/bin-points';
import { CLOUD_SEED, MOVING_PARTS, RESTING_PARTS, type SpreadJob, type SpreadJobResult } from '$lib/designer/spread-cloud';
import type { SpreadWorkerMessage } from './spread.worker';
import type { DesignerSession } from './session.svelte';

const REST_MS = 400;
export type ChipSpread = 'oneBin' | 'pumpBins';
type Shown = Extract<SpreadJobResult, { ok: true }>;

export class SpreadView {
  private readonly session: DesignerSession;
  enabled = $state(false);
  restingParts = $state(RESTING_PARTS);
  chip = $state<ChipSpread>('oneBin');
  shown = $state.raw<Shown | null>(null);
  error = $state<string | null>(null);
  bins = $state.raw<{ pumpId: number; set: PumpBinSet | null } | null>(null);

  #worker: Worker | null = null;
  #basisKey = '';
  #nextId = 0;
  #inFlight = false;
  #pending: SpreadWorkerMessage | null = null;

  constructor(session: DesignerSession) {
    this.session = session;
    $effect(() => this.#follow());
    $effect(() => this.#loadBins());
    $effect(() => () => this.#worker?.terminate());
  }

  /** The variation model of the cloud: defaults, the chip wavelength from one 2.5 nm bin or from the pump's bins by share. */
  model = $derived.by((): VariationModel => {
    const set = this.bins?.set;
    if (this.chip === 'pumpBins' && set) return variationModelSchema.parse({ pump: { kind: 'bins', bins: set.bins } });
    return variationModelSchema.parse({});
  });

  pumpBinSet = $derived.by(() => (this.bins && this.bins.pumpId === this.session.pumpId ? this.bins.set : null));

  /** The desk's recipe on each chip bin (at rest: needs the wt % estimate, or the optical shares without absorption data). */
  binPoints = $derived.by((): BinPoint[] => {
    const s = this.session;
    const set = this.pumpBinSet;
    if (!set || !s.components || !s.ready || !s.frame) return [];
    const wt = s.currentWtPct?.values;
    const target = s.aimResult.ok ? s.aimResult.resolved : null;
    try {
      return binPoints(
        s.components,
        set,
        wt && s.pathLengthMm
          ? { kind: 'loading', wtPct: wt, pathLengthMm: s.pathLengthMm }
          : { kind: 'optical', fractions: s.frame.fractions },
        target
      );
    } catch {
      return [];
    }
  });

  #loadBins(): void {
    const id = this.session.pumpId;
    if (id === null) return;
    fetch(`/api/v1/pumps/${id}/bins`, { headers: { accept: 'application/json' } })
      .then((r) => (r.ok ? r.json() : null))
      .then((body: { set?: unknown } | null) => {
        const parsed = body?.set ? pumpBinSetSchema.safeParse(body.set) : null;
        this.bins = { pumpId: id, set: parsed?.success ? parsed.data : null };
      })
      .catch(() => (this.bins = { pumpId: id, set: null }));
  }

  #follow(): (() => void) | void {
    if (!this.enabled) return;
    const s = this.session;
    const basis = s.evaluator?.basis.loading ?? null;
    const frame = s.frame;
    const aim = s.aimResult;
    const path = s.pathLengthMm;
    if (!s.ready || !frame || !aim.ok || frame.fractions.length < 2) return void (this.error = null);
    if (!basis) return void (this.error = 'a phosphor lacks an absorption coefficient: the cloud needs the loading model');
    if (!path) return void (this.error = 'set a path length: the cloud needs the loading model');
    const key = s.loadedKey;
    const wt = s.currentWtPct?.values ?? null;
    const base = $state.snapshot({
      fractions: frame.fractions,
      wtPct: wt,
      pathLengthMm: path,
      centre: { x: aim.resolved.x, y: aim.resolved.y, cct: aim.resolved.cct },
      quadrangle: aim.resolved.ansiBin,
      tolerance: aim.tolerance,
      model: this.model,
      seed: CLOUD_SEED
    }) as Omit<SpreadJob, 'id' | 'parts'>;
    const resting = this.restingParts;
    untrack(() => {
      if (key !== this.#basisKey) {
        this.#post({ kind: 'basis', key, basis });
        this.#basisKey = key;
      }
      this.#submit(key, { ...base, id: 0, parts: Math.min(MOVING_PARTS, resting) });
    });
    if (resting <= MOVING_PARTS) return;
    const timer = setTimeout(() => this.#submit(key, { ...base, id: 0, parts: resting }), REST_MS);
    return () => clearTimeout(timer);
  }

  #submit(key: string, job: SpreadJob): void {
    const message: SpreadWorkerMessage = { kind: 'job', key, job: { ...job, id: ++this.#nextId } };
    if (this.#inFlight) this.#pending = message;
    else this.#post(message);
  }

  #post(message: SpreadWorkerMessage): void {
    const w = this.#ensureWorker();
    if (message.kind === 'job') this.#inFlight = true;
    w.postMessage(message);
  }

  #ensureWorker(): Worker {
    if (this.#worker) return this.#worker;
    // Vite bundles a worker written in this exact form; the URL is not state.
    // eslint-disable-next-line svelte/prefer-svelte-reactivity
    const w = new Worker(new URL('./spread.worker.ts', import.meta.url), { type: 'module' });
    w.onmessage = (e: MessageEvent<SpreadJobResult>) => this.#receive(e.data);
    w.onerror = (e) => {
      this.error = `the spread worker failed: ${e.message}`;
      this.#inFlight = false;
    };
    this.#worker = w;
    return w;
  }

  #receive(r: SpreadJobResult): void {
    this.#inFlight = false;
    if (r.ok) {
      if (!this.shown || r.id > this.shown.id) {
        this.shown = r;
        this.error = null;
      }
    } else if (r.id === this.#nextId) this.error = r.error;
    const next = this.#pending;
    this.#pending = null;
    if (next) this.#post(next);
  }
}
