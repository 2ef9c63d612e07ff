/** The routes `npm run load` drives, with the status each must answer and the p95 goal where one is set. */
import { BLUE_PUMP, demoPhosphor } from '../../src/lib/blend/index';

export interface Scenario {
  name: string;
  method: 'GET' | 'POST';
  path: string;
  expect: number;
  body?: () => unknown;
  p95GoalMs?: number;
  /** Whose token sends it: the demo formulator unless the route is the line's. */
  as?: 'formulator' | 'technician';
}

const components = { pump: BLUE_PUMP, phosphors: [demoPhosphor('ph-gl530'), demoPhosphor('ph-yl568'), demoPhosphor('ph-rd625')] };
const wavelengths = Array.from({ length: 401 }, (_, i) => 380 + i);
const band = (l: number, p: number, w: number) => Math.exp(-0.5 * ((l - p) / (w / 2.3548)) ** 2);
let n = 0;
const RUN = Date.now().toString(36).toUpperCase();

/**
 * `draftContent`: a valid revision content (taken from the demo data) for the create-draft route;
 * `batchRevisionId`: an approved demo revision that the concurrent batch plans all come from.
 */
export const scenarios = ({ draftContent, batchRevisionId }: { draftContent: unknown; batchRevisionId: number }): Scenario[] => [
  {
    name: 'evaluate',
    method: 'POST',
    path: '/api/v1/evaluate',
    expect: 200,
    p95GoalMs: 100,
    // A slightly different white spectrum on every request, so nothing can be cached.
    body: () => {
      const r = 0.5 + (n++ % 50) / 100;
      return { spd: { wavelengths, values: wavelengths.map((l) => band(l, 450, 20) + 1.4 * band(l, 560, 110) + r * band(l, 625, 85)) } };
    }
  },
  {
    name: 'mix',
    method: 'POST',
    path: '/api/v1/mix',
    expect: 200,
    body: () => ({ components, ratios: { kind: 'optical', fractions: [0.2, 0.3, 0.3, 0.2 + (n++ % 10) / 100] } })
  },
  {
    name: 'solve',
    method: 'POST',
    path: '/api/v1/solve',
    expect: 200,
    body: () => ({
      components,
      target: { kind: 'cctDuv', cct: 3000 + (n++ % 5) * 100, duv: 0 },
      floors: { raMin: 80 },
      objective: 'maxLer'
    })
  },
  { name: 'list formulations', method: 'GET', path: '/api/v1/formulations?page=1', expect: 200, p95GoalMs: 100 },
  {
    name: 'create draft',
    method: 'POST',
    path: '/api/v1/formulations',
    expect: 201,
    body: () => ({ code: `LD-${RUN}-${n}`, name: `Load-run draft ${n++}`, description: 'made by npm run load', content: draftContent })
  },
  {
    // Every connection plans a batch of the same revision at once: each gets its own number, none a deadlock.
    name: 'create batch',
    method: 'POST',
    path: '/api/v1/batches',
    expect: 201,
    as: 'technician',
    body: () => ({
      revisionId: batchRevisionId,
      sizing: { kind: 'mass', batchMassG: 10 + (n++ % 10) },
      loading: { mode: 'perPhosphor', basis: 'wtPctOfSlurry' },
      additives: [],
      balance: { resolutionG: 0.001, minWeightG: 0.05, ref: 'BAL-LOAD' },
      plantLimitMin: 120,
      notes: 'made by npm run load'
    })
  }
];
