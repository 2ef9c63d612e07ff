/**
 * A package model chosen in the designer: what the loading model takes from it. The fit gives
 * each fitted phosphor's absorption at the pump, an IQE scale and a pump-escape factor, at the
 * package's path length and dispense geometry. The inverse (wt % for a mix) uses the path, the
 * geometry, α of the phosphors the model was fitted for (the library's α for the others) and
 * the IQE scale; the pump-escape factor is a package extraction term outside the layer model,
 * so the wt % estimate does not use it (it is shown with the model).
 */
import type { LoadingBasis } from '../blend/loading/beerLambertPhotonBudget';
import type { DispenseGeometry } from '../blend/loading/dispenseGeometry';
import type { BlendComponents } from '../blend/types';

export interface PackageModelChoice {
  id: number;
  name: string;
  version: number;
  packageType: string;
  pumpMaterialId: number;
  pathLengthMm: number;
  dispenseGeometry: DispenseGeometry;
  cascade: boolean;
  /** Fitted absorption at the pump, 1/(wt %·mm), per phosphor the model was fitted for. */
  phosphors: { materialId: number; code: string; absorptionPerWtPctMm: number }[];
  pumpEscape: number;
  iqeScale: number;
}

/** The models fitted for this pump, by name then newest version first. */
export function packageModelsForPump(models: readonly PackageModelChoice[], pumpId: number | null): PackageModelChoice[] {
  return models.filter((m) => m.pumpMaterialId === pumpId);
}

export const packageModelLabel = (m: { name: string; version: number }) => `${m.name} v${m.version}`;

/** The model's IQE scale on a datasheet IQE, capped at 1 (a photon in, at most one out). */
const scaledIqe = (iqe: number, model: PackageModelChoice) => Math.min(1, iqe * model.iqeScale);

/** The loading basis with the model's α (fitted phosphors only) and IQE scale; phosphor ids in basis order. */
export function basisWithPackageModel(basis: LoadingBasis, phosphorIds: readonly number[], model: PackageModelChoice): LoadingBasis {
  const fitted = new Map(model.phosphors.map((p) => [p.materialId, p.absorptionPerWtPctMm]));
  return {
    ...basis,
    absorptionPerWtPctMm: basis.absorptionPerWtPctMm.map((a, i) => fitted.get(phosphorIds[i]) ?? a),
    iqe: basis.iqe.map((q) => scaledIqe(q, model))
  };
}

/**
 * The components sent to the solver with the model's α (at the pump, so no reference wavelength)
 * for the fitted phosphors and the IQE scale, as the wt % estimate takes them.
 */
export function componentsWithPackageModel(
  components: BlendComponents,
  phosphorIds: readonly number[],
  model: PackageModelChoice
): BlendComponents {
  const fitted = new Map(model.phosphors.map((p) => [p.materialId, p.absorptionPerWtPctMm]));
  return {
    pump: components.pump,
    phosphors: components.phosphors.map((p, i) => {
      const alpha = fitted.get(phosphorIds[i]);
      const { absorptionReferenceNm: _ref, ...rest } = p;
      const iqe = scaledIqe(p.iqe, model);
      return alpha === undefined ? { ...p, iqe } : { ...rest, iqe, absorptionPerWtPctMm: alpha };
    })
  };
}
