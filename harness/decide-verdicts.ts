import { holmAdjust } from './estimators/holm-adjust.js';
import type { CheckFinding, PlannedCheck } from './check-group.js';
import type { CheckVerdict } from './verdict.js';
import type { Exhibit } from './exhibit.js';

/** A finding before the run's family-wise control has been applied. */
export type RawOutcome = PlannedCheck & {
  readonly suite: string;
  readonly replay: string;
} & (
    | CheckFinding
    | { readonly state: 'fault'; readonly reason: string; readonly faultKind: string; readonly faultMethod: string }
  );

/**
 * Turns raw outcomes into verdicts. Statistical checks fail when their Holm-adjusted p-value is
 * ≤ alpha (family-wise control over every statistical check of the run); deterministic checks fail
 * when their ratio exceeds the threshold (or is NaN).
 */
export function decideVerdicts(outcomes: readonly RawOutcome[], alpha: number): CheckVerdict[] {
  const statistical: number[] = [];
  outcomes.forEach((o, i) => {
    if (o.state === 'measured' && o.evidence.kind === 'statistical') statistical.push(i);
  });
  const adjusted = holmAdjust(
    statistical.map((i) => {
      const o = outcomes[i];
      return o.state === 'measured' && o.evidence.kind === 'statistical' ? o.evidence.pValue : NaN;
    }),
  );
  const adjustedByIndex = new Map(statistical.map((i, k) => [i, adjusted[k]]));
  return outcomes.map((o, i): CheckVerdict => {
    const base = { id: o.id, suite: o.suite, title: o.title, parameters: o.parameters, replay: o.replay };
    switch (o.state) {
      case 'skipped':
        return { ...base, state: 'skipped', reason: o.reason };
      case 'fault':
        return { ...base, state: 'fault', reason: o.reason, faultKind: o.faultKind, faultMethod: o.faultMethod };
      case 'measured': {
        if (o.evidence.kind === 'statistical') {
          const p = adjustedByIndex.get(i) ?? NaN;
          return { ...base, state: p > alpha ? 'pass' : 'fail', evidence: o.evidence, adjustedPValue: p, path: o.path, ...exhibitOf(o) };
        }
        const ok = o.evidence.ratio <= o.evidence.threshold;
        return { ...base, state: ok ? 'pass' : 'fail', evidence: o.evidence, path: o.path, ...exhibitOf(o) };
      }
    }
  });
}

function exhibitOf(o: { readonly exhibit?: Exhibit }): { exhibit?: Exhibit } {
  return o.exhibit === undefined ? {} : { exhibit: o.exhibit };
}
