import erfc from '@stdlib/math-base-special-erfc';
import { describe, expect, it } from 'vitest';
import { kolmogorovTail } from '../../../harness/estimators/kolmogorov-tail.js';
import { chiVariate } from '../../../harness/numeric/chi-variate.js';
import { gammaVariate } from '../../../harness/numeric/gamma-variate.js';
import { randomStream } from '../../../harness/numeric/random-stream.js';
import { expectWithinStandardErrors, meanAndStandardError } from './hypothesis-checks.js';

/**
 * The gamma and chi samplers against their exact laws.
 *
 * Distribution: one-sample Kolmogorov–Smirnov against closed-form distribution functions (Gamma(1)
 * = exponential, 1 − e^{−x}; Gamma(3), 1 − e^{−x}(1 + x + x²/2) (Erlang); Gamma(1/2), the law of
 * z²/2, erf √x), with the asymptotic p-value of kolmogorov-tail.ts (n = 20 000 draws, far beyond
 * where the asymptotic law is accurate); each test at level 10⁻⁴, so the three together raise a false
 * alarm with probability below 3·10⁻⁴ (Bonferroni). The power check (Gamma(1.05) tested as Gamma(1))
 * shows the test can tell a 5 % error in the shape at this sample size.
 * Moments: E χ_ν² = ν and E χ_ν⁴ = ν(ν + 2) (Johnson, Kotz and Balakrishnan 1994, ch. 18), z-tested
 * with the sample's own standard error (hypothesis-checks.ts, |z| ≤ 4.5).
 */
const DRAWS = 20_000;
const LEVEL = 1e-4;

function kolmogorovPValue(sample: Float64Array, cdf: (x: number) => number): number {
  const sorted = Float64Array.from(sample).sort();
  const n = sorted.length;
  let distance = 0;
  for (let i = 0; i < n; i++) {
    const f = cdf(sorted[i]);
    distance = Math.max(distance, Math.abs(f - i / n), Math.abs((i + 1) / n - f));
  }
  const root = Math.sqrt(n);
  // Stephens' adjustment, as in two-sample-kolmogorov-smirnov.ts (Stephens 1970; Press et al. 2007, §14.3.3).
  return kolmogorovTail((root + 0.12 + 0.11 / root) * distance);
}

function gammaSample(shape: number, key: string): Float64Array {
  const stream = randomStream(20250601, key, 0);
  return Float64Array.from({ length: DRAWS }, () => gammaVariate(stream, shape));
}

describe('gammaVariate (Marsaglia and Tsang 2000)', () => {
  const laws: [number, (x: number) => number][] = [
    [1, (x) => 1 - Math.exp(-x)],
    [3, (x) => 1 - Math.exp(-x) * (1 + x + (x * x) / 2)],
    [0.5, (x) => 1 - erfc(Math.sqrt(x))],
  ];
  for (const [shape, cdf] of laws) {
    it(`shape ${shape}: Kolmogorov–Smirnov against the exact distribution function`, () => {
      const p = kolmogorovPValue(gammaSample(shape, `gamma-${shape}`), cdf);
      expect(p, `Gamma(${shape}): KS p-value ${p}, level ${LEVEL}`).toBeGreaterThan(LEVEL);
    });
  }

  it('a wrong shape is detected by the same test (power check)', () => {
    const p = kolmogorovPValue(gammaSample(1.05, 'gamma-wrong'), (x) => 1 - Math.exp(-x));
    expect(p, `Gamma(1.05) tested as Gamma(1): p-value ${p}`).toBeLessThan(LEVEL);
  });

  it('rejects shapes that are not finite and positive', () => {
    const stream = randomStream(1, 'gamma-bad', 0);
    for (const bad of [0, -1, Number.NaN, Number.POSITIVE_INFINITY]) expect(() => gammaVariate(stream, bad)).toThrow(RangeError);
  });
});

describe('chiVariate', () => {
  for (const nu of [0.3, 1, 2.5, 7, 999.5]) {
    it(`ν = ${nu}: E χ² = ν and E χ⁴ = ν(ν + 2)`, () => {
      const stream = randomStream(20250602, `chi-${nu}`, 0);
      const squares = Float64Array.from({ length: DRAWS }, () => chiVariate(stream, nu) ** 2);
      const fourth = squares.map((x) => x * x);
      for (const [label, values, expected] of [['E χ²', squares, nu], ['E χ⁴', fourth, nu * (nu + 2)]] as const) {
        const { mean, standardError } = meanAndStandardError(values);
        expectWithinStandardErrors(`ν = ${nu}: ${label}`, mean, expected, standardError);
      }
      expect(squares.every((x) => x > 0)).toBe(true);
    });
  }
});
