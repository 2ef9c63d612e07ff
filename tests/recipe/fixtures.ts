/**
 * Stored revision content as the product has written it (values invented): a row from before the
 * version tag (no `contentVersion`) and a version 1 row. The weigh-out numbers are hand-worked in
 * tests/lib/batches/weighout/compute.test.ts (1:1 silicone, 20.000 g at 12 + 3 wt % of slurry).
 */
const legacyContent = {
  pump: { materialId: 1, code: 'B-450', name: 'B-450 royal blue chip' },
  phosphors: [
    { materialId: 3, code: 'YL-568', name: 'YL-568 yellow garnet', opticalFraction: 0.6, wtPct: 12 },
    { materialId: 4, code: 'RD-625', name: 'RD-625 red nitride', opticalFraction: 0.25, wtPct: 3 }
  ],
  pumpLeakFraction: 0.15,
  loading: { pathLengthMm: 0.3, basis: 'wtPctOfSlurry' },
  silicone: {
    siliconeSystemId: 7,
    name: 'Test 1:1 encapsulant',
    ratioA: 1,
    ratioB: 1,
    potLifeMin: 240,
    cure: '1 h at 80 °C, then 2 h at 150 °C',
    densityGPerCm3: 1.08
  },
  target: { kind: 'cctDuv', cct: 3000, duv: 0 },
  tolerance: { kind: 'sdcm', steps: 3 },
  floors: { raMin: 90 },
  notes: 'Written before content carried a version.'
};

/** The text of a row written before the version tag existed, exactly as JSON.stringify stored it. */
export const LEGACY_ROW = JSON.stringify(legacyContent);

/** A version 1 row: more red, less pump leak, a tighter tolerance. */
export const V1_ROW = JSON.stringify({
  contentVersion: 1,
  ...legacyContent,
  phosphors: [legacyContent.phosphors[0], { ...legacyContent.phosphors[1], opticalFraction: 0.27 }],
  pumpLeakFraction: 0.13,
  tolerance: { kind: 'sdcm', steps: 2 },
  notes: 'Version 1 row.'
});
