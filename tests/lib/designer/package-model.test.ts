import { describe, expect, it } from 'vitest';
import {
  basisWithPackageModel,
  componentsWithPackageModel,
  packageModelLabel,
  packageModelsForPump,
  type PackageModelChoice
} from '../../../src/lib/designer/package-model';
import { filingFormSchema, revisionContentFrom, type DesignedBlend } from '../../../src/lib/designer/filing';
import { parseRecipe } from '../../../src/lib/recipe';
import { contentToFormValues, formValuesToRaw } from '../../../src/lib/formulations/form-values';
import { prepareBasis } from '../../../src/lib/blend/basis';
import { concentrationsForFractions } from '../../../src/lib/blend/loading/concentrationsForFractions';
import { THREE } from '../../blend/fixtures';

const loading = prepareBasis(THREE).loading!;
const IDS = [21, 22, 23];
// Fitted α twice the library's for every phosphor.
const doubledAlpha = IDS.map((materialId, i) => ({
  materialId,
  code: `P-${materialId}`,
  absorptionPerWtPctMm: 2 * loading.absorptionPerWtPctMm[i]
}));
const model = (over: Partial<PackageModelChoice> = {}): PackageModelChoice => ({
  id: 9,
  name: 'KH test 3030',
  version: 2,
  packageType: '3030 cavity',
  pumpMaterialId: 1,
  pathLengthMm: 0.25,
  dispenseGeometry: 'fixedMass',
  cascade: false,
  phosphors: doubledAlpha,
  pumpEscape: 1.2,
  iqeScale: 0.9,
  ...over
});

describe('the package model the designer applies to the loading model', () => {
  it('lists the models fitted for the chosen pump, labelled "<name> v<version>"', () => {
    const list = [model(), model({ id: 10, pumpMaterialId: 2 })];
    expect(packageModelsForPump(list, 1).map((m) => m.id)).toEqual([9]);
    expect(packageModelsForPump(list, null)).toEqual([]);
    expect(packageModelLabel(model())).toBe('KH test 3030 v2');
  });

  it('takes α of the fitted phosphors only and scales every IQE', () => {
    const partial = model({ phosphors: [{ materialId: 22, code: 'P-22', absorptionPerWtPctMm: 0.77 }] });
    const b = basisWithPackageModel(loading, IDS, partial);
    expect(b.absorptionPerWtPctMm).toEqual([loading.absorptionPerWtPctMm[0], 0.77, loading.absorptionPerWtPctMm[2]]);
    b.iqe.forEach((q, i) => expect(q).toBeCloseTo(loading.iqe[i] * 0.9, 12));
  });

  it('hands the solver the same α (at the pump) and IQE scale, an IQE capped at 1', () => {
    const withRef = { ...THREE, phosphors: THREE.phosphors.map((p) => ({ ...p, absorptionReferenceNm: 450 })) };
    const partial = model({ iqeScale: 1.5, phosphors: [{ materialId: 22, code: 'P-22', absorptionPerWtPctMm: 0.77 }] });
    const c = componentsWithPackageModel(withRef, IDS, partial);
    expect(c.phosphors[1].absorptionPerWtPctMm).toBe(0.77);
    expect(c.phosphors[1]).not.toHaveProperty('absorptionReferenceNm');
    expect(c.phosphors[0]).toMatchObject({ absorptionPerWtPctMm: THREE.phosphors[0].absorptionPerWtPctMm, absorptionReferenceNm: 450 });
    c.phosphors.forEach((p, i) => expect(p.iqe).toBeCloseTo(Math.min(1, THREE.phosphors[i].iqe * 1.5), 12));
    c.phosphors.forEach((p) => expect(p.iqe).toBeLessThanOrEqual(1));
  });

  it('twice the absorption for the same mix needs half the wt % (Beer–Lambert: the exponent is α·c·L)', () => {
    const fractions = [0.1, 0.3, 0.4, 0.2];
    const library = concentrationsForFractions(loading, fractions, { pathLengthMm: 0.25 });
    // Same IQE, so only α changes between the two.
    const doubled = basisWithPackageModel(loading, IDS, model({ iqeScale: 1 }));
    const fitted = concentrationsForFractions(doubled, fractions, { pathLengthMm: 0.25 });
    expect(library.converged && fitted.converged).toBe(true);
    fitted.concentrationsWtPct.forEach((c, i) => expect(c / library.concentrationsWtPct[i]).toBeCloseTo(0.5, 6));
  });
});

describe('a filed revision cites the package model', () => {
  const blend: DesignedBlend = {
    pumpId: 1,
    phosphorIds: IDS,
    fractions: [0.1, 0.3, 0.4, 0.2],
    wtPct: [5, 6, 2],
    pathLengthMm: 0.25,
    packageModelRef: { id: 9, version: 2 },
    target: { kind: 'cctDuv', cct: 3000, duv: 0 },
    tolerance: { kind: 'sdcm', steps: 3 },
    floors: {}
  };
  const refs = {
    pump: { materialId: 1, code: 'B-450', name: 'B-450' },
    phosphors: IDS.map((id) => ({ materialId: id, code: `P-${id}`, name: `P ${id}` }))
  };
  const silicone = { siliconeSystemId: 2, name: '1:1 clear', ratioA: 1, ratioB: 1, potLifeMin: 240, cure: '', densityGPerCm3: 1.08 };

  it('as current content (version 3) with { id, version }; none when not chosen', () => {
    const form = filingFormSchema.parse({ mode: 'new', name: 'Cited', notes: '', siliconeSystemId: '2', blend: JSON.stringify(blend) });
    const c = revisionContentFrom(form.blend, refs, silicone, '');
    expect(c).toMatchObject({ contentVersion: 3, packageModelRef: { id: 9, version: 2 } });
    expect(parseRecipe(JSON.parse(JSON.stringify(c))).packageModelRef).toEqual({ id: 9, version: 2 });
    const { packageModelRef: _r, ...withoutModel } = blend;
    expect(revisionContentFrom(withoutModel, refs, silicone, '').packageModelRef).toBeNull();
  });

  it('refuses a reference that is not an id and a version', () => {
    const text = JSON.stringify({ ...blend, packageModelRef: { id: 9 } });
    const bad = filingFormSchema.safeParse({ mode: 'new', name: 'x', notes: '', siliconeSystemId: '2', blend: text });
    expect(bad.success).toBe(false);
  });

  it('keeps the citation through the draft form (hidden field "id:version")', () => {
    const c = parseRecipe(revisionContentFrom(blend, refs, silicone, ''));
    const values = contentToFormValues(c);
    expect(values.packageModel).toBe('9:2');
    expect(parseRecipe(formValuesToRaw(values)).packageModelRef).toEqual({ id: 9, version: 2 });
    expect(parseRecipe(formValuesToRaw({ ...values, packageModel: '' })).packageModelRef).toBeNull();
    expect(() => parseRecipe(formValuesToRaw({ ...values, packageModel: 'nine' }))).toThrow(/packageModelRef/);
  });
});
