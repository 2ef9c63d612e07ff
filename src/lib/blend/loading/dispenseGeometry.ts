/**
 * Dispense geometry: how wt % of each phosphor in the slurry become optical depths
 * τᵢ = αᵢ·gᵢ·L at the pump reference wavelength, and back.
 *
 * Beer–Lambert (Beer 1852; Lambert 1760): the absorbance of a layer is proportional to the
 * amount of absorber per unit area, i.e. to the phosphor mass per unit volume of slurry × path.
 * The absorption coefficient αᵢ (1/(wt %·mm)) is defined in the dilute limit, where
 * phosphor mass per volume = (cᵢ/100)·ρ_silicone; gᵢ is the wt % that carries the same
 * phosphor mass per volume in that limit.
 *
 * - 'fixedMass' (default; stored revisions keep their meaning): a fixed slurry mass is
 *   dispensed per package and spreads over the same area, so the phosphor mass per area is
 *   ∝ cᵢ and gᵢ = cᵢ (exponent linear in wt %).
 * - 'fixedVolume': the cavity is filled to a fixed volume, so the phosphor mass per volume is
 *   (cᵢ/100)·ρ_slurry with 1/ρ_slurry = Σ(cⱼ/100)/ρⱼ + (1 − Σcⱼ/100)/ρ_silicone (ideal mixing:
 *   volumes add, no voids), and gᵢ = cᵢ·ρ_slurry/ρ_silicone. Volume fraction φᵢ = (cᵢ/100)·ρ_slurry/ρᵢ.
 *   Example (hand arithmetic): 50 wt % of a 4.5 g/cm³ phosphor in 1.1 g/cm³ silicone:
 *   ρ_slurry = 1/(0.5/4.5 + 0.5/1.1) = 1.768 g/cm³, φ = 0.196, while the linear (dilute) reading
 *   0.5·1.1/4.5 = 0.122 underestimates it by 38 %.
 * Assumptions: particles do not settle or agglomerate; the cured layer keeps the slurry's
 * volume; the effective path L is the same for both geometries (scattering in L).
 */
import { BlendInputError } from '../errors';

export type DispenseGeometry = 'fixedMass' | 'fixedVolume';

export const DEFAULT_SILICONE_DENSITY_G_PER_CM3 = 1.1;

export interface GeometrySpec {
  geometry?: DispenseGeometry;
  /** Phosphor densities (g/cm³); needed for 'fixedVolume'. */
  densityGPerCm3?: (number | null)[];
  siliconeDensityGPerCm3?: number;
}

function densitiesFor(spec: GeometrySpec, n: number): number[] {
  const d = spec.densityGPerCm3 ?? [];
  if (d.length < n || d.slice(0, n).some((v) => !(typeof v === 'number' && v > 0))) {
    throw new BlendInputError('a cavity filled to a fixed volume needs the density of every phosphor');
  }
  return d.slice(0, n) as number[];
}

/** Slurry density (g/cm³) from mass fractions, ideal mixing (volumes add). */
export function slurryDensityGPerCm3(concentrationsWtPct: number[], densities: number[], siliconeDensity: number): number {
  const phosphorShare = concentrationsWtPct.reduce((a, b) => a + b, 0) / 100;
  let inv = Math.max(0, 1 - phosphorShare) / siliconeDensity;
  concentrationsWtPct.forEach((c, i) => (inv += c / 100 / densities[i]));
  return 1 / inv;
}

/** Volume fraction of each phosphor in the slurry (0–1). */
export function volumeFractions(concentrationsWtPct: number[], densities: number[], siliconeDensity: number): number[] {
  const rho = slurryDensityGPerCm3(concentrationsWtPct, densities, siliconeDensity);
  return concentrationsWtPct.map((c, i) => ((c / 100) * rho) / densities[i]);
}

/** Dilute-equivalent wt % gᵢ (the factor of αᵢ·L in the exponent). */
export function effectiveWtPct(concentrationsWtPct: number[], spec: GeometrySpec): number[] {
  const c = concentrationsWtPct.map((v) => Math.max(0, v));
  if ((spec.geometry ?? 'fixedMass') === 'fixedMass') return c;
  const rhoSil = spec.siliconeDensityGPerCm3 ?? DEFAULT_SILICONE_DENSITY_G_PER_CM3;
  const rho = slurryDensityGPerCm3(c, densitiesFor(spec, c.length), rhoSil);
  return c.map((v) => (v * rho) / rhoSil);
}

export type WtPctFromEffective =
  { ok: true; concentrationsWtPct: number[]; totalWtPct: number } | { ok: false; reason: string; totalWtPct: number };

/**
 * Inverse of `effectiveWtPct`. fixedMass: c = g. fixedVolume: phosphor mass per volume
 * Mᵢ = gᵢ·ρ_sil/100, φᵢ = Mᵢ/ρᵢ, silicone mass per volume ρ_sil·(1 − Σφ), cᵢ = 100·Mᵢ/(ΣM + ρ_sil(1 − Σφ)).
 * Refuses when the phosphors alone would fill the volume or the total reaches 100 wt %.
 */
export function wtPctFromEffective(g: number[], spec: GeometrySpec): WtPctFromEffective {
  if ((spec.geometry ?? 'fixedMass') === 'fixedMass') {
    const total = g.reduce((a, b) => a + b, 0);
    if (!(total < 100)) return { ok: false, totalWtPct: total, reason: `it needs ${total.toFixed(1)} wt % of phosphor in total` };
    return { ok: true, concentrationsWtPct: g, totalWtPct: total };
  }
  const rhoSil = spec.siliconeDensityGPerCm3 ?? DEFAULT_SILICONE_DENSITY_G_PER_CM3;
  const rho = densitiesFor(spec, g.length);
  const mass = g.map((v) => (v * rhoSil) / 100);
  const phi = mass.reduce((s, m, i) => s + m / rho[i], 0);
  if (!(phi < 1)) {
    return { ok: false, totalWtPct: 100, reason: `it needs ${(100 * phi).toFixed(0)} % of the cavity volume in phosphor` };
  }
  const totalMass = mass.reduce((a, b) => a + b, 0) + rhoSil * (1 - phi);
  const c = mass.map((m) => (100 * m) / totalMass);
  return { ok: true, concentrationsWtPct: c, totalWtPct: c.reduce((a, b) => a + b, 0) };
}
