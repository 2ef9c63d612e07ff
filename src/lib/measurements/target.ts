/**
 * The colour target of a revision as quality judges it: the blend solver's resolved target
 * (CCT/Duv and x,y via the Ohno 2014 inverse; ANSI bins via ANSI C78.377-2017 Table 1 or the
 * flexible-CCT rule), plus the ANSI quadrangle it belongs to. A CCT/Duv or x,y target that lies
 * inside a Table 1 quadrangle takes that quadrangle as its bin; otherwise it has none.
 */
import { resolveTarget, type ResolvedTarget, type Target } from '../aim/index';
import { ansiNominalQuadrangles, isInQuadrangle } from '../spectral/ansi/c78377';

export function qualityTarget(target: Target): ResolvedTarget {
  const t = resolveTarget(target);
  if (t.ansiBin) return t;
  const q = ansiNominalQuadrangles().find((quad) => isInQuadrangle(t.x, t.y, quad)) ?? null;
  return { ...t, ansiBin: q };
}
