/**
 * Invented demo components for tests, benchmarks and development seeds: two pumps and
 * ten phosphors of generic families. Names are invented; chemistry is described
 * generically. Spectra are analytic (Gaussian in energy for 5d→4f bands, split Gaussians
 * for chips, sums of narrow Gaussians for the Mn⁴⁺ line phosphor) sampled at 1 nm on
 * 360–830 nm. Peak, FWHM, IQE and density follow the typical ranges of
 * (reviews: Smet et al., J. Electrochem. Soc. 158 (2011) R37; Pust et al., Nat. Mater.
 * 14 (2015) 454) [from memory]. Absorption coefficients (per wt %·mm of effective path,
 * referred to 450 nm) and prices per kg are invented orders of magnitude [invented].
 */
import { gridToSpd } from './grid';
import { gaussianInEnergy } from './shapes/gaussianInEnergy';
import { logisticEdge } from './shapes/logisticEdge';
import { splitGaussian } from './shapes/splitGaussian';
import type { PhosphorSpec, PumpSpec, Spd } from './types';

export interface DemoPhosphor extends PhosphorSpec {
  nominalPeakNm: number;
  nominalFwhmNm: number;
  /** Provenance tag of the numbers. */
  source: 'from memory' | 'common practice' | 'invented';
}

const round = (a: Float64Array): Spd => {
  const s = gridToSpd(a);
  return { wavelengths: s.wavelengths, values: s.values.map((v) => Number(v.toPrecision(5))) };
};

const sum = (...parts: [Float64Array, number][]): Float64Array => {
  const out = new Float64Array(parts[0][0].length);
  for (const [a, k] of parts) for (let i = 0; i < out.length; i++) out[i] += k * a[i];
  return out;
};

/** Ce³⁺ garnet excitation: 4f→5d₁ band near `blueNm` and 5d₂ near 340 nm [from memory]. */
const garnetExcitation = (blueNm: number) => sum([gaussianInEnergy(blueNm, 60), 1], [gaussianInEnergy(340, 40), 0.35]);

export const DEMO_PUMPS: PumpSpec[] = [
  { id: 'pump-b450', name: 'B-450 royal blue chip', parametric: { peakNm: 450, fwhmNm: 20, asymmetry: 0.2 } },
  { id: 'pump-v405', name: 'V-405 violet chip', parametric: { peakNm: 405, fwhmNm: 14, asymmetry: 0.15 } }
];

export const BLUE_PUMP = DEMO_PUMPS[0];
export const VIOLET_PUMP = DEMO_PUMPS[1];

interface Def {
  id: string;
  name: string;
  family: string;
  peak: number;
  fwhm: number;
  emission: Float64Array;
  excitation: Float64Array;
  iqe: number;
  alpha: number;
  rho: number;
  cost: number;
  refNm?: number;
}

const defs: Def[] = [
  {
    id: 'ph-cg505',
    name: 'CG-505 silicate cyan-green',
    family: 'alkaline-earth orthosilicate, Eu-activated',
    peak: 505,
    fwhm: 65,
    emission: gaussianInEnergy(505, 65),
    excitation: logisticEdge(465, 14),
    iqe: 0.85,
    alpha: 0.3,
    rho: 5.0,
    cost: 300
  },
  {
    id: 'ph-gl530',
    name: 'GL-530 garnet green',
    family: 'garnet (Lu-rich), Ce-activated',
    peak: 530,
    fwhm: 105,
    emission: gaussianInEnergy(530, 105),
    excitation: garnetExcitation(445),
    iqe: 0.92,
    alpha: 0.3,
    rho: 6.7,
    cost: 450
  },
  {
    id: 'ph-gn538',
    name: 'GN-538 oxynitride narrow green',
    family: 'oxynitride, Eu-activated',
    peak: 538,
    fwhm: 52,
    emission: gaussianInEnergy(538, 52),
    excitation: logisticEdge(485, 15),
    iqe: 0.72,
    alpha: 0.25,
    rho: 3.2,
    cost: 1200
  },
  {
    id: 'ph-yg555',
    name: 'YG-555 garnet yellow-green',
    family: 'garnet (Y-rich), Ce-activated',
    peak: 555,
    fwhm: 115,
    emission: gaussianInEnergy(555, 115),
    excitation: garnetExcitation(455),
    iqe: 0.95,
    alpha: 0.35,
    rho: 4.55,
    cost: 150
  },
  {
    id: 'ph-yl568',
    name: 'YL-568 garnet yellow',
    family: 'garnet (Y,Gd), Ce-activated',
    peak: 568,
    fwhm: 120,
    emission: gaussianInEnergy(568, 120),
    excitation: garnetExcitation(458),
    iqe: 0.93,
    alpha: 0.35,
    rho: 4.8,
    cost: 140
  },
  {
    id: 'ph-or600',
    name: 'OR-600 nitride orange',
    family: 'alkaline-earth silicon nitride, Eu-activated',
    peak: 600,
    fwhm: 85,
    emission: gaussianInEnergy(600, 85),
    excitation: logisticEdge(540, 20),
    iqe: 0.85,
    alpha: 0.5,
    rho: 4.2,
    cost: 700
  },
  {
    id: 'ph-rd625',
    name: 'RD-625 nitride red',
    family: 'alkaline-earth aluminium silicon nitride, Eu-activated',
    peak: 625,
    fwhm: 80,
    emission: gaussianInEnergy(625, 80),
    excitation: logisticEdge(570, 20),
    iqe: 0.9,
    alpha: 0.6,
    rho: 3.5,
    cost: 900
  },
  {
    id: 'ph-rd650',
    name: 'RD-650 nitride deep red',
    family: 'calcium aluminium silicon nitride, Eu-activated',
    peak: 650,
    fwhm: 90,
    emission: gaussianInEnergy(650, 90),
    excitation: logisticEdge(595, 20),
    iqe: 0.88,
    alpha: 0.7,
    rho: 3.3,
    cost: 800
  },
  {
    id: 'ph-nr631',
    name: 'NR-631 fluoride line red',
    family: 'complex fluoride, Mn⁴⁺-activated',
    peak: 631,
    fwhm: 8,
    emission: sum(
      [splitGaussian(609, 4), 0.22],
      [splitGaussian(613, 4), 0.35],
      [splitGaussian(621, 5), 0.18],
      [splitGaussian(631, 8), 1],
      [splitGaussian(637, 3), 0.3],
      [splitGaussian(648, 5), 0.38]
    ),
    excitation: sum([gaussianInEnergy(455, 35), 1], [gaussianInEnergy(355, 40), 0.7]),
    iqe: 0.9,
    alpha: 0.05,
    rho: 2.7,
    cost: 500
  },
  {
    id: 'ph-bl450',
    name: 'BL-450 phosphate blue',
    family: 'alkaline-earth halophosphate, Eu-activated',
    peak: 450,
    fwhm: 35,
    emission: gaussianInEnergy(450, 35),
    excitation: logisticEdge(412, 6),
    iqe: 0.9,
    alpha: 0.4,
    rho: 3.9,
    cost: 600,
    refNm: 405
  }
];

/**
 * `absorptionPerWtPctMm` is referred to 450 nm (405 nm for the blue phosphor) (`absorptionReferenceNm`); the model
 * rescales it to the actual pump peak through the excitation spectrum.
 */
export const DEMO_PHOSPHORS: DemoPhosphor[] = defs.map((d) => ({
  id: d.id,
  name: d.name,
  family: d.family,
  emission: round(d.emission),
  excitation: round(d.excitation),
  iqe: d.iqe,
  absorptionPerWtPctMm: d.alpha,
  absorptionReferenceNm: d.refNm ?? 450,
  densityGPerCm3: d.rho,
  costPerKg: d.cost,
  nominalPeakNm: d.peak,
  nominalFwhmNm: d.fwhm,
  source: 'from memory'
}));

export function demoPhosphor(id: string): DemoPhosphor {
  const p = DEMO_PHOSPHORS.find((q) => q.id === id);
  if (!p) throw new Error(`no demo phosphor ${id}`);
  return p;
}
