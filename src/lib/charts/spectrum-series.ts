/**
 * Pure helpers of the spectrum chart: normalisation to the maximum and the half-maximum
 * crossings around the peak (linear interpolation between samples, the same rule as the
 * spectral core's FWHM in src/lib/spectral/metrics/spectral-shape.ts).
 */
export interface PlotSeries {
  name: string;
  wavelengths: number[];
  values: number[];
  /** CSS colour; a palette colour is used when absent. */
  color?: string;
  /** Dashed line (e.g. excitation, or a reference). */
  dashed?: boolean;
}

export interface PlotMarker {
  /** Index of the series the marker belongs to (default 0). */
  series?: number;
  peakNm: number;
  fwhmNm?: number | null;
}

export const SERIES_COLOURS = ['#e9820b', '#2547ea', '#1f7a4d', '#b42318', '#7a879e', '#9c4309', '#1e2b89'];

export function normalised(values: number[]): number[] {
  let max = 0;
  for (const v of values) if (v > max) max = v;
  return max > 0 ? values.map((v) => v / max) : values.map(() => 0);
}

/** Wavelengths where the series crosses half of its maximum, left and right of the sample nearest `peakNm`. */
export function halfMaximumCrossings(wavelengths: number[], values: number[], peakNm: number): { left: number; right: number } | null {
  if (wavelengths.length < 2) return null;
  let m = 0;
  for (let i = 1; i < wavelengths.length; i++) if (Math.abs(wavelengths[i] - peakNm) < Math.abs(wavelengths[m] - peakNm)) m = i;
  const half = values[m] / 2;
  if (!(half > 0)) return null;
  let left = wavelengths[0];
  for (let i = m; i > 0; i--) {
    if (values[i - 1] < half) {
      left = wavelengths[i - 1] + ((half - values[i - 1]) / (values[i] - values[i - 1])) * (wavelengths[i] - wavelengths[i - 1]);
      break;
    }
  }
  let right = wavelengths[wavelengths.length - 1];
  for (let i = m; i < wavelengths.length - 1; i++) {
    if (values[i + 1] < half) {
      right = wavelengths[i] + ((values[i] - half) / (values[i] - values[i + 1])) * (wavelengths[i + 1] - wavelengths[i]);
      break;
    }
  }
  return { left, right };
}

/** A one-sentence description of a series for screen readers and the text summary. */
export function describeSeries(s: PlotSeries, marker?: PlotMarker): string {
  const n = s.wavelengths.length;
  const range = n ? `${round(s.wavelengths[0])}–${round(s.wavelengths[n - 1])} nm, ${n} points` : 'no data';
  const peak = marker ? `, peak ${round(marker.peakNm)} nm${marker.fwhmNm != null ? `, FWHM ${round(marker.fwhmNm)} nm` : ''}` : '';
  return `${s.name}: ${range}${peak}.`;
}

const round = (v: number) => (Math.round(v * 10) / 10).toString();
