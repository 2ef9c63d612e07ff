import { describe, expect, it } from 'vitest';
import { predictRevision } from '../../../src/lib/formulations/prediction';
import { BLUE_PUMP, demoPhosphor } from '../../../src/lib/blend/demo-components';
import type { RevisionContent } from '../../../src/lib/recipe';

const ref = (materialId: number, code: string) => ({ materialId, code, name: code });
const content = (leak: number, fractions: number[], floors: RevisionContent['floors'] = {}): RevisionContent => ({
  contentVersion: 1,
  pump: ref(1, 'B-450'),
  phosphors: [
    { ...ref(2, 'GL-530'), opticalFraction: fractions[0], wtPct: null },
    { ...ref(3, 'YL-568'), opticalFraction: fractions[1], wtPct: null },
    { ...ref(4, 'RD-625'), opticalFraction: fractions[2], wtPct: null }
  ],
  pumpLeakFraction: leak,
  loading: null,
  silicone: { siliconeSystemId: null, name: 'S', ratioA: 1, ratioB: 1, potLifeMin: 240, cure: '', densityGPerCm3: null },
  target: { kind: 'cctDuv', cct: 3000, duv: 0 },
  tolerance: { kind: 'sdcm', steps: 3 },
  floors,
  notes: ''
});
const components = { pump: BLUE_PUMP, phosphors: ['ph-gl530', 'ph-yl568', 'ph-rd625'].map(demoPhosphor) };

describe('prediction stored with a revision', () => {
  it('targets the Planckian point at 3000 K: x 0.4369, y 0.4041 (CIE 1931, from memory) and reports the distance to it', () => {
    const p = predictRevision(content(0.07, [0.2667, 0.2346, 0.4287]), components);
    expect(p.target.x).toBeCloseTo(0.4369, 3);
    expect(p.target.y).toBeCloseTo(0.4041, 3);
    expect(p.withinTolerance).toBe(p.sdcm <= 3);
    expect(p.spd.values).toHaveLength(471); // 360–830 nm at 1 nm (CIE 15 recommended range)
    expect(Math.max(...p.spd.values)).toBe(1);
  });

  it('lists the floors a blend misses: without a red phosphor R9 is negative (common practice for YAG-type whites)', () => {
    // Pump + YL-568 only, near the Planckian locus at about 4900 K (Duv ≈ 0, so CIE 13.3 applies).
    const p = predictRevision(content(0.22, [0, 0.78, 0]), components);
    const noRed = predictRevision(content(0.22, [0, 0.78, 0], { r9Min: 50 }), components);
    expect(p.floorsMissed).toEqual([]);
    expect(noRed.r9!).toBeLessThan(0);
    expect(noRed.floorsMissed).toEqual([expect.stringMatching(/^R9 -\d+\.\d < 50$/)]);
    // Too far from the locus (Duv > 5.4e-3 in uv, CIE 13.3 §5.3) the Ra/R9 floors cannot be judged and are reported as missed.
    const offLocus = predictRevision(content(0.17, [0, 0.83, 0], { raMin: 80 }), components);
    expect(offLocus.ra).toBeNull();
    expect(offLocus.floorsMissed[0]).toMatch(/not defined/);
  });
});
