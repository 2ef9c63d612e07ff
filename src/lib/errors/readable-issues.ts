/**
 * Validation problems as people read them: the field's label and a sentence, never an internal path
 * ("phosphors.0.opticalFraction") or a schema library's wording ("Too small: expected number to be
 * >=0"). The one table every form and API error message goes through.
 */
import type { Issue } from './domain-error';

type Label = string | ((m: RegExpExecArray) => string);
const nth = (m: RegExpExecArray, i = 1) => Number(m[i]) + 1;

/** Field paths (dot-joined, as zod reports them) → labels. First match wins. */
const LABELS: readonly [RegExp, Label][] = [
  [/^phosphors\.(\d+)\.opticalFraction$/, (m) => `Optical fraction of phosphor ${nth(m)}`],
  [/^phosphors\.(\d+)\.wtPct$/, (m) => `wt % of phosphor ${nth(m)}`],
  [/^phosphors\.(\d+)(\.materialId)?$/, (m) => `Phosphor ${nth(m)}`],
  [/^phosphors$/, 'Phosphors'],
  [/^pump(\.materialId)?$/, 'Pump'],
  [/^pumpLeakFraction$/, 'Pump leak'],
  [/^loading\.pathLengthMm$/, 'Optical path length'],
  [/^silicone(Id|\.siliconeSystemId)?$/, 'Silicone system'],
  [/^silicone\.tolerance([AB])\.(tolerance|value)$/, (m) => `Tolerance of silicone part ${m[1]}`],
  [/^silicone\.ratio([AB])$/, (m) => `Mix ratio, part ${m[1]}`],
  [/^(sizing\.)?batchMassG$/, 'Batch mass'],
  [/^iqe$/, 'IQE'],
  [/^densityGPerCm3$/, 'Density'],
  [/^costPerKg$/, 'Cost per kg'],
  [/^sizing\.partCount$/, 'Number of parts'],
  [/^sizing\.(dispenseMassG|massPerPartG)$/, 'Slurry per part'],
  [/^sizing\.yieldLossPct$/, 'Allowance for losses'],
  [/^balance\.resolutionG$/, 'Balance step'],
  [/^balance\.minWeightG$/, 'Smallest weighable mass'],
  [/^additives\.(\d+)\.(\w+)$/, (m) => `Additive ${nth(m)}, ${words(m[2])}`],
  [/^(target\.)?cct$/, 'CCT'],
  [/^(target\.)?duv$/, 'Duv'],
  [/^(target\.)?nominalCct$/, 'ANSI nominal CCT'],
  [/^(target\.)?x$/, 'Chromaticity x'],
  [/^(target\.)?y$/, 'Chromaticity y'],
  [/^tolerance\.(steps|value)$/, 'Colour tolerance'],
  [/^floors\.raMin$|^raMin$/, 'Ra floor'],
  [/^floors\.r9Min$|^r9Min$/, 'R9 floor'],
  [/^floors\.rfMin$|^rfMin$/, 'Rf floor'],
  [/^floors\.rgMin$|^rgMin$/, 'Rg lower limit'],
  [/^floors\.rgMax$|^rgMax$/, 'Rg upper limit'],
  [/^floors\.intent$|^intent$/, 'TM-30 design intent'],
  [/^floors\.lerMin$|^lerMin$/, 'LER floor'],
  [/^floors\.melDerMin$|^melDerMin$/, 'Melanopic DER floor'],
  [/^floors\.melDerMax$|^melDerMax$/, 'Melanopic DER ceiling'],
  [/^packageModelRef(\..*)?$/, 'Package model'],
  [/^name$/, 'Name'],
  [/^code$/, 'Code'],
  [/^notes$/, 'Notes'],
  [/^email$/, 'E-mail'],
  [/^password$/, 'Password'],
  [/^comment$/, 'Comment'],
  [/^reason$/, 'Reason'],
  [/^version$/, 'Form version']
];

/** "batchMassG" → "batch mass g": a last resort for a field the table lacks. */
function words(key: string): string {
  return key
    .replace(/([a-z0-9])([A-Z])/g, '$1 $2')
    .replace(/[_-]+/g, ' ')
    .toLowerCase();
}

/** The label of a field path; '' for the form as a whole. */
export function fieldLabel(path: string): string {
  if (!path || path === '(body)' || path === '(content)' || path === '(file)') return '';
  for (const [pattern, label] of LABELS) {
    const m = pattern.exec(path);
    if (m) return typeof label === 'string' ? label : label(m);
  }
  const last =
    path
      .split('.')
      .filter((p) => !/^\d+$/.test(p))
      .at(-1) ?? path;
  const w = words(last);
  return w.charAt(0).toUpperCase() + w.slice(1);
}

/** zod's default wordings → sentences. Messages a schema wrote itself pass unchanged. */
const SENTENCES: readonly [RegExp, (m: RegExpExecArray) => string][] = [
  [/^Too small: expected number to be >=(-?[\d.e+-]+)$/, (m) => `must be at least ${m[1]}`],
  [/^Too small: expected number to be >(-?[\d.e+-]+)$/, (m) => `must be more than ${m[1]}`],
  [/^Too big: expected number to be <=(-?[\d.e+-]+)$/, (m) => `must be at most ${m[1]}`],
  [/^Too big: expected number to be <(-?[\d.e+-]+)$/, (m) => `must be less than ${m[1]}`],
  [/^Invalid input: expected number, received NaN$/, () => 'must be a number'],
  [/^Invalid input: expected int, received number$/, () => 'must be a whole number'],
  [/^Invalid input: expected \w+, received (undefined|null)$/, () => 'is missing'],
  [/^Invalid input: expected (\w+), received \w+$/, (m) => `must be ${m[1] === 'string' ? 'text' : `a ${m[1]}`}`],
  [/^Invalid input: expected (.+)$/, (m) => `must be ${m[1].replace(/"/g, '')}`],
  [/^Too small: expected string to have >=1 characters?$/, () => 'is required'],
  [/^Too small: expected string to have >=(\d+) characters?$/, (m) => `needs at least ${m[1]} characters`],
  [/^Too big: expected string to have <=(\d+) characters?$/, (m) => `has at most ${m[1]} characters`],
  [/^Too small: expected array to have >=(\d+) items?$/, (m) => `needs at least ${m[1]}`],
  [/^Too big: expected array to have <=(\d+) items?$/, (m) => `takes at most ${m[1]}`],
  [/^Invalid option: expected one of (.+)$/, (m) => `must be one of ${m[1].replace(/"/g, '').replace(/\|/g, ', ')}`],
  [/^Invalid (email address|e-mail)$/i, () => 'is not an e-mail address'],
  [/^Unrecognized key(s)?: (.+)$/, (m) => `has fields this form does not take (${m[2].replace(/"/g, '')})`]
];

/** A message as a sentence; a leading "path: " the schema already wrote is dropped (the label replaces it). */
export function sentence(message: string, path = ''): string {
  let text = message.trim();
  const head = /^([A-Za-z][\w.]*): (.+)$/.exec(text);
  if (head && (head[1] === path || path.endsWith(`.${head[1]}`) || head[1] === path.split('.')[0])) text = head[2];
  for (const [pattern, rewrite] of SENTENCES) {
    const m = pattern.exec(text);
    if (m) return rewrite(m);
  }
  return text;
}

/** "Optical fraction of phosphor 1: must be at least 0" — or the sentence alone for the whole form. */
export function readableIssue(issue: Pick<Issue, 'path' | 'message'>): string {
  const label = fieldLabel(issue.path);
  const text = sentence(issue.message, issue.path);
  // A sentence that already names its field ("IQE must be 0.01–1") stands alone.
  if (!label || text.toLowerCase().startsWith(label.toLowerCase())) return text.charAt(0).toUpperCase() + text.slice(1);
  return `${label}: ${text}`;
}

/** Every issue as a readable line, each once, joined for a one-line message. */
export function readableSummary(issues: readonly Pick<Issue, 'path' | 'message'>[]): string {
  return [...new Set(issues.map(readableIssue))].join('; ');
}
