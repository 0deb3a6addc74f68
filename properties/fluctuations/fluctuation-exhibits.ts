import type { CheckFinding } from '../../harness/check-group.js';
import type { Exhibit } from '../../harness/exhibit.js';
import type { Quantity } from '../../harness/evidence.js';
import type { FluctuationCheck } from './fluctuation-check.js';
import type { LeadingValues } from './fluctuation-tally.js';

const parts = (q: Quantity): [number, number] => (typeof q === 'number' ? [q, 0] : [q.re, q.im]);

/**
 * Every measured statistical check of a group, observed against predicted with its error bar (real
 * parts, and imaginary parts where either side has one), for the report's picture.
 */
export function observedAgainstPredicted(checks: readonly FluctuationCheck[], findings: readonly CheckFinding[], label: string): Exhibit {
  const points: Array<{ label: string; observed: number; standardError: number; predicted: number }> = [];
  findings.forEach((f, i) => {
    if (f.state !== 'measured' || f.evidence.kind !== 'statistical') return;
    const [or, oi] = parts(f.evidence.observed);
    const [er, ei] = parts(f.evidence.expected);
    const [sr, si] = parts(f.evidence.standardError);
    points.push({ label: `Re ${checks[i].name}`, observed: or, standardError: sr, predicted: er });
    if (ei !== 0 || Math.abs(oi) > 3 * si) points.push({ label: `Im ${checks[i].name}`, observed: oi, standardError: si, predicted: ei });
  });
  return { kind: 'observed-vs-predicted', points, label };
}

/** (x − x̄)/s of Re X over its leading samples, for a normal quantile plot of a statistic that should be Gaussian. */
export function standardisedFluctuations(leading: LeadingValues, label: string): Exhibit {
  const re = Array.from(leading.values.subarray(0, leading.count));
  const n = re.length;
  const mean = re.reduce((a, b) => a + b, 0) / n;
  const sd = Math.sqrt(re.reduce((a, b) => a + (b - mean) ** 2, 0) / (n - 1));
  return { kind: 'normal-quantiles', standardised: re.map((v) => (v - mean) / sd), label: `standardised Re ${label} (${n} samples)` };
}

/** The finding with an exhibit attached (a skipped finding is returned unchanged). */
export function withExhibit(finding: CheckFinding, exhibit: Exhibit): CheckFinding {
  return finding.state === 'measured' ? { ...finding, exhibit } : finding;
}
