import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db, closeDb } from '../../../src/lib/server/db/index';
import { createModel, getModel, listModels } from '../../../src/lib/server/package-models/api';
import { parseBuildsCsv } from '../../../src/lib/server/package-models/builds-csv';
import { prepareBasis } from '../../../src/lib/blend/basis';
import { BLUE_PUMP, demoPhosphor } from '../../../src/lib/blend/demo-components';
import { packageObservables, packageSpd } from '../../../src/lib/blend/calibration/packageLoadingModel';
import { demoUser } from '../library/support';
import type { User } from '../../../src/lib/server/accounts/users';

// Fit a package model through the API handlers against the real database, from builds made with the
// forward model at a known truth (α ×1.1, escape 1.3, IQE ×0.92 — the case), and check that
// refused bodies save nothing. Fit recovery itself is checked in tests/blend/packageCalibration.test.ts.
const NAME = 'TST package fit';
const PHOSPHORS = ['ph-yg555', 'ph-rd625'];
let rhea: User;
let tomas: User;
let pumpId: number;
let phosphorIds: number[];

const codeOf = (name: string) => name.split(' ')[0];
const basis = prepareBasis({ pump: BLUE_PUMP, phosphors: PHOSPHORS.map(demoPhosphor) }).loading!;
const truth = { absorptionPerWtPctMm: basis.absorptionPerWtPctMm.map((a) => a * 1.1), pumpEscape: 1.3, iqeScale: 0.92 };
const builds = [
  { c: [8, 2], L: 0.25 },
  { c: [12, 3], L: 0.25 },
  { c: [6, 3], L: 0.4 },
  { c: [10, 1.5], L: 0.4 }
].map(({ c, L }, i) => {
  const o = packageObservables(packageSpd(basis, truth, c, L));
  return { label: `B${i + 1}`, concentrationsWtPct: c, pathLengthMm: L, x: o.xy[0], y: o.xy[1], outputWPerPumpW: o.wPerPumpW };
});

function post(body: unknown, user: User) {
  const request = new Request('http://local/api/v1/package-models', {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify(body)
  });
  return createModel({ request, locals: { user } as App.Locals, params: {} });
}
const body = (extra: Record<string, unknown> = {}) => ({
  name: NAME,
  packageType: 'test cavity',
  pathLengthMm: 0.3,
  pumpId,
  phosphorIds,
  fitIqeScale: true,
  bootstrap: { resamples: 8, seed: 3 },
  builds,
  ...extra
});
const rows = async () => ({
  models: Number(((await db()('package_models').where({ name: NAME }).count({ n: '*' }).first()) as { n: number }).n),
  audit: Number(((await db()('audit_events').where({ entity_type: 'package-model' }).count({ n: '*' }).first()) as { n: number }).n)
});

describe('package models: create by fit through the API, versions, refusals that save nothing', () => {
  beforeAll(async () => {
    rhea = await demoUser('formulator');
    tomas = await demoUser('technician');
    const mats: { id: number; code: string }[] = await db()('materials')
      .whereIn(
        'code',
        [BLUE_PUMP, ...PHOSPHORS.map(demoPhosphor)].map((s) => codeOf(s.name))
      )
      .select('id', 'code');
    pumpId = mats.find((m) => m.code === codeOf(BLUE_PUMP.name))!.id;
    phosphorIds = PHOSPHORS.map((p) => mats.find((m) => m.code === codeOf(demoPhosphor(p).name))!.id);
  });
  afterAll(async () => {
    await closeDb();
  });

  it('fits, stores version 1 with its audit event, and a second fit of the same name is version 2', async () => {
    const before = await rows();
    const res = await post(body(), rhea);
    expect(res.status).toBe(201);
    const m = await res.json();
    expect(m.version).toBe(before.models + 1);
    expect(m.parameters.parameters.pumpEscape).toBeCloseTo(1.3, 2);
    expect(m.parameters.parameters.iqeScale).toBeCloseTo(0.92, 2);
    expect(m.maxSteps).toBeLessThan(0.5);
    expect(m.fit.converged).toBe(true);
    expect(m.fit.bootstrap.resamples).toBe(8);
    const second = await (await post(body(), rhea)).json();
    expect(second.version).toBe(m.version + 1);
    expect(await rows()).toEqual({ models: before.models + 2, audit: before.audit + 2 });
    const got = await getModel({
      request: new Request('http://local/x'),
      locals: { user: tomas } as App.Locals,
      params: { id: String(m.id) }
    });
    expect((await got.json()).id).toBe(m.id);
    const list = await (
      await listModels({ request: new Request('http://local/x'), locals: { user: tomas } as App.Locals, params: {} })
    ).json();
    expect(list.items.some((i: { id: number }) => i.id === second.id)).toBe(true);
  }, 120_000);

  it('fits a cavity filled to a fixed volume from builds made in that geometry (densities from the library)', async () => {
    // The demo phosphors carry densities, so the forward model turns wt % into volume fractions
    // (ideal mixing [common practice]); the fit in the same geometry gives back the truth.
    const volumeBuilds = [
      { c: [16, 4], L: 0.25 },
      { c: [24, 6], L: 0.25 },
      { c: [12, 6], L: 0.4 },
      { c: [20, 3], L: 0.4 }
    ].map(({ c, L }, i) => {
      const o = packageObservables(packageSpd(basis, truth, c, L, { geometry: 'fixedVolume' }));
      return { label: `V${i + 1}`, concentrationsWtPct: c, pathLengthMm: L, x: o.xy[0], y: o.xy[1], outputWPerPumpW: o.wPerPumpW };
    });
    const res = await post(body({ name: `${NAME} volume`, dispenseGeometry: 'fixedVolume', builds: volumeBuilds }), rhea);
    expect(res.status).toBe(201);
    const m = await res.json();
    expect(m.dispenseGeometry).toBe('fixedVolume');
    expect(m.parameters.parameters.pumpEscape).toBeCloseTo(1.3, 2);
    expect(m.parameters.parameters.iqeScale).toBeCloseTo(0.92, 2);
    const alpha: number[] = m.parameters.parameters.absorptionPerWtPctMm;
    alpha.forEach((a, i) => expect(a / truth.absorptionPerWtPctMm[i]).toBeCloseTo(1, 2));
    expect(m.maxSteps).toBeLessThan(0.5);
  }, 120_000);

  it('versions are immutable at the database', async () => {
    const row = await db()('package_models').where({ name: NAME }).first('id');
    await expect(db()('package_models').where({ id: row.id }).update({ rms_steps: 0 })).rejects.toThrow(/immutable/);
    await expect(db()('package_models').where({ id: row.id }).delete()).rejects.toThrow(/immutable/);
  });

  const refusals: [string, Record<string, unknown>, number, RegExp][] = [
    ['one build only', { builds: builds.slice(0, 1) }, 400, /at least two builds/],
    [
      'wt % count not matching the phosphors',
      { builds: builds.map((b) => ({ ...b, concentrationsWtPct: [5] })) },
      400,
      /give 2 wt % values/
    ],
    ['no colour on a build', { builds: builds.map(({ x: _x, ...b }) => b) }, 400, /measured x and y/],
    ['IQE scale without any measured output', { builds: builds.map(({ outputWPerPumpW: _o, ...b }) => b) }, 422, /needs a measured output/],
    ['a single loading for the escape', { builds: [builds[0], { ...builds[0], label: 'again' }] }, 422, /two or more loadings/],
    ['no pump chosen', { pumpId: 0 }, 400, /Pump must be chosen/]
  ];
  it('refuses a phosphor given as the pump (422) and saves nothing', async () => {
    const before = await rows();
    const res = await post(body({ pumpId: phosphorIds[0] }), rhea);
    expect(res.status).toBe(422);
    expect((await res.json()).error).toMatch(/is a phosphor, not a pump/);
    expect(await rows()).toEqual(before);
  });

  for (const [what, extra, status, message] of refusals) {
    it(`refuses ${what} (${status}) and saves nothing`, async () => {
      const before = await rows();
      const res = await post(body(extra), rhea);
      expect(res.status).toBe(status);
      expect((await res.json()).error).toMatch(message);
      expect(await rows()).toEqual(before);
    });
  }

  it('a technician may not fit (403)', async () => {
    const before = await rows();
    expect((await post(body(), tomas)).status).toBe(403);
    expect(await rows()).toEqual(before);
  });
});

describe('builds CSV: line-named errors', () => {
  it('reads a header with phosphor codes and optional columns', () => {
    const r = parseBuildsCsv('# two builds\nlabel;YG-555;RD-625;x;y;path_mm\nA;8;2;0,4001;0,3902;0.25\nB;12;3;0.4302;0.4003;0.4');
    expect(r).toMatchObject({
      ok: true,
      value: {
        phosphorCodes: ['YG-555', 'RD-625'],
        builds: [
          { label: 'A', x: 0.4001, pathLengthMm: 0.25 },
          { label: 'B', concentrationsWtPct: [12, 3] }
        ]
      }
    });
  });
  it('names the line of each problem', () => {
    const r = parseBuildsCsv('label,YG-555,x,y\nA,8,0.40\nB,abc,0.41,0.39');
    expect(r.ok).toBe(false);
    if (!r.ok)
      expect(r.errors).toEqual([
        { line: 2, message: 'Expected 4 values, found 3.' },
        { line: 3, message: 'YG-555 wt % "abc" is not a number.' }
      ]);
  });
});
