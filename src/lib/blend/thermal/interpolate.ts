/**
 * Interpolation of thermal curves between characterised temperatures. Piecewise-linear
 * interpolation stays between neighbouring data values, so it is monotone wherever the data are
 * (Fritsch & Carlson, "Monotone piecewise cubic interpolation", SIAM J. Numer. Anal. 17 (1980)
 * 238 — the linear interpolant is the trivially monotone case). Temperatures outside the data are
 * refused: a quench curve is not extrapolated.
 */
import { BlendInputError } from '../errors';
import { BENCH_TEMPERATURE_C } from '../../aim/condition';
import type { TemperatureDependence, ThermalPoint } from './schema';

export class ThermalRangeError extends BlendInputError {
  override name = 'ThermalRangeError';
}

export function interpolateThermal(points: ThermalPoint[], temperatureC: number, what: string): number {
  const lo = points[0];
  const hi = points[points.length - 1];
  if (!Number.isFinite(temperatureC) || temperatureC < lo.temperatureC || temperatureC > hi.temperatureC) {
    throw new ThermalRangeError(`${what}: ${temperatureC} °C is outside the characterised range ${lo.temperatureC}–${hi.temperatureC} °C`);
  }
  for (let i = 1; i < points.length; i++) {
    const a = points[i - 1];
    const b = points[i];
    if (temperatureC <= b.temperatureC) {
      const t = (temperatureC - a.temperatureC) / (b.temperatureC - a.temperatureC);
      return t === 0 ? a.value : t === 1 ? b.value : a.value + t * (b.value - a.value);
    }
  }
  return hi.value;
}

/** A linear-per-kelvin or pointwise dependence evaluated at a temperature (`anchor` at 25 °C). */
export function dependenceAt(dep: TemperatureDependence, temperatureC: number, anchor: number, what: string): number {
  if ('perK' in dep) {
    const d = dep.perK * (temperatureC - BENCH_TEMPERATURE_C);
    return anchor === 0 ? d : anchor * (1 + d);
  }
  return interpolateThermal(dep.points, temperatureC, what);
}
