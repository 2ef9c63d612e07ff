/**
 * The blend components at an operating condition. The pump's peak drifts toward the red with
 * temperature and drive current (Schubert, *Light-Emitting Diodes*, 2nd ed. (2006), ch. on
 * temperature dependence of emission [from memory]); each phosphor loses photons to thermal
 * quenching (Bachmann et al., Chem. Mater. 21 (2009) 2077, on Ce:YAG [from memory]), modelled as
 * IQE(T) = IQE(25 °C) × Q(T), so the loading model's emitted power falls by Q for the same
 * absorption; its band may shift and broaden. The pump's relative output only scales the flux
 * (the loading model is per unit pump power), so it is reported, not applied to the spectrum.
 * Missing data is listed, never taken as zero; the bench condition needs no data.
 */
import { type OperatingCondition, BENCH_TEMPERATURE_C, describeCondition, isBenchCondition } from '../../aim/condition';
import { shiftPump } from '../shiftPump';
import { BlendInputError } from '../errors';
import type { BlendComponents, PhosphorSpec } from '../types';
import { dependenceAt, interpolateThermal } from './interpolate';
import type { MaterialThermal, PhosphorThermal, PumpThermal } from './schema';

/** Thermal data by material id (pump and phosphors); null or absent = not characterised. */
export type ThermalById = Record<string, MaterialThermal | null | undefined>;

export interface HotShift {
  condition: OperatingCondition;
  pumpShiftNm: number;
  /** Pump radiant output relative to 25 °C (flux only). */
  pumpOutputFactor: number;
  /** Per phosphor, in component order. */
  quench: number[];
  peakShiftNm: number[];
  widthFactor: number[];
}

export type HotComponentsResult =
  | ({ status: 'ok'; components: BlendComponents } & HotShift)
  | { status: 'notCharacterised'; condition: OperatingCondition; missing: string[] };

const BENCH_SHIFT = (condition: OperatingCondition, n: number): HotShift => ({
  condition,
  pumpShiftNm: 0,
  pumpOutputFactor: 1,
  quench: Array(n).fill(1),
  peakShiftNm: Array(n).fill(0),
  widthFactor: Array(n).fill(1)
});

/** What a condition needs that the data lacks ("B-450 chip: peak drift per mA"), in component order. */
export function missingThermalData(components: BlendComponents, thermal: ThermalById, condition: OperatingCondition): string[] {
  if (isBenchCondition(condition)) return [];
  const missing: string[] = [];
  const pump = thermal[components.pump.id];
  if (!pump || pump.kind !== 'pump') missing.push(`${components.pump.name}: pump thermal data (peak drift, relative output)`);
  else if (condition.driveCurrentMa !== null && pump.peakDriftNmPerMa === null) missing.push(`${components.pump.name}: peak drift per mA`);
  for (const p of components.phosphors) {
    const t = thermal[p.id];
    if (!t || t.kind !== 'phosphor') missing.push(`${p.name}: relative emission vs temperature`);
  }
  return missing;
}

function pumpShiftNm(pump: PumpThermal, condition: OperatingCondition): number {
  const dT = pump.peakDriftNmPerK * (condition.temperatureC - BENCH_TEMPERATURE_C);
  if (condition.driveCurrentMa === null || pump.peakDriftNmPerMa === null || pump.referenceCurrentMa === null) return dT;
  return dT + pump.peakDriftNmPerMa * (condition.driveCurrentMa - pump.referenceCurrentMa);
}

/** The emission band moved by `shiftNm` and stretched by `width` about its peak (shape renormalised downstream). */
function reshapedEmission(p: PhosphorSpec, shiftNm: number, width: number): PhosphorSpec {
  if (shiftNm === 0 && width === 1) return p;
  const { wavelengths, values } = p.emission;
  let peak = 0;
  for (let i = 1; i < values.length; i++) if (values[i] > values[peak]) peak = i;
  const centre = wavelengths[peak];
  return { ...p, emission: { wavelengths: wavelengths.map((w) => centre + (w - centre) * width + shiftNm), values: values.slice() } };
}

function hotPhosphor(p: PhosphorSpec, t: PhosphorThermal, temperatureC: number) {
  const quench = interpolateThermal(t.relativeEmission, temperatureC, `${p.name} relative emission`);
  const shift = t.peakShiftNm ? dependenceAt(t.peakShiftNm, temperatureC, 0, `${p.name} peak shift`) : 0;
  const width = t.widthFactor ? dependenceAt(t.widthFactor, temperatureC, 1, `${p.name} width factor`) : 1;
  // A phosphor cannot emit more photons than it absorbs: IQE(T) ≤ 1 (photon accounting).
  const iqe = quench === 1 ? p.iqe : Math.min(1, p.iqe * quench);
  return { spec: { ...reshapedEmission(p, shift, width), iqe }, quench, shift, width };
}

export function hotComponents(components: BlendComponents, thermal: ThermalById, condition: OperatingCondition): HotComponentsResult {
  if (isBenchCondition(condition)) return { status: 'ok', components, ...BENCH_SHIFT(condition, components.phosphors.length) };
  const missing = missingThermalData(components, thermal, condition);
  if (missing.length > 0) return { status: 'notCharacterised', condition, missing };
  const pumpData = thermal[components.pump.id] as PumpThermal;
  const T = condition.temperatureC;
  const pumpOutputFactor = interpolateThermal(pumpData.relativeOutput, T, `${components.pump.name} relative output`);
  const shift = pumpShiftNm(pumpData, condition);
  const hot = components.phosphors.map((p) => hotPhosphor(p, thermal[p.id] as PhosphorThermal, T));
  return {
    status: 'ok',
    components: { pump: shiftPump(components.pump, shift), phosphors: hot.map((h) => h.spec) },
    condition,
    pumpShiftNm: shift,
    pumpOutputFactor,
    quench: hot.map((h) => h.quench),
    peakShiftNm: hot.map((h) => h.shift),
    widthFactor: hot.map((h) => h.width)
  };
}

export class ThermalNotCharacterisedError extends BlendInputError {
  override name = 'ThermalNotCharacterisedError';
  constructor(
    message: string,
    readonly missing: string[]
  ) {
    super(message);
  }
}

/** The components at the condition, or a refusal naming what is not characterised. */
export function requireHotComponents(components: BlendComponents, thermal: ThermalById, condition: OperatingCondition) {
  const r = hotComponents(components, thermal, condition);
  if (r.status === 'notCharacterised') {
    throw new ThermalNotCharacterisedError(`not characterised at ${describeCondition(condition)}: ${r.missing.join('; ')}`, r.missing);
  }
  return r;
}
