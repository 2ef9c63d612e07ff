/**
 * State of one designer session: the chosen components, shares, aim and solver settings; the live
 * frame (evaluated in the browser on every change), the trail of recent points, the wt % estimate
 * (loading model, computed once the shares rest), the last search and the comparison picks.
 */
import { superposeSpd } from '$lib/blend/superposition';
import { gridToSpd } from '$lib/blend/grid';
import { concentrationsForFractions, type BlendComponents, type SolveCandidate } from '$lib/blend';
import type { ConditionSolveResult } from '$lib/blend/solver/solveAtCondition';
import { dequenchedFractions, type ThermalById } from '$lib/blend/thermal';
import { BENCH_CONDITION, type OperatingCondition } from '$lib/aim/condition';
import { colourDistance } from '$lib/aim/distance';
import { hotViewOf } from '$lib/designer/hot-view';
import type { Objective } from '$lib/aim';
import { createLiveEvaluator, type LiveEvaluator, type LiveFrame } from '$lib/designer/live-evaluator';
import { DEFAULT_AIM, resolveAim, type AimState } from '$lib/designer/aim';
import { roundedShares, setShare, normaliseShares } from '$lib/designer/shares';
import type { DesignedBlend } from '$lib/designer/filing';
import {
  basisWithPackageModel,
  componentsWithPackageModel,
  packageModelsForPump,
  type PackageModelChoice
} from '$lib/designer/package-model';
import { fractionsWithLeak, phosphorLines, type RevisionContent } from '$lib/recipe';
import { lightSwatchHex } from '$lib/charts/display-colours';
import type { Pair } from '$lib/spectral';
import { untrack } from 'svelte';
import { componentSetKey, loadComponents } from './component-loader';
import { requestSolve } from './solve-client';

export interface MaterialChoice {
  id: number;
  code: string;
  name: string;
  family: string | null;
  peakNm: number | null;
  /** False for a material without an emission spectrum: offered, but not choosable. */
  hasSpectrum?: boolean;
}

export const MAX_PHOSPHORS = 5;
export const MAX_COMPARED = 4;
const TRAIL_LENGTH = 40;
/** A new trail point when the blend moved this far in x,y (about a third of a 3000 K SDCM step). */
const TRAIL_STEP_XY = 0.0008;
const WT_PCT_REST_MS = 180;
const NEW_PHOSPHOR_SHARE = 0.1;

export class DesignerSession {
  pumpId = $state<number | null>(null);
  phosphorIds = $state<number[]>([]);
  /** Optical fractions, pump leak first. */
  shares = $state<number[]>([1]);
  aim = $state<AimState>(structuredClone(DEFAULT_AIM));
  /** The condition the target holds at (null: bench). */
  condition = $state<OperatingCondition | null>(null);
  /** Thermal data of the loaded components, by id (absent: not characterised). */
  thermal = $state.raw<ThermalById>({});
  objective = $state<Objective>('maxLer');
  /** Effective optical path of the loading model (mm); null = no wt % estimate. */
  pathLengthMm = $state<number | null>(0.3);
  /** The package model chosen for the loading settings (id of one version), or null: library values. */
  packageModelId = $state<number | null>(null);

  evaluator = $state.raw<LiveEvaluator | null>(null);
  components = $state.raw<BlendComponents | null>(null);
  loadedKey = $state('');
  loadError = $state<string | null>(null);

  trail = $state.raw<Pair[]>([]);
  wtPct = $state.raw<{ key: string; values: number[] | null; note: string | null } | null>(null);

  solving = $state(false);
  solveStartedAt = $state(0);
  solveElapsedMs = $state(0);
  solveError = $state<string | null>(null);
  solveResult = $state.raw<ConditionSolveResult | null>(null);
  solvedKey = $state('');
  compared = $state<number[]>([]);
  #abort: AbortController | null = null;

  savedSnapshot = $state('');

  readonly pumps: MaterialChoice[];
  readonly phosphorOptions: MaterialChoice[];
  packageModels = $state.raw<readonly PackageModelChoice[]>([]);

  constructor(
    pumps: MaterialChoice[],
    phosphors: MaterialChoice[],
    opened: RevisionContent | null,
    openedAim: AimState | null,
    packageModels: readonly PackageModelChoice[] = []
  ) {
    this.packageModels = packageModels;
    // A revision may name materials that have since left the active library: keep them choosable.
    const known = (list: MaterialChoice[], ref: { materialId: number; code: string; name: string }) =>
      list.some((m) => m.id === ref.materialId)
        ? list
        : [...list, { id: ref.materialId, code: ref.code, name: `${ref.name} (archived)`, family: null, peakNm: null }];
    this.pumps = opened ? known(pumps, opened.pump) : pumps;
    this.phosphorOptions = opened ? phosphorLines(opened).reduce(known, phosphors) : phosphors;
    if (opened) {
      this.pumpId = opened.pump.materialId;
      this.phosphorIds = phosphorLines(opened).map((p) => p.materialId);
      this.shares = normaliseShares(fractionsWithLeak(opened));
      this.pathLengthMm = opened.loading?.pathLengthMm ?? this.pathLengthMm;
      const cited = opened.packageModelRef;
      if (cited && packageModels.some((m) => m.id === cited.id && m.version === cited.version)) this.packageModelId = cited.id;
    } else {
      const usable = pumps.filter((p) => p.hasSpectrum !== false);
      this.pumpId = (usable.find((p) => (p.peakNm ?? 0) >= 430) ?? usable[0])?.id ?? null;
    }
    if (openedAim) this.aim = openedAim;
    this.condition = opened?.condition ?? null;
    this.savedSnapshot = this.snapshot;

    $effect(() => this.#followComponentSet());
    $effect(() => this.#extendTrail());
    $effect(() => this.#estimateWtPctAtRest());
  }

  wantedKey = $derived(this.pumpId === null ? '' : componentSetKey(this.pumpId, this.phosphorIds));
  ready = $derived(this.evaluator !== null && this.loadedKey === this.wantedKey && this.shares.length === this.phosphorIds.length + 1);
  live = $derived.by((): { frame: LiveFrame | null; error: string | null } => {
    if (!this.ready || !this.evaluator) return { frame: null, error: null };
    try {
      return { frame: this.evaluator.evaluate(this.shares), error: null };
    } catch (err) {
      return { frame: null, error: err instanceof Error ? err.message : String(err) };
    }
  });
  frame: LiveFrame | null = $derived(this.live.frame);
  aimResult = $derived(resolveAim(this.aim));
  hotView = $derived(hotViewOf(this.components, this.thermal, this.condition, this.frame?.fractions ?? null));
  componentColours = $derived(this.evaluator ? this.evaluator.basis.components.map((c) => lightSwatchHex(c.xyz)) : []);
  get pump(): MaterialChoice | null {
    return this.pumps.find((p) => p.id === this.pumpId) ?? null;
  }
  get chosenPhosphors(): MaterialChoice[] {
    return this.phosphorIds.map((id) => this.phosphorOptions.find((p) => p.id === id)).filter((p): p is MaterialChoice => p !== undefined);
  }
  packageModelsForPump = $derived(packageModelsForPump(this.packageModels, this.pumpId));
  /** The chosen package model, if it was fitted for the chosen pump. */
  packageModel = $derived(this.packageModelsForPump.find((m) => m.id === this.packageModelId) ?? null);
  sharesKey = $derived(`${this.wantedKey}|${this.pathLengthMm}|${this.packageModel?.id ?? ''}|${roundedShares(this.shares, 4).join(',')}`);
  currentWtPct = $derived(this.wtPct && this.wtPct.key === this.sharesKey ? this.wtPct : null);
  snapshot = $derived(
    JSON.stringify({
      p: this.pumpId,
      ph: this.phosphorIds,
      s: roundedShares(this.shares, 4),
      a: this.aim,
      o: this.objective,
      l: this.pathLengthMm,
      m: this.packageModelId,
      c: this.condition
    })
  );
  dirty = $derived(this.snapshot !== this.savedSnapshot);
  candidatesUsable = $derived(this.solvedKey === this.loadedKey && this.ready);
  comparedCandidates = $derived(
    this.solveResult && this.candidatesUsable ? this.solveResult.candidates.filter((c) => this.compared.includes(c.rank)) : []
  );

  /** SPD of a proposal on the grid, from the loaded basis (the proposal's own component set). */
  candidateSpectrum(c: SolveCandidate): { wavelengths: number[]; values: number[] } | null {
    if (!this.evaluator || !this.candidatesUsable) return null;
    return gridToSpd(superposeSpd(this.evaluator.basis, c.opticalFractions));
  }

  // ——— components ———
  #followComponentSet(): void {
    const pumpId = this.pumpId;
    const ids = [...this.phosphorIds];
    if (pumpId === null) return;
    const key = componentSetKey(pumpId, ids);
    this.loadError = null;
    loadComponents(pumpId, ids).then(
      (components) => {
        if (key !== this.wantedKey) return;
        try {
          this.evaluator = createLiveEvaluator(components);
          this.components = components;
          this.thermal = (components as BlendComponents & { thermal?: ThermalById }).thermal ?? {};
          this.loadedKey = key;
        } catch (err) {
          this.loadError = err instanceof Error ? err.message : String(err);
        }
      },
      (err: Error) => {
        if (key === this.wantedKey) this.loadError = err.message;
      }
    );
  }

  choosePump(id: number): void {
    this.pumpId = id;
  }

  addPhosphor(id: number): void {
    if (this.phosphorIds.includes(id) || this.phosphorIds.length >= MAX_PHOSPHORS) return;
    this.phosphorIds = [...this.phosphorIds, id];
    this.shares = setShare([...this.shares, 0], this.shares.length, NEW_PHOSPHOR_SHARE);
  }

  removePhosphor(id: number): void {
    const i = this.phosphorIds.indexOf(id);
    if (i < 0) return;
    this.phosphorIds = this.phosphorIds.filter((p) => p !== id);
    this.shares = normaliseShares(this.shares.filter((_, k) => k !== i + 1));
  }

  // ——— shares ———
  setShare(k: number, share: number): void {
    this.shares = setShare(this.shares, k, share);
  }

  #extendTrail(): void {
    const f = this.frame;
    if (!f) return;
    const p: Pair = [f.evaluation.x, f.evaluation.y];
    const trail = untrack(() => this.trail);
    const last = trail[trail.length - 1];
    if (last && Math.hypot(p[0] - last[0], p[1] - last[1]) < TRAIL_STEP_XY) return;
    this.trail = [...trail.slice(-(TRAIL_LENGTH - 1)), p];
  }

  clearTrail(): void {
    this.trail = [];
  }

  // ——— wt % (loading model) ———
  /** Chooses a package model (null: library values); its path length replaces the one set by hand. */
  choosePackageModel(id: number | null): void {
    const model = this.packageModelsForPump.find((m) => m.id === id) ?? null;
    this.packageModelId = model?.id ?? null;
    if (model) this.pathLengthMm = model.pathLengthMm;
  }

  #estimateWtPctAtRest(): (() => void) | void {
    const key = this.sharesKey;
    const basis = this.evaluator?.basis;
    const path = this.pathLengthMm;
    const fractions = this.frame?.fractions;
    if (!basis || !fractions || this.loadedKey !== this.wantedKey) return;
    const timer = setTimeout(() => this.#computeWtPct(key, fractions, path), WT_PCT_REST_MS);
    return () => clearTimeout(timer);
  }

  #computeWtPct(key: string, fractions: number[], path: number | null): void {
    const loading = this.evaluator?.basis.loading;
    if (fractions.length < 2) return void (this.wtPct = { key, values: null, note: 'add a phosphor' });
    if (path === null || !(path > 0)) return void (this.wtPct = { key, values: null, note: 'no path length: wt % not estimated' });
    if (!loading) return void (this.wtPct = { key, values: null, note: 'a phosphor lacks an absorption coefficient in the library' });
    const model = this.packageModel;
    try {
      const sol = model
        ? concentrationsForFractions(basisWithPackageModel(loading, this.phosphorIds, model), fractions, {
            pathLengthMm: path,
            geometry: model.dispenseGeometry,
            cascade: model.cascade
          })
        : concentrationsForFractions(loading, fractions, { pathLengthMm: path });
      this.wtPct = sol.converged ? { key, values: sol.concentrationsWtPct, note: null } : { key, values: null, note: sol.refusal };
    } catch (err) {
      this.wtPct = { key, values: null, note: err instanceof Error ? err.message : String(err) };
    }
  }

  /** wt % for the current shares, computed now if the resting estimate is not there yet. */
  wtPctNow(): number[] | null {
    if (!this.currentWtPct && this.frame) this.#computeWtPct(this.sharesKey, this.frame.fractions, this.pathLengthMm);
    return this.currentWtPct?.values ?? null;
  }

  // ——— search ———
  async solve(): Promise<void> {
    const aim = this.aimResult;
    if (!this.components || !aim.ok || this.phosphorIds.length < 2 || !this.ready) return;
    this.#abort?.abort();
    const abort = new AbortController();
    this.#abort = abort;
    this.solving = true;
    this.solveError = null;
    this.solveStartedAt = performance.now();
    this.solveElapsedMs = 0;
    const tick = setInterval(() => (this.solveElapsedMs = performance.now() - this.solveStartedAt), 100);
    const key = this.loadedKey;
    const model = this.packageModel;
    const modelLoading = model ? { geometry: model.dispenseGeometry, cascade: model.cascade } : {};
    const outcome = await requestSolve(
      {
        components: model ? componentsWithPackageModel(this.components, this.phosphorIds, model) : this.components,
        target: aim.target,
        tolerance: aim.tolerance,
        floors: aim.floors,
        objective: this.objective,
        maxCandidates: 5,
        condition: this.condition,
        ...(this.pathLengthMm ? { loading: { pathLengthMm: this.pathLengthMm, ...modelLoading } } : {})
      },
      abort.signal
    );
    clearInterval(tick);
    if (this.#abort !== abort) return;
    this.solveElapsedMs = performance.now() - this.solveStartedAt;
    this.solving = false;
    this.#abort = null;
    if (outcome.ok) {
      this.solveResult = outcome.result;
      this.solvedKey = key;
      this.compared = [];
    } else if (!outcome.aborted) {
      this.solveError = outcome.error;
    }
  }

  stopSolve(): void {
    this.#abort?.abort();
    this.#abort = null;
    this.solving = false;
  }

  applyCandidate(c: SolveCandidate): void {
    if (!this.candidatesUsable) return;
    const quench = this.solveResult?.shift?.quench;
    this.shares = normaliseShares(quench ? dequenchedFractions(c.opticalFractions, quench) : c.opticalFractions);
  }

  toggleCompared(rank: number): void {
    if (this.compared.includes(rank)) this.compared = this.compared.filter((r) => r !== rank);
    else if (this.compared.length < MAX_COMPARED) this.compared = [...this.compared, rank];
  }

  // ——— filing ———
  designedBlend(): DesignedBlend | null {
    const aim = this.aimResult;
    if (!aim.ok || this.pumpId === null || this.phosphorIds.length === 0 || !this.frame) return null;
    const wt = this.wtPctNow();
    return {
      pumpId: this.pumpId,
      phosphorIds: [...this.phosphorIds],
      fractions: [...this.frame.fractions],
      wtPct: wt ? [...wt] : null,
      pathLengthMm: wt ? this.pathLengthMm : null,
      packageModelRef: wt && this.packageModel ? { id: this.packageModel.id, version: this.packageModel.version } : null,
      target: aim.target,
      tolerance: aim.tolerance,
      floors: aim.floors,
      condition: this.condition,
      coldCheck: this.coldCheck()
    };
  }

  /** The bench point of the current recipe, as the cold check of a hot-aimed revision (null at the bench). */
  coldCheck(): DesignedBlend['coldCheck'] {
    const aim = this.aimResult;
    if (this.hotView.status !== 'ok' || !this.frame || !aim.ok) return null;
    const e = this.frame.evaluation;
    const steps = colourDistance(e.x, e.y, aim.resolved).steps;
    return { x: e.x, y: e.y, cct: e.cct, duv: e.duv, ra: e.cri.ra, r9: e.cri.ri[8], steps, condition: BENCH_CONDITION };
  }

  markSaved(): void {
    this.savedSnapshot = this.snapshot;
  }
}
