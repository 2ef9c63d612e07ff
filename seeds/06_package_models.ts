/**
 * Demo package model of Kestrel Hollow Lighting (invented): "KH mid-power 3030 warm", fitted from six
 * synthetic builds of the demo pump B-450 with GL-530, YG-555 and RD-625 at two path lengths. The
 * builds come from the package loading model with an invented truth (α 10 % off the library values,
 * 25 % more blue escape, IQE 6 % below the datasheet) plus a small seeded scatter, so the stored fit
 * shows what calibration recovers. Idempotent: a model of that name already present is left alone.
 */
import type { Knex } from 'knex';
import { BLUE_PUMP, demoPhosphor } from '../src/lib/blend/demo-components';
import { prepareBasis } from '../src/lib/blend/basis';
import { packageObservables, packageSpd } from '../src/lib/blend/calibration/packageLoadingModel';
import { mulberry32 } from '../src/lib/blend/calibration/bootstrapBuilds';
import { fitPackageModel } from '../src/lib/blend/calibration/fitPackageModel';
import { toPackageBuild } from '../src/lib/server/package-models/fit';
import { storeModel } from '../src/lib/server/package-models/store';
import type { PackageFitInput } from '../src/lib/server/package-models/schema';

const NAME = 'KH mid-power 3030 warm';
const PHOSPHORS = ['ph-gl530', 'ph-yg555', 'ph-rd625'];
const RECIPES = [
  { c: [3, 6, 2], L: 0.25 },
  { c: [5, 4, 3], L: 0.25 },
  { c: [4, 7, 2.5], L: 0.25 },
  { c: [2, 9, 1.5], L: 0.4 },
  { c: [4, 5, 2.5], L: 0.4 },
  { c: [3, 4, 3.5], L: 0.4 }
];

export async function seed(knex: Knex): Promise<void> {
  if (!(await knex.schema.hasTable('package_models'))) return;
  if (await knex('package_models').where({ name: NAME }).first('id')) return;
  const specs = PHOSPHORS.map(demoPhosphor);
  const codes = [BLUE_PUMP, ...specs].map((s) => s.name.split(' ')[0]);
  const materials: { id: number; code: string }[] = await knex('materials').whereIn('code', codes).select('id', 'code');
  const idOf = (code: string) => materials.find((m) => m.code === code)?.id;
  const author = await knex('users').where({ email: 'rhea.okafor@kestrelhollow.example' }).first('id', 'email');
  if (!author || codes.some((c) => idOf(c) === undefined)) {
    console.log('seed 06_package_models: demo materials or formulator missing; demo package model skipped.');
    return;
  }
  const basis = prepareBasis({ pump: BLUE_PUMP, phosphors: specs }).loading!;
  const truth = {
    absorptionPerWtPctMm: basis.absorptionPerWtPctMm.map((a, i) => a * [0.9, 1.1, 0.95][i]),
    pumpEscape: 1.25,
    iqeScale: 0.94
  };
  const rnd = mulberry32(2612);
  const scatter = () => (rnd() - 0.5) * 2;
  const input: PackageFitInput = {
    name: NAME,
    packageType: '3030 mid-power, silicone-filled cavity',
    dispenseGeometry: 'fixedMass',
    pathLengthMm: 0.3,
    pumpId: idOf(codes[0])!,
    phosphorIds: codes.slice(1).map((c) => idOf(c)!),
    cascade: false,
    fitEscape: true,
    fitIqeScale: true,
    bootstrap: { resamples: 30, seed: 1 },
    builds: RECIPES.map(({ c, L }, i) => {
      const o = packageObservables(packageSpd(basis, truth, c, L));
      const r4 = (v: number) => Number(v.toFixed(4));
      return {
        label: `KH-B${i + 1}`,
        concentrationsWtPct: c,
        pathLengthMm: L,
        x: r4(o.xy[0] + 0.0003 * scatter()),
        y: r4(o.xy[1] + 0.0003 * scatter()),
        outputWPerPumpW: Number((o.wPerPumpW * (1 + 0.005 * scatter())).toFixed(4))
      };
    })
  };
  const fit = fitPackageModel(
    basis,
    input.builds.map(toPackageBuild),
    { pathLengthMm: 0.3, fitEscape: true, fitIqeScale: true },
    input.bootstrap
  );
  const phosphors = codes.slice(1).map((code) => ({ materialId: idOf(code)!, code }));
  await knex.transaction((trx) => storeModel(trx, { id: author.id, email: author.email }, input, fit, phosphors));
  console.log(`seed 06_package_models: ${NAME} v1 (RMS ${fit.rmsSteps.toFixed(2)} steps, ${fit.reason}).`);
}
