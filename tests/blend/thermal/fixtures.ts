/**
 * Thermal test data. Values are invented within the ranges the trade quotes: a garnet yellow keeps
 * ~90–95 % of its emission at 150 °C and a nitride red ~85–90 % [from memory]; blue InGaN peaks
 * drift ~0.03–0.05 nm/K toward the red [from memory].
 */
import { BLUE_PUMP, demoPhosphor } from '../../../src/lib/blend';
import type { BlendComponents } from '../../../src/lib/blend/types';
import { materialThermalSchema, type ThermalById } from '../../../src/lib/blend/thermal';

export const YELLOW = demoPhosphor('ph-yg555');
export const RED = demoPhosphor('ph-rd625');
export const COMPONENTS: BlendComponents = { pump: BLUE_PUMP, phosphors: [YELLOW, RED] };

const flat = () => [
  { temperatureC: 25, value: 1 },
  { temperatureC: 150, value: 1 }
];

/** No quenching, no drift, no shift: the hot components must equal the cold ones. */
export const NEUTRAL: ThermalById = {
  [BLUE_PUMP.id]: materialThermalSchema.parse({
    kind: 'pump',
    peakDriftNmPerK: 0,
    peakDriftNmPerMa: 0,
    referenceCurrentMa: 350,
    relativeOutput: flat()
  }),
  [YELLOW.id]: materialThermalSchema.parse({
    kind: 'phosphor',
    relativeEmission: flat(),
    peakShiftNm: { perK: 0 },
    widthFactor: { perK: 0 }
  }),
  [RED.id]: materialThermalSchema.parse({ kind: 'phosphor', relativeEmission: flat() })
};

/** Relative emission at 25/85/125/150 °C. */
export const quench = (q85: number, q125: number, q150: number) =>
  [25, 85, 125, 150].map((temperatureC, i) => ({ temperatureC, value: [1, q85, q125, q150][i] }));

/** Typical data [from memory, see above]. */
export const TYPICAL: ThermalById = {
  [BLUE_PUMP.id]: materialThermalSchema.parse({
    kind: 'pump',
    peakDriftNmPerK: 0.04,
    peakDriftNmPerMa: 0.005,
    referenceCurrentMa: 350,
    relativeOutput: [
      { temperatureC: 25, value: 1 },
      { temperatureC: 85, value: 0.93 },
      { temperatureC: 150, value: 0.85 }
    ]
  }),
  [YELLOW.id]: materialThermalSchema.parse({
    kind: 'phosphor',
    relativeEmission: quench(0.98, 0.95, 0.92),
    peakShiftNm: { perK: -0.02 },
    widthFactor: { perK: 0.0005 }
  }),
  [RED.id]: materialThermalSchema.parse({
    kind: 'phosphor',
    relativeEmission: quench(0.96, 0.91, 0.87)
  })
};
