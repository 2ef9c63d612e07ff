/**
 * The target colour point as printed on batch papers: CCT/Duv, CIE 1931 x,y and the ANSI
 * C78.377 bin it falls in (the core's resolveTarget and ansiBinOf), plus the colour tolerance.
 */
import { resolveTarget } from '../../aim/index';
import { ansiBinOf } from '../../spectral/index';
import type { RevisionContent } from '../../recipe';

export interface BatchTarget {
  description: string;
  x: number;
  y: number;
  ansiBin: number | null;
  tolerance: string;
}

function signed(v: number, places: number): string {
  return `${v >= 0 ? '+' : '−'}${Math.abs(v).toFixed(places)}`;
}

export function describeTarget(target: RevisionContent['target'], tolerance: RevisionContent['tolerance']): BatchTarget {
  const t = resolveTarget(target);
  const description =
    target.kind === 'ansiBin'
      ? `ANSI ${target.nominalCct} K bin centre (${Math.round(t.cct)} K, Duv ${signed(t.duv, 4)})`
      : `${Math.round(t.cct)} K, Duv ${signed(t.duv, 4)}`;
  const tol =
    tolerance.kind === 'sdcm'
      ? `${tolerance.steps}-step MacAdam ellipse (SDCM)`
      : tolerance.kind === 'deltaUvPrime'
        ? `Δu'v' ≤ ${tolerance.value}`
        : `Δuv ≤ ${tolerance.value}`;
  return { description, x: t.x, y: t.y, ansiBin: ansiBinOf(t.x, t.y), tolerance: tol };
}
