import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

// House rule (STYLE.md): pure computation in src/lib/<feature> — relative imports (and zod) only;
// no DOM, database, node:* or framework imports, so the weigh-out runs the same in the browser.
const root = join(import.meta.dirname, '../../../src/lib/weighout');

describe('weigh-out module purity', () => {
  it.each(readdirSync(root).filter((f) => f.endsWith('.ts')))('%s', (name) => {
    const text = readFileSync(join(root, name), 'utf8');
    for (const m of text.matchAll(/from\s*['"]([^'"]+)['"]/g)) expect(m[1]).toMatch(/^(\.\.?\/|zod$)/);
    expect(text).not.toMatch(/\b(document|window|localStorage|process\.env)\b|\brequire\s*\(/);
  });
});
