/**
 * Weigh-out plan: the mass of every line of a phosphor-in-silicone batch, in weighing order,
 * rounded to the balance resolution so that the rounded lines add up exactly to the batch size,
 * with each line's allowed range. All arithmetic is exact (rationals; see rational.ts).
 *
 * Loading basis (always stated on the ticket):
 *  - wt % of total slurry: line mass = M · pct / 100; silicone = M − Σ phosphors − Σ additives.
 *  - phr (parts per hundred of silicone): silicone S = M · 100 / (100 + Σpct); line mass = S · pct / 100.
 * Silicone parts by weight: A = S · a / (a + b), B = S · b / (a + b).
 * Rounding: largest remainder in balance steps (apportion.ts), so |target − ideal| < 1 step.
 * Allowed range: ideal ± tolerance, with the limits rounded INWARD to whole steps. Any reading
 * inside the printed range is therefore within the tolerance of the exact formulation mass, and
 * the printed target always lies inside its range as long as the tolerance is at least one step
 * (which is enforced).
 * Weighing order (common practice for two-part addition-cure silicone): part A first, then the
 * phosphors and additives dispersed into it, part B last — the pot-life clock starts when B is mixed in.
 */
import { largestRemainder } from './apportion';
import { ExactNumberError, Rat } from './rational';
import { batchSteps } from './sizing';
import type { LoadingBasis, ToleranceSpec, WeighoutInput } from './schema';

export type LineRole = 'siliconeA' | 'phosphor' | 'additive' | 'siliconeB';

export interface PlannedLine {
  seq: number;
  role: LineRole;
  materialId: number | null;
  code: string;
  name: string;
  /** The line's loading on the batch basis (phosphors, additives); null for the silicone parts. */
  basisPct: number | null;
  idealG: string;
  targetG: string;
  lowG: string;
  highG: string;
  targetSteps: number;
  lowSteps: number;
  highSteps: number;
  tolerance: ToleranceSpec;
  toleranceG: string;
}

export interface WeighoutPlan {
  basis: LoadingBasis;
  resolutionG: string;
  /** Decimal places of the balance reading. */
  places: number;
  minWeightG: string;
  batchMassG: string;
  batchSteps: number;
  siliconeRatio: string;
  /** Total phosphor loading on the chosen basis, and on both bases for comparison. */
  phosphorPctOnBasis: number;
  phosphorWtPctOfSlurry: number;
  phosphorPhr: number;
  lines: PlannedLine[];
  notes: string[];
}

export interface WeighoutIssue {
  path: string;
  message: string;
}
export type WeighoutResult = { ok: true; plan: WeighoutPlan } | { ok: false; errors: WeighoutIssue[] };

interface Draft {
  role: LineRole;
  materialId: number | null;
  code: string;
  name: string;
  basisPct: Rat | null;
  ideal: Rat;
  tolerance: ToleranceSpec;
  path: string;
}

const pctOf = (base: Rat, pct: Rat) => base.mul(pct).div(Rat.HUNDRED);
const show = (r: Rat) => Number(r.toFixed(4));

/** Half a unit in the 4th decimal: how far a printed loading may sit from its exact value. */
const PRINT_HALF_UNIT = new Rat(1n, 20_000n);

/** A phosphor's loading, exactly: its exact fraction when it carries one (checked against the print), else the typed decimal. */
function phosphorPct(p: WeighoutInput['phosphors'][number]): Rat {
  const printed = Rat.fromNumber(p.pct);
  if (p.pctExact === undefined) return printed;
  const exact = Rat.parseFraction(p.pctExact);
  if (!exact || exact.sub(printed).gt(PRINT_HALF_UNIT) || printed.sub(exact).gt(PRINT_HALF_UNIT)) {
    throw new ExactNumberError(`the exact loading of ${p.code} does not match its printed value ${p.pct}`);
  }
  return exact;
}

function effectivePhosphorPcts(input: WeighoutInput): Rat[] {
  const given = input.phosphors.map(phosphorPct);
  if (input.loading.totalPct === null) return given;
  const total = Rat.fromNumber(input.loading.totalPct);
  const sum = given.reduce((a, v) => a.add(v), Rat.ZERO);
  return given.map((v) => v.mul(total).div(sum));
}

function toleranceG(ideal: Rat, t: ToleranceSpec): Rat {
  return t.kind === 'pct' ? pctOf(ideal, Rat.fromNumber(t.value)) : Rat.fromNumber(t.value);
}

export function computeWeighout(input: WeighoutInput): WeighoutResult {
  const errors: WeighoutIssue[] = [];
  const res = Rat.fromNumber(input.balance.resolutionG);
  const places = res.decimalPlaces() ?? 6;
  const g = (steps: bigint) => new Rat(steps).mul(res).toFixed(places);
  const size = batchSteps(input.sizing, res, places);
  if (size.error) return { ok: false, errors: [size.error] };
  const M = new Rat(size.steps).mul(res);

  const phosphorPcts = effectivePhosphorPcts(input);
  const additivePcts = input.additives.map((a) => Rat.fromNumber(a.pct));
  const phosphorTotal = phosphorPcts.reduce((a, v) => a.add(v), Rat.ZERO);
  const addedTotal = additivePcts.reduce((a, v) => a.add(v), phosphorTotal);
  const basis = input.loading.basis;
  if (basis === 'wtPctOfSlurry' && phosphorTotal.gte(Rat.HUNDRED)) {
    errors.push({
      path: 'loading',
      message: `phosphor loading ${phosphorTotal.toDecimal(4)} wt % of the slurry is impossible: it must be below 100 %`
    });
  } else if (basis === 'wtPctOfSlurry' && addedTotal.gte(Rat.HUNDRED)) {
    errors.push({
      path: 'additives',
      message:
        `phosphors + additives come to ${addedTotal.toDecimal(4)} wt % of the slurry, ` + `leaving no silicone: the sum must be below 100 %`
    });
  }
  if (errors.length) return { ok: false, errors };

  // Silicone mass S and the mass of a line at `pct` on the basis.
  const S = basis === 'wtPctOfSlurry' ? M.sub(pctOf(M, addedTotal)) : M.mul(Rat.HUNDRED).div(Rat.HUNDRED.add(addedTotal));
  const onBasis = (pct: Rat) => pctOf(basis === 'wtPctOfSlurry' ? M : S, pct);
  const a = Rat.fromNumber(input.silicone.ratioA);
  const b = Rat.fromNumber(input.silicone.ratioB);
  const sil = input.silicone;
  const drafts: Draft[] = [
    {
      role: 'siliconeA',
      materialId: null,
      code: 'PART A',
      name: sil.name,
      basisPct: null,
      ideal: S.mul(a).div(a.add(b)),
      tolerance: sil.toleranceA,
      path: 'silicone.toleranceA'
    },
    ...input.phosphors.map((p, i): Draft => ({
      role: 'phosphor',
      materialId: p.materialId,
      code: p.code,
      name: p.name,
      basisPct: phosphorPcts[i],
      ideal: onBasis(phosphorPcts[i]),
      tolerance: p.tolerance,
      path: `phosphors.${i}`
    })),
    ...input.additives.map((x, i): Draft => ({
      role: 'additive',
      materialId: null,
      code: x.code,
      name: x.name,
      basisPct: additivePcts[i],
      ideal: onBasis(additivePcts[i]),
      tolerance: x.tolerance,
      path: `additives.${i}`
    })),
    {
      role: 'siliconeB',
      materialId: null,
      code: 'PART B',
      name: sil.name,
      basisPct: null,
      ideal: S.mul(b).div(a.add(b)),
      tolerance: sil.toleranceB,
      path: 'silicone.toleranceB'
    }
  ];

  const steps = largestRemainder(
    drafts.map((d) => d.ideal.div(res)),
    size.steps
  );
  const minWeight = Rat.fromNumber(input.balance.minWeightG);
  let smallestBatch = Rat.ZERO;
  const lines: PlannedLine[] = drafts.map((d, i) => {
    const tol = toleranceG(d.ideal, d.tolerance);
    const low = d.ideal.sub(tol).div(res).ceil();
    const high = d.ideal.add(tol).div(res).floor();
    const target = new Rat(steps[i]).mul(res);
    if (tol.lt(res)) {
      errors.push({
        path: `${d.path}.tolerance`,
        message:
          `${d.code}: tolerance ±${tol.toDecimal(places + 2)} g is finer than the balance ` +
          `resolution ${res.toDecimal()} g; use a finer balance or a wider tolerance`
      });
    }
    if (steps[i] === 0n || target.lt(minWeight)) {
      // Smallest batch where this line reaches the minimum weight: M · min / ideal.
      const need = d.ideal.isZero() ? null : M.mul(minWeight.gt(res) ? minWeight : res).div(d.ideal);
      if (need && need.gt(smallestBatch)) smallestBatch = need;
      errors.push({
        path: d.path,
        message: `${d.code}: target ${target.toFixed(places)} g is below the balance's minimum weight ${minWeight.toDecimal()} g`
      });
    }
    return {
      seq: i + 1,
      role: d.role,
      materialId: d.materialId,
      code: d.code,
      name: d.name,
      basisPct: d.basisPct ? show(d.basisPct) : null,
      idealG: d.ideal.toDecimal(places + 3),
      targetG: g(steps[i]),
      lowG: g(low < 0n ? 0n : low),
      highG: g(high),
      targetSteps: Number(steps[i]),
      lowSteps: Number(low < 0n ? 0n : low),
      highSteps: Number(high),
      tolerance: d.tolerance,
      toleranceG: tol.toDecimal(places + 2)
    };
  });
  if (smallestBatch.gt(Rat.ZERO)) {
    errors.push({
      path: 'sizing',
      message: `a batch of at least ${g(smallestBatch.div(res).ceil())} g keeps every line at or above the minimum weight`
    });
  }
  if (errors.length) return { ok: false, errors };

  const phosphorMass = onBasis(phosphorTotal);
  return {
    ok: true,
    plan: {
      basis,
      resolutionG: res.toDecimal(),
      places,
      minWeightG: minWeight.toDecimal(),
      batchMassG: g(size.steps),
      batchSteps: Number(size.steps),
      siliconeRatio: `${input.silicone.ratioA}:${input.silicone.ratioB}`,
      phosphorPctOnBasis: show(phosphorTotal),
      phosphorWtPctOfSlurry: show(phosphorMass.mul(Rat.HUNDRED).div(M)),
      phosphorPhr: show(phosphorMass.mul(Rat.HUNDRED).div(S)),
      lines,
      notes: size.note ? [size.note] : []
    }
  };
}
