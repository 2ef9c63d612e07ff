/**
 * Public API of the Phosforge spectral core (pure TypeScript; no I/O, no DOM, no framework).
 * Sources: see docs/references.md. Working grid 360–830 nm at 1 nm; input resampled linearly
 * inside the measured range and set to zero outside it.
 */
export type * from './types';
export { SpectrumInputError } from './errors';
export { evaluateSpectrum, evaluateGrid, type FullEvaluateOptions } from './evaluate';

// Grid and resampling
export { GRID_START_NM, GRID_END_NM, GRID_STEP_NM, GRID_LENGTH, GRID_WAVELENGTHS_NM, tableToGrid } from './grid';
export { resampleToGrid, resampleToGridInto, validateSpd } from './resample';

// Colorimetry
export { CMF_1931_2DEG, CMF_1964_10DEG, type Observer, type CmfGrid } from './colorimetry/cmf';
export { spdToXyz, tristimulusSums, type Xyz } from './colorimetry/tristimulus';
export {
  xyzToXy,
  xyzToUv,
  xyzToUvPrime,
  xyToUv,
  uvToXy,
  uvToUvPrime,
  uvPrimeToUv,
  xyToUvPrime,
  uvPrimeToXy,
  xyToXyz,
  type Pair
} from './colorimetry/chromaticity';

// Illuminants
export { planckExitance, planckSpd, PLANCK_C1, PLANCK_C2 } from './illuminants/planck';
export { daylightSpd, daylightCoefficients, type DaylightCoefficients } from './illuminants/daylight';

// CCT / Duv
export { uvToCct, CCT_METHODS, type CctMethod } from './cct/index';
export { uvToCctOhno2014, type CctDuv } from './cct/ohno2014';
export { uvToCctRobertson1968 } from './cct/robertson1968';
export { cctDuvToUv, cctDuvToXy } from './cct/inverse';
export { planckianUv } from './cct/planckian-locus';

// Colour rendition
export { criCie133, CRI_DC_LIMIT } from './cri/cie13-3';
export { criReferenceKind, CRI_DAYLIGHT_FROM_K } from './cri/reference';
export { tcsDisplayXyzD65, type TcsSwatch } from './cri/tcs-display';
export { tm30Cie224, rfFromDeltaE, TM30_BIN_COUNT } from './tm30/cie224';
export { tm30ReferenceSpd, daylightFraction } from './tm30/reference';
export { createCam02Ucs, type Jab } from './tm30/cam02ucs';

// Other metrics
export { lerLmPerW, KM_LM_PER_W } from './metrics/ler';
export { alphaOpicCieS026, ALPHA_OPIC_D65_MW_PER_LM, ALPHA_OPIC_KEYS, type AlphaOpicKey } from './metrics/alpha-opic';
export { spectralShape, type SpectralShape } from './metrics/spectral-shape';

// Chromaticity bins
export {
  findAnsiBin,
  ansiBinOf,
  ansiNominalQuadrangles,
  ansiFlexibleQuadrangle,
  ansiDuvTarget,
  ansiCctTolerance,
  isInQuadrangle,
  type AnsiQuadrangle,
  type AnsiBinMatch
} from './ansi/c78377';
export { sdcmSteps, sdcmFromTarget, ellipseForCct, type ChromaticityEllipse } from './ansi/macadam';
export {
  designIntents,
  meetsIntent,
  describeIntent,
  DESIGN_INTENTS,
  INTENT_LEVELS,
  INTENT_FAMILIES,
  type IntentLevel,
  type IntentFamily,
  type DesignIntentReport
} from './tm30/design-intents';
