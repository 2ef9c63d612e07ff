/**
 * `npm run lint` part: no line of hand-written code over 140 characters (house style). Prettier wraps
 * code at 140 but leaves long strings, template literals and comments alone; this check catches those.
 * Generated data tables (src/lib/spectral/data/, made by scripts/gen-spectral-data.ts) are exempt.
 * Usage: node scripts/check-line-length.mjs   (exit 1 and a list of file:line when any line is too long)
 */
import { execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { pathToFileURL } from 'node:url';

export const MAX_LINE_LENGTH = 140;
const CODE = /\.(ts|js|mjs|cjs|svelte|sh|css|html)$/;
const GENERATED = ['src/lib/spectral/data/'];

/**
 * Whether the file is hand-written code that the check covers.
 * @param {string} path
 */
export function isChecked(path) {
  return CODE.test(path) && !GENERATED.some((dir) => path.startsWith(dir)) && !landedBeforeRule(path);
}

/** Migrations that landed before this rule are never edited (not even re-wrapped), so they are exempt. */
const RULE_SINCE = '20261204000000';

/** @param {string} path */
function landedBeforeRule(path) {
  const m = /^migrations\/(\d{14})_/.exec(path);
  return m !== null && m[1] < RULE_SINCE;
}

/**
 * The 1-based numbers and lengths of the lines longer than the limit (length in characters, not bytes).
 * @param {string} text
 * @param {number} [max]
 * @returns {{ line: number, length: number }[]}
 */
export function longLines(text, max = MAX_LINE_LENGTH) {
  /** @type {{ line: number, length: number }[]} */
  const out = [];
  text.split('\n').forEach((line, i) => {
    const length = [...line.replace(/\r$/, '')].length;
    if (length > max) out.push({ line: i + 1, length });
  });
  return out;
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  const files = execFileSync('git', ['ls-files', '--cached', '--others', '--exclude-standard'], { encoding: 'utf8' })
    .split('\n')
    .filter((f) => f && isChecked(f));
  let count = 0;
  for (const file of files) {
    let text;
    try {
      text = readFileSync(file, 'utf8');
    } catch {
      continue; // listed by git but deleted in the working tree
    }
    for (const { line, length } of longLines(text)) {
      console.log(`${file}:${line}: ${length} characters (at most ${MAX_LINE_LENGTH})`);
      count++;
    }
  }
  if (count > 0) {
    console.error(`line length: ${count} line(s) over ${MAX_LINE_LENGTH} characters in hand-written code`);
    process.exit(1);
  }
  console.log(`line length: ${files.length} files, no line over ${MAX_LINE_LENGTH} characters`);
}
