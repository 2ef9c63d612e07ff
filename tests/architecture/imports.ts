/**
 * The import graph of `src/`, read from the source text: every import specifier of every file,
 * resolved to what it names (a file under `src/`, a package, a `node:` builtin or a framework module).
 */
import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';

export const repoRoot = resolve(import.meta.dirname, '../..');

export type Target =
  | { kind: 'source'; path: string } // repository-relative, e.g. src/lib/server/db/index
  | { kind: 'package'; name: string }
  | { kind: 'node'; name: string }
  | { kind: 'framework'; name: string }; // $app/*, $env/*, svelte, @sveltejs/kit, ./$types

export interface ImportRef {
  file: string;
  specifier: string;
  target: Target;
}

const SPECIFIER =
  /(?:^|[\s;])(?:import|export)\s[^'"`;]*?from\s*['"]([^'"]+)['"]|import\s*\(\s*['"]([^'"]+)['"]\s*\)|^\s*import\s*['"]([^'"]+)['"]/gm;

/** Every .ts and .svelte file under a repository-relative directory (none when it does not exist). */
export function sourceFiles(dir: string): string[] {
  const abs = join(repoRoot, dir);
  if (!existsSync(abs)) return [];
  return readdirSync(abs).flatMap((f) => {
    const p = join(dir, f);
    if (statSync(join(repoRoot, p)).isDirectory()) return sourceFiles(p);
    return /\.(ts|svelte)$/.test(f) ? [p] : [];
  });
}

function packageName(spec: string): string {
  const parts = spec.split('/');
  return spec.startsWith('@') ? parts.slice(0, 2).join('/') : parts[0];
}

export function resolveSpecifier(file: string, spec: string): Target {
  if (spec.startsWith('node:')) return { kind: 'node', name: spec };
  if (/^(\$app|\$env|\$service-worker)(\/|$)/.test(spec) || /^(svelte|@sveltejs\/kit)(\/|$)/.test(spec) || /\/\$types$/.test(spec)) {
    return { kind: 'framework', name: spec };
  }
  if (spec === '$lib' || spec.startsWith('$lib/')) return { kind: 'source', path: join('src/lib', spec.slice(4)) };
  if (spec.startsWith('.')) return { kind: 'source', path: relative(repoRoot, resolve(repoRoot, dirname(file), spec)) };
  return { kind: 'package', name: packageName(spec) };
}

/** The text of a file without comments and string contents, for scans of identifiers. */
export function codeOnly(text: string): string {
  return text
    .replace(/\/\*[\s\S]*?\*\//g, '')
    .replace(/(^|[^:\\])\/\/.*$/gm, '$1')
    .replace(/'(?:\\.|[^'\\\n])*'|"(?:\\.|[^"\\\n])*"|`(?:\\.|[^`\\])*`/g, "''");
}

export function importsOf(file: string): ImportRef[] {
  let text = readFileSync(join(repoRoot, file), 'utf8');
  if (file.endsWith('.svelte')) text = [...text.matchAll(/<script[^>]*>([\s\S]*?)<\/script>/g)].map((m) => m[1]).join('\n');
  return [...text.matchAll(SPECIFIER)].map((m) => {
    const specifier = m[1] ?? m[2] ?? m[3];
    return { file, specifier, target: resolveSpecifier(file, specifier) };
  });
}

/** True when a resolved source path lies in (or is) one of the repository-relative directories. */
export function within(path: string, dirs: readonly string[]): boolean {
  return dirs.some((d) => path === d || path.startsWith(`${d}/`));
}
