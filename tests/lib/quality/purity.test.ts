import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

// House rule (STYLE.md, helper brief): pure computation in src/lib/<feature> — relative imports of other
// pure modules (aim, spectral, blend, formulations, recipe) and zod only; no svelte, $app, $env, server code,
// node:*, knex, DOM or I/O.
const root = join(import.meta.dirname, '../../../src/lib/quality');
const specifier = /(?:import|export)[^'"]*?from\s*['"]([^'"]+)['"]|import\s*\(\s*['"]([^'"]+)['"]\s*\)|^\s*import\s*['"]([^'"]+)['"]/gm;

describe('quality computations are pure', () => {
  const files = readdirSync(root).filter((f) => f.endsWith('.ts'));
  it.each(files)('%s', (f) => {
    const text = readFileSync(join(root, f), 'utf8');
    for (const m of text.matchAll(specifier)) {
      const spec = m[1] ?? m[2] ?? m[3];
      expect(spec, `${f}: ${spec}`).toMatch(/^(\.\/|\.\.\/(aim|spectral|blend|formulations)\/|\.\.\/recipe(\/|$))/);
      expect(spec).not.toMatch(/server|cie-illuminants/);
    }
    expect(text).not.toMatch(/\b(document|window|localStorage|process\.env|fetch)\b/);
    expect(text).not.toMatch(/:\s*any\b|as any\b/);
  });
});
