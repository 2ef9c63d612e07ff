/** Text summaries of the designer's charts for screen readers and the captions (pure). */
import type { ResolvedTarget } from '../aim/index';
import type { SpectrumEvaluation } from '../spectral/types';
import type { TargetStanding } from './readout';

const signed = (v: number) => `${v >= 0 ? '+' : '−'}${Math.abs(v).toFixed(4)}`;

export function colourMapSummary(
  e: SpectrumEvaluation | null,
  target: ResolvedTarget | null,
  standing: TargetStanding | null,
  components: string[]
): string {
  if (!e) return 'No blend yet.';
  const parts = [
    `Blend at x ${e.x.toFixed(4)}, y ${e.y.toFixed(4)} (u′ ${e.uPrime.toFixed(4)}, ` +
      `v′ ${e.vPrime.toFixed(4)}), ${Math.round(e.cct)} K, Duv ${signed(e.duv)}.`
  ];
  if (target && standing) {
    parts.push(
      `Target ${target.label}: ${standing.steps.toFixed(1)} SDCM away, ${standing.withinTolerance ? 'within' : 'outside'} tolerance.`
    );
  }
  parts.push(standing?.ansiBin ? `Inside the ANSI ${standing.ansiBin} K bin.` : 'Outside the ANSI C78.377 bins.');
  if (components.length) parts.push(`Components: ${components.join(', ')}.`);
  return parts.join(' ');
}
