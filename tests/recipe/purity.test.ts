import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

// House rule (STYLE.md): src/lib/recipe is pure — zod and relative imports only; no svelte, $app,
// $env, server code, node:*, knex, DOM or I/O, so the designer can use it in the browser.
const root = join(import.meta.dirname, '../../src/lib/recipe');
const specifier = /(?:import|export)[^'"]*?from\s*['"]([^'"]+)['"]|import\s*\(\s*['"]([^'"]+)['"]\s*\)|^\s*import\s*['"]([^'"]+)['"]/gm;

describe('recipe module purity', () => {
  it.each(readdirSync(root).filter((f) => f.endsWith('.ts')))('%s', (f) => {
    const text = readFileSync(join(root, f), 'utf8');
    for (const m of text.matchAll(specifier)) {
      const spec = m[1] ?? m[2] ?? m[3];
      expect(spec, `${f}: ${spec}`).toMatch(/^(\.\/|\.\.\/aim\/schema$|zod$)/);
    }
    expect(text).not.toMatch(/\b(document|window|localStorage|process\.env|fetch)\b|\brequire\s*\(/);
    expect(text).not.toMatch(/:\s*any\b|as any\b/);
  });
});
