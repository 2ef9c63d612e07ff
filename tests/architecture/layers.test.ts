/**
 * Who may import whom, as one table (DEVELOPERS.md, "Where things go"): the pure modules run the same
 * in the browser, the server and the solver worker, so they import only each other (relative paths)
 * and a few computation packages; pages never reach server code; routes reach the database only
 * through a service. A directory listed here that does not exist yet is skipped.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { codeOnly, importsOf, repoRoot, sourceFiles, within, type ImportRef } from './imports';

const lib = (...names: string[]) => names.map((n) => `src/lib/${n}`);

/** The pure modules: computation, schemas and the types pages share with the server. */
const PURE = lib(
  'spectral',
  'blend',
  'aim',
  'recipe',
  'measurements',
  'charts',
  'formulations',
  'library',
  'designer',
  'spectrum-file',
  'access',
  'accounts',
  'batches',
  'audit',
  'storage',
  'errors',
  'roles',
  'pump-bins',
  'home'
);
const SERVER = lib('server');
const DATABASE = lib('server/db');

interface Rule {
  name: string;
  /** Repository-relative directories whose files the rule covers. */
  dirs: string[];
  /** Only files whose name matches (default: every .ts and .svelte file). */
  only?: RegExp;
  /** Why an import breaks the rule, or null when it is allowed. */
  refuse: (imp: ImportRef) => string | null;
  /** Also refuse browser/runtime globals, `any` and `require` in the code (comments and strings aside). */
  pureCode?: boolean;
}

/** A pure module: relative imports of the listed pure directories, and the listed packages. */
function pureImports(mayImport: string[], packages: string[]) {
  return ({ specifier, target }: ImportRef): string | null => {
    if (target.kind === 'package') {
      return packages.includes(target.name) ? null : `package ${target.name} is not one of ${packages.join(', ') || 'none'}`;
    }
    if (target.kind !== 'source') return `${target.kind} module ${target.name}`;
    if (!specifier.startsWith('.')) return 'use a relative path ($lib resolves only inside SvelteKit)';
    return within(target.path, mayImport) ? null : `${target.path} is outside ${mayImport.join(', ')}`;
  };
}

const RULES: Rule[] = [
  {
    name: 'the spectral core imports only itself and the domain error',
    dirs: lib('spectral'),
    refuse: pureImports(lib('spectral', 'errors'), []),
    pureCode: true
  },
  {
    name: 'the blend model imports the spectral core, the aim and the domain error',
    dirs: lib('blend'),
    refuse: pureImports(lib('spectral', 'blend', 'aim', 'errors'), ['zod', 'mathjs']),
    pureCode: true
  },
  {
    name: 'pure modules import pure modules and computation packages only',
    dirs: PURE.filter((d) => !within(d, lib('spectral', 'blend'))),
    refuse: pureImports(PURE, ['zod', 'mathjs', 'd3', 'colorjs.io', 'papaparse', 'fast-xml-parser']),
    pureCode: true
  },
  {
    name: 'nothing outside src/lib/server imports server code',
    dirs: ['src/lib'],
    refuse: ({ file, target }) =>
      !within(file, SERVER) && target.kind === 'source' && within(target.path, SERVER) ? `${target.path} is server code` : null
  },
  {
    name: 'Svelte components never import server code',
    dirs: ['src'],
    only: /\.svelte$/,
    refuse: ({ target }) => (target.kind === 'source' && within(target.path, SERVER) ? `${target.path} is server code` : null)
  },
  {
    name: 'routes reach the database through a service',
    dirs: ['src/routes'],
    refuse: ({ target }) =>
      target.kind === 'source' && within(target.path, DATABASE) ? `${target.path}: call a service in src/lib/server/<feature>` : null
  },
  {
    name: 'the app never imports the Knex command-line configuration',
    dirs: ['src'],
    refuse: ({ target }) =>
      target.kind === 'source' && /^knexfile/.test(target.path) ? 'read settings from src/lib/server/config.ts' : null
  }
];

const PURE_CODE: [RegExp, string][] = [
  [/\b(document|window|localStorage|sessionStorage|process|fetch|XMLHttpRequest)\b/, 'a browser or Node global'],
  [/\brequire\s*\(/, 'require()'],
  [/:\s*any\b|\bas any\b|<any>/, 'the any type']
];

function filesOf(rule: Rule): string[] {
  return rule.dirs.flatMap(sourceFiles).filter((f) => !rule.only || rule.only.test(f));
}

describe('import layers', () => {
  it('reads the main layers (the table points at real code)', () => {
    for (const dir of lib('spectral', 'blend', 'batches/weighout', 'measurements', 'server'))
      expect(sourceFiles(dir).length, dir).toBeGreaterThan(3);
    expect(importsOf('src/lib/server/db/index.ts').some((i) => i.target.kind === 'package' && i.target.name === 'knex')).toBe(true);
  });

  it.each(RULES.map((r) => ({ ...r, label: r.name })))('$label', (rule) => {
    const broken: string[] = [];
    for (const file of filesOf(rule)) {
      for (const imp of importsOf(file)) {
        const why = rule.refuse(imp);
        if (why) broken.push(`${file}: '${imp.specifier}' — ${why}`);
      }
      if (rule.pureCode && file.endsWith('.ts')) {
        const code = codeOnly(readFileSync(join(repoRoot, file), 'utf8'));
        for (const [re, what] of PURE_CODE) if (re.test(code)) broken.push(`${file}: uses ${what}`);
      }
    }
    expect(broken).toEqual([]);
  });

  it('only src/lib/server/config.ts reads the environment', () => {
    const readsEnv = (f: string) =>
      /\bprocess\.env\b/.test(codeOnly(readFileSync(join(repoRoot, f), 'utf8'))) ||
      importsOf(f).some((i) => i.specifier.startsWith('$env/'));
    const readers = sourceFiles('src').filter(readsEnv);
    expect(readers).toEqual(['src/lib/server/config.ts']);
  });

  it('the feature folders of src/lib import each other without a loop', () => {
    const folder = (path: string) => path.split('/').slice(0, 3).join('/');
    const edges = new Map<string, Set<string>>();
    for (const file of PURE.flatMap(sourceFiles)) {
      for (const { target } of importsOf(file)) {
        if (target.kind !== 'source' || folder(target.path) === folder(file)) continue;
        (edges.get(folder(file)) ?? edges.set(folder(file), new Set()).get(folder(file))!).add(folder(target.path));
      }
    }
    const loops = new Set<string>();
    const visit = (node: string, path: string[]) => {
      if (path.includes(node)) return void loops.add([...path.slice(path.indexOf(node)), node].join(' → '));
      for (const next of edges.get(node) ?? []) visit(next, [...path, node]);
    };
    for (const start of edges.keys()) visit(start, []);
    expect([...loops]).toEqual([]);
  });
});
