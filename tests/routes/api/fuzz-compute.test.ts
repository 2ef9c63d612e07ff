/**
 * Hostile input on the compute API: 1,000+ generated malformed bodies per route. Every answer must be
 * a clean JSON error (400/413/415/422) or a 200 — never an exception (which would be a 500).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { POST as evaluatePost } from '../../../src/routes/api/v1/evaluate/+server';
import { POST as mixPost } from '../../../src/routes/api/v1/mix/+server';
import { POST as solvePost } from '../../../src/routes/api/v1/solve/+server';
import { POST as correctPost } from '../../../src/routes/api/v1/correct/+server';
import { BLUE_PUMP, demoPhosphor } from '../../../src/lib/blend';
import { jsonEvent } from './support';

const components = { pump: BLUE_PUMP, phosphors: [demoPhosphor('ph-gl530'), demoPhosphor('ph-rd625')] };
const wl = Array.from({ length: 41 }, (_, i) => 380 + i * 10);
const valid: Record<string, unknown> = {
  evaluate: { spd: { wavelengths: wl, values: wl.map((l) => Math.exp(-(((l - 560) / 80) ** 2))) } },
  mix: { components, ratios: { kind: 'optical', fractions: [0.3, 0.4, 0.3] } },
  solve: { components, target: { kind: 'cctDuv', cct: 3500, duv: 0 }, objective: 'maxLer', maxCandidates: 1 },
  correct: {
    components,
    recipe: { kind: 'optical', fractions: [0.3, 0.4, 0.3] },
    measured: { kind: 'xy', points: [{ x: 0.41, y: 0.39 }] },
    target: { kind: 'cctDuv', cct: 3500, duv: 0 }
  }
};

// Hostile leaves: wrong types, non-finite stand-ins, huge and tiny numbers, injection-looking strings.
const hostileLeaf = fc.oneof(
  fc.constantFrom(
    null,
    true,
    '',
    'NaN',
    'Infinity',
    '<script>alert(1)</script>',
    "'; DROP TABLE users; --",
    -1,
    0,
    1e308,
    -1e308,
    5e-324,
    2 ** 53
  ),
  fc.double(),
  fc.string(),
  fc.array(fc.double(), { maxLength: 8 }),
  fc.dictionary(fc.string({ maxLength: 5 }), fc.integer(), { maxKeys: 3 })
);

/** Replaces, deletes or adds one value at a random path of a valid body. */
function mutate(body: unknown, choices: number[], leaf: unknown): unknown {
  const clone = structuredClone(body) as Record<string, unknown>;
  let node: Record<string, unknown> | unknown[] = clone;
  for (const c of choices) {
    const keys = Object.keys(node);
    if (keys.length === 0) break;
    const k = keys[c % keys.length];
    const next = (node as Record<string, unknown>)[k];
    if (next && typeof next === 'object' && c % 3 !== 0) {
      node = next as Record<string, unknown>;
      continue;
    }
    if (c % 5 === 0 && !Array.isArray(node)) delete (node as Record<string, unknown>)[k];
    else (node as Record<string, unknown>)[k] = leaf;
    return clone;
  }
  (node as Record<string, unknown>)['extra'] = leaf;
  return clone;
}

const handlers = { evaluate: evaluatePost, mix: mixPost, solve: solvePost, correct: correctPost } as const;
const ALLOWED = new Set([200, 400, 413, 415, 422]);

describe.each(Object.keys(handlers) as (keyof typeof handlers)[])('fuzzing POST /api/v1/%s', (name) => {
  it('answers 1,000 mutated bodies without an exception', async () => {
    let calls = 0;
    const tally = new Map<number, number>();
    await fc.assert(
      fc.asyncProperty(fc.array(fc.nat(50), { minLength: 1, maxLength: 6 }), hostileLeaf, async (choices, leaf) => {
        const res = await handlers[name](jsonEvent(mutate(valid[name], choices, leaf)) as never);
        calls++;
        tally.set(res.status, (tally.get(res.status) ?? 0) + 1);
        expect(ALLOWED.has(res.status), `status ${res.status}`).toBe(true);
        const body = await res.json();
        if (res.status !== 200) expect(typeof body.error).toBe('string');
      }),
      { numRuns: 1000, seed: 20261202 }
    );
    expect(calls).toBeGreaterThanOrEqual(1000);
    // The generator must reach both the validator's refusals and the computation itself.
    expect(tally.get(400) ?? 0).toBeGreaterThan(100);
    expect(tally.get(200) ?? 0).toBeGreaterThan(0);
    console.log(`fuzz ${name}: ${[...tally].map(([s, n]) => `${s}×${n}`).join(' ')}`);
  }, 120_000);

  it('answers 200 arbitrary JSON values and raw strings without an exception', async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.oneof(
          fc.jsonValue(),
          fc.string().map((s) => ({ raw: s }))
        ),
        async (v) => {
          const text = typeof v === 'object' && v !== null && 'raw' in v ? String((v as { raw: string }).raw) : JSON.stringify(v);
          const res = await handlers[name](jsonEvent(text) as never);
          expect(ALLOWED.has(res.status)).toBe(true);
        }
      ),
      { numRuns: 200, seed: 7 }
    );
  });
});
