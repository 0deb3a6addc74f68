import { bilinearCovariance } from '../estimators/bilinear-covariance.js';
import { summariseSample } from '../estimators/sample-summary.js';
import type { CheckContext, CheckFinding, CheckGroup, PlannedCheck } from '../check-group.js';
import type { StatisticalEvidence } from '../evidence.js';
import { formatComplex } from '../numeric/complex.js';
import { ensembleLabel, type EnsembleSpec } from '../numeric/ensemble.js';
import type { RunSettings } from '../run-settings.js';
import { onSide, type ComparedImplementation } from './compared-implementation.js';
import type { ProbeInputs } from './probe-inputs.js';
import { sampleTraceStatistics, type TraceSample } from './sampled-trace-statistics.js';
import { differenceEvidence, distributionEvidence, type SideEstimate } from './two-sample-evidence.js';

/** The complex mean of interleaved samples with the standard error of each part (s/√K). */
function meanEstimate(values: Float64Array): SideEstimate {
  const count = values.length / 2;
  const re = summariseSample(values.filter((_, i) => i % 2 === 0));
  const im = summariseSample(values.filter((_, i) => i % 2 === 1));
  return { estimate: { re: re.mean, im: im.mean }, standardError: { re: re.standardError, im: im.standardError }, count };
}

function conjugated(values: Float64Array): Float64Array {
  return values.map((v, i) => (i % 2 === 1 ? -v : v));
}

function realParts(values: Float64Array): Float64Array {
  return values.filter((_, i) => i % 2 === 0);
}

/** The covariances compared, as pairs of statistic indices; `conjugate` takes the second as Tr G(z̄). */
const COVARIANCE_PAIRS = [
  { a: 0, b: 0, conjugate: true },
  { a: 1, b: 1, conjugate: true },
  { a: 0, b: 1, conjugate: false },
] as const;

/**
 * Two-sample tests on the fluctuations of Tr G(z), where both sides draw their own matrices (or
 * compute whole statistics): K samples per side from independent streams, then for each point
 * the mean (Welch), the covariances Cov(Tr G(z), Tr G(z̄)) = E|X − EX|² at each point and the
 * bilinear Cov(Tr G(z_a), Tr G(z_b)) (delta-method standard errors, bilinear-covariance.ts), and
 * the distribution of Re Tr G(z) (two-sample Kolmogorov–Smirnov). Every p-value enters the run's
 * Holm control; a failure says the two sample different laws.
 */
export function fluctuationComparisonGroup(
  ensemble: EnsembleSpec,
  size: number,
  sides: readonly [ComparedImplementation, ComparedImplementation],
  settings: RunSettings,
  inputs: ProbeInputs,
): CheckGroup {
  const label = ensembleLabel(ensemble);
  const id = `compare/fluctuations/${label}/N=${size}`;
  const points = inputs.statisticPoints;
  const at = (j: number, conjugate = false) => formatComplex(conjugate ? { re: points[j].re, im: -points[j].im } : points[j]);
  const name = (j: number, conjugate = false) => `Tr G(${at(j, conjugate)})`;
  const parameters = { ensemble: label, N: size, samples: settings.samples };
  const checks: PlannedCheck[] = [
    ...points.map((z, j) => ({
      id: `compare/mean/${label}/N=${size}/z=${formatComplex(z)}`,
      title: `E ${name(j)} is the same on both sides`,
      parameters: { ...parameters, z: formatComplex(z) },
    })),
    ...COVARIANCE_PAIRS.map(({ a, b, conjugate }) => ({
      id: `compare/covariance/${label}/N=${size}/z=${at(a)},${at(b, conjugate)}`,
      title: `Cov(${name(a)}, ${name(b, conjugate)}) is the same on both sides`,
      parameters: { ...parameters, statistics: `${name(a)}, ${name(b, conjugate)}` },
    })),
    ...points.map((z, j) => ({
      id: `compare/distribution/${label}/N=${size}/z=${formatComplex(z)}`,
      title: `Re ${name(j)} has the same distribution on both sides (two-sample Kolmogorov–Smirnov)`,
      parameters: { ...parameters, z: formatComplex(z) },
    })),
  ];
  const [left, right] = sides;
  const draw = (context: CheckContext, side: ComparedImplementation): Promise<TraceSample> =>
    onSide(side, () =>
      sampleTraceStatistics(
        { ...context, adapter: side.adapter, capabilities: new Set(side.description.capabilities) },
        `compare/${side.role}/${label}/N=${size}`,
        ensemble,
        size,
        settings.samples,
        points,
      ),
    );
  return {
    id,
    suite: 'compare',
    checks,
    skipReason() {
      const sampling = sides.filter((s) => s.description.capabilities.some((c) => c === 'sample' || c === 'sample_statistics'));
      if (sampling.length === 2) return null;
      const missing = sides.filter((s) => !sampling.includes(s)).map((s) => `${s.role} (${s.description.name})`);
      return `two-sample tests need both sides to draw their own matrices: ${missing.join(' and ')} offers neither sample nor sample_statistics`;
    },
    async run(context): Promise<CheckFinding[]> {
      const l = await draw(context, left);
      const r = await draw(context, right);
      const rightName = `${right.description.name} ${right.description.version}`;
      const path = `left: ${l.path}; right: ${r.path}; independent streams per side`;
      const found = (evidence: StatisticalEvidence): CheckFinding => ({ state: 'measured', path, evidence });
      return [
        ...points.map((_, j) =>
          found(differenceEvidence(meanEstimate(l.values[j]), meanEstimate(r.values[j]), `the right side's mean of ${name(j)} (${rightName})`, 's/√K per part')),
        ),
        ...COVARIANCE_PAIRS.map(({ a, b, conjugate }) => {
          const pick = (s: TraceSample) => bilinearCovariance(s.values[a], conjugate ? conjugated(s.values[b]) : s.values[b]);
          return found(
            differenceEvidence(
              pick(l),
              pick(r),
              `the right side's Cov(${name(a)}, ${name(b, conjugate)}) (${rightName})`,
              'sd of the centred products over √K, the delta method (bilinear-covariance.ts)',
            ),
          );
        }),
        ...points.map((_, j) => found(distributionEvidence(realParts(l.values[j]), realParts(r.values[j]), `right side: ${rightName}`))),
      ];
    },
  };
}
