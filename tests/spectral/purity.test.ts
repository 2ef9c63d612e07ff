import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';

// House rule (STYLE.md): the spectral core is pure — relative imports only; no svelte, $app, $env,
// $lib, node:*, knex, DOM or fs. Test-only data (cie-illuminants) is never imported by the core.
const root = join(import.meta.dirname, '../../src/lib/spectral');

function files(dir: string): string[] {
  return readdirSync(dir).flatMap((f) => {
    const p = join(dir, f);
    return statSync(p).isDirectory() ? files(p) : p.endsWith('.ts') ? [p] : [];
  });
}

const specifier = /(?:import|export)[^'"]*?from\s*['"]([^'"]+)['"]|import\s*\(\s*['"]([^'"]+)['"]\s*\)|^\s*import\s*['"]([^'"]+)['"]/gm;

describe('spectral core purity (STYLE.md)', () => {
  const all = files(root);
  it('finds the core files', () => {
    expect(all.length).toBeGreaterThan(20);
  });
  it.each(all.map((f) => ({ name: relative(root, f), file: f })))('$name', ({ file }) => {
    const text = readFileSync(file, 'utf8');
    for (const m of text.matchAll(specifier)) {
      const spec = m[1] ?? m[2] ?? m[3];
      expect(spec, `${file}: ${spec}`).toMatch(/^\.\.?\//);
      expect(spec).not.toMatch(/cie-illuminants/);
    }
    expect(text).not.toMatch(/\brequire\s*\(/);
    expect(text).not.toMatch(/\b(document|window|localStorage|process\.env)\b/);
    expect(text).not.toMatch(/:\s*any\b|as any\b/);
  });
});
