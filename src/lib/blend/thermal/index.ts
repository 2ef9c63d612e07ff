/** Thermal model of the blend: materials' thermal data and the components at an operating condition. */
export * from './schema';
export { interpolateThermal, dependenceAt, ThermalRangeError } from './interpolate';
export {
  hotComponents,
  requireHotComponents,
  missingThermalData,
  ThermalNotCharacterisedError,
  type ThermalById,
  type HotShift,
  type HotComponentsResult
} from './hotComponents';
export { quenchedFractions, dequenchedFractions } from './fractions';
