/**
 * Predicted vs measured: the revision's predicted colour point (model evaluation saved with the
 * revision) beside the measured batch mean, and the offset measured − predicted in x,y, Δu′v′
 * and MacAdam-type steps (1-step IEC 60081 ellipse at the predicted CCT, see aim/distance.ts).
 * CCT/Duv of a point without them: Ohno 2014 via the core.
 */
import { colourDistance, type ColourDistance } from '../aim/index';
import { uvToCct } from '../spectral/cct/index';
import { xyToUv } from '../spectral/colorimetry/chromaticity';

export interface ColourPoint {
  x: number;
  y: number;
  cct: number;
  duv: number;
}

export interface PredictionCheck {
  predicted: ColourPoint;
  measured: ColourPoint;
  /** measured − predicted. */
  offset: ColourDistance;
}

export function colourPoint(x: number, y: number): ColourPoint {
  const { cct, duv } = uvToCct(...xyToUv(x, y));
  return { x, y, cct, duv };
}

export function predictedVsMeasured(predicted: { x: number; y: number }, measuredMean: { x: number; y: number }): PredictionCheck {
  const p = colourPoint(predicted.x, predicted.y);
  const m = colourPoint(measuredMean.x, measuredMean.y);
  return { predicted: p, measured: m, offset: colourDistance(m.x, m.y, p) };
}
