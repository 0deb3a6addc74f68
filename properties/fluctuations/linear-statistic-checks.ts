import { complex, scale, type Complex } from '../../harness/numeric/complex.js';
import { ensembleConstants, type EnsembleConstants, type EnsembleSpec } from '../../harness/numeric/ensemble.js';
import { chebyshevCoefficients } from '../../reference-values/chebyshev.js';
import { exactEvenMomentGOE, exactEvenMomentGUE, linearStatisticMeanCorrection, resolventMeanCorrection } from '../../reference-values/finite-n-corrections.js';
import { exactLinearStatisticVariance, linearStatisticCovariance } from '../../reference-values/linear-statistic-variance.js';
import { stieltjesSemicircle } from '../../reference-values/semicircle-law.js';
import { covarianceCheck, finiteSizeAllowance, type Allowance } from './covariance-check.js';
import { EXACT_POWER_SOURCE, LINEAR_SOURCE, MEAN_SOURCE, RESOLVENT_MEAN_SOURCE } from './covariance-sources.js';
import { LINEAR_COVARIANCE_CONSTANT, MEAN_CORRECTION_CONSTANT, QUADRATURE_ALLOWANCE } from './fluctuation-allowances.js';
import type { Estimand } from './estimand.js';
import type { FluctuationCheck } from './fluctuation-check.js';
import { Z_A } from './fluctuation-design.js';
import { meanFinding } from './fluctuation-evidence.js';
import type { StatisticBook } from './statistic-book.js';
import { TEST_FUNCTIONS, testFunction, type TestFunction } from './test-functions.js';

const QUADRATURE: Allowance = {
  factor: QUADRATURE_ALLOWANCE,
  reason: 'exact finite-N value: only the contour quadrature error (contour-quadrature.ts)',
};

/** The GOE/GUE name when the ensemble is one of them (exact finite-N values exist), else null. */
function gaussianName(ensemble: EnsembleSpec): 'goe' | 'gue' | null {
  return ensemble.kind === 'goe' || ensemble.kind === 'gue' ? ensemble.kind : null;
}

/** Item 3: Var Tr f(H) for every test function, and Cov(Tr cos 2H, Tr sin 2H) (e^{2iH} in parts). */
export function linearStatisticChecks(book: StatisticBook, ensemble: EnsembleSpec): FluctuationCheck[] {
  const size = book.size;
  const c = ensembleConstants(ensemble, size);
  const gaussian = gaussianName(ensemble);
  const checks = TEST_FUNCTIONS.map((f) => {
    const x = book.linear(f);
    const exact = gaussian !== null && f.power !== undefined;
    const expected = exact ? exactLinearStatisticVariance(gaussian, f.power!, size) : linearStatisticVariance(f, c);
    return covarianceCheck(
      `linear/var ${f.name}`,
      `Var Tr f(H), f = ${f.name}, against ${exact ? 'its exact finite-N value' : 'the Johansson–Bai–Yao limit'}`,
      x,
      x,
      complex(expected),
      exact ? EXACT_POWER_SOURCE : LINEAR_SOURCE,
      exact ? QUADRATURE : finiteSizeAllowance(LINEAR_COVARIANCE_CONSTANT, c, size),
    );
  });
  const cos = testFunction('cos(2x)');
  const sin = testFunction('sin(2x)');
  checks.push(
    covarianceCheck(
      'linear/cov cos(2x),sin(2x)',
      'Cov(Tr cos 2H, Tr sin 2H): the real and imaginary parts of Tr e^{2iH} against the polarised limit (0 by parity)',
      book.linear(cos),
      book.linear(sin),
      complex(polarisedCovariance(cos.real, sin.real, c)),
      LINEAR_SOURCE,
      finiteSizeAllowance(LINEAR_COVARIANCE_CONSTANT, c, size),
    ),
  );
  return checks;
}

function linearStatisticVariance(f: TestFunction, c: EnsembleConstants): number {
  return linearStatisticCovariance(f.real, f.real, c);
}

/**
 * Cov(Tr f, Tr g) = (Var Tr(f + g) − Var Tr(f − g))/4 (polarisation of the symmetric bilinear
 * form). Used instead of the direct covariance for f, g whose Chebyshev coefficients never overlap
 * (cos 2x even, sin 2x odd): there the direct series' convergence test sees only rounding.
 */
function polarisedCovariance(f: (x: number) => number, g: (x: number) => number, c: EnsembleConstants): number {
  return (linearStatisticCovariance((x) => f(x) + g(x), (x) => f(x) + g(x), c) - linearStatisticCovariance((x) => f(x) - g(x), (x) => f(x) - g(x), c)) / 4;
}

/** ∫ f ρ_sc = c_0 − c_2/2 (with x = 2cos θ, ρ dx = (2/π) sin²θ dθ = (1/π)(1 − cos 2θ) dθ; chebyshev.ts conventions). */
function semicircleIntegral(f: (x: number) => number): number {
  const c = chebyshevCoefficients(f, 2);
  return c[0] - c[2] / 2;
}

/** Item 3, means: E Tr f(H) − N∫fρ against its 1/N correction; and the resolvent form at Z_A. */
export function meanCorrectionChecks(book: StatisticBook, ensemble: EnsembleSpec): FluctuationCheck[] {
  const size = book.size;
  const c = ensembleConstants(ensemble, size);
  const gaussian = gaussianName(ensemble);
  const allowance = finiteSizeAllowance(MEAN_CORRECTION_CONSTANT, c, size);
  const checks: FluctuationCheck[] = ['x^4', 'exp(x)', 'exp(-x^2)'].map((name) => {
    const f = testFunction(name);
    const centring = size * semicircleIntegral(f.real);
    const exactMoment = f.power === 4 && gaussian !== null ? (gaussian === 'goe' ? exactEvenMomentGOE(size, 2)! : exactEvenMomentGUE(size, 2)) : null;
    const expected = exactMoment !== null ? size * exactMoment - centring : linearStatisticMeanCorrection(f.real, c);
    const x = book.linear(f);
    const reference = {
      expected: complex(expected),
      expectedSource: exactMoment !== null ? 'exact E Tr H⁴: GOE (2N³ + 5N² + 5N)/N², GUE (2N³ + N)/N² (THEORY.md; Harer and Zagier 1986, Invent. Math. 85)' : MEAN_SOURCE,
      allowanceFactor: exactMoment !== null ? QUADRATURE.factor : allowance.factor,
      allowanceReason: exactMoment !== null ? QUADRATURE.reason : `${allowance.reason}, relative to the standard deviation of Tr f(H)`,
    };
    const estimand: Estimand = { kind: 'mean', statistic: x, centring: complex(centring) };
    return {
      name: `mean/${name}`,
      title: `E Tr f(H) − N∫fρ_sc, f = ${name}, against ${exactMoment !== null ? 'its exact finite-N value' : 'the Bai–Yao correction'}`,
      statistical: true,
      estimands: [estimand],
      evaluate: (tally, power) => meanFinding(tally, estimand, reference, power),
    };
  });
  const g = book.resolvent(Z_A);
  const m: Complex = scale(stieltjesSemicircle(Z_A), size);
  const expected = resolventMeanCorrection(Z_A, c);
  const estimand: Estimand = { kind: 'mean', statistic: g, centring: m };
  checks.push({
    name: 'mean/resolvent',
    title: 'E Tr G(z) − N m(z) at z = Z_A against the resolvent form of the Bai–Yao correction',
    statistical: true,
    estimands: [estimand],
    evaluate: (tally, power) =>
      meanFinding(
        tally,
        estimand,
        { expected, expectedSource: RESOLVENT_MEAN_SOURCE, allowanceFactor: allowance.factor, allowanceReason: `${allowance.reason}, relative to the standard deviation of Tr G(z)` },
        power,
      ),
  });
  return checks;
}
