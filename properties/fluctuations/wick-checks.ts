import { complex, conj } from '../../harness/numeric/complex.js';
import { WICK_SOURCE } from './covariance-sources.js';
import type { EnsembleConstants } from '../../harness/numeric/ensemble.js';
import { nonGaussianFactor, WICK_CONSTANT } from './fluctuation-allowances.js';
import type { Estimand } from './estimand.js';
import type { FluctuationCheck } from './fluctuation-check.js';
import { designWeights, MESOSCOPIC_ENERGIES, MESOSCOPIC_GAMMA, Z_A, Z_B } from './fluctuation-design.js';
import { cumulantFinding } from './fluctuation-evidence.js';
import type { Statistic, StatisticBook } from './statistic-book.js';
import { testFunction } from './test-functions.js';

function wickCheck(name: string, title: string, tuple: Statistic[], size: number, g: number): FluctuationCheck {
  const order = tuple.length;
  const estimand: Estimand = { kind: 'cumulant', tuple };
  return {
    name,
    title,
    statistical: true,
    estimands: [estimand],
    evaluate: (tally, power) =>
      cumulantFinding(
        tally,
        estimand,
        {
          expected: complex(0),
          expectedSource: WICK_SOURCE,
          allowanceFactor: (WICK_CONSTANT * g) / size,
          allowanceReason: `joint cumulants of order ${order} of the trace statistics are O(1/N) at finite N (THEORY.md: the fourth a few per cent of the pairing sum at N = 200–800), C·g/N with C = ${WICK_CONSTANT}, g = ${g}, calibrated by simulation`,
        },
        power,
      ),
  };
}

/**
 * Item 5: joint cumulants of orders 3 and 4 (6 from budget SIXTH_ORDER_BUDGET on) of tuples that mix
 * points, weights, chains, linear and mesoscopic statistics, against 0.
 */
export function wickChecks(book: StatisticBook, c: EnsembleConstants, sixthOrder: boolean): FluctuationCheck[] {
  const n = book.size;
  const g = nonGaussianFactor(c);
  const w = designWeights(n);
  const a = book.resolvent(Z_A);
  const aBar = book.resolvent(conj(Z_A));
  const b = book.resolvent(Z_B);
  const bBar = book.resolvent(conj(Z_B));
  const exp = book.linear(testFunction('exp(x)'));
  const quartic = book.linear(testFunction('x^4'));
  const cos = book.linear(testFunction('cos(2x)'));
  const chain = book.identityChain([Z_A, Z_B]);
  const meso = book.lorentzian(MESOSCOPIC_ENERGIES[0], n ** -MESOSCOPIC_GAMMA);
  const checks = [
    wickCheck('wick/3:resolvents,exp', 'κ3(Tr G(Z_A), Tr G(Z̄_B), Tr e^H) = 0: third moments of Gaussian statistics vanish', [a, bBar, exp], n, g),
    wickCheck('wick/4:resolvents', 'κ4(Tr G(Z_A), Tr G(Z̄_A), Tr G(Z_B), Tr G(Z̄_B)) = 0: E[X1X2X3X4] is the sum of the three pairings', [a, aBar, b, bBar], n, g),
    wickCheck(
      'wick/4:mixed',
      'κ4(Tr G(Z_A), Tr G(Z_A)G(Z_B), Tr H⁴, mesoscopic Lorentzian) = 0: points, a chain, a linear and a mesoscopic statistic together',
      [a, chain, quartic, meso],
      n,
      g,
    ),
    wickCheck(
      'wick/4:weighted',
      'κ4(Tr G(Z_A)D, Tr G(Z̄_A)D, Tr G(Z_B)S, Tr G(Z_B)) = 0: weighted statistics with a tracial one',
      [book.weighted(Z_A, 'D', w.D), book.weighted(conj(Z_A), 'D', w.D), book.weighted(Z_B, 'S', w.S), b],
      n,
      g,
    ),
  ];
  if (sixthOrder) {
    checks.push(
      wickCheck('wick/6:resolvents,cos', 'κ6(Tr G(Z_A), Tr G(Z̄_A), Tr G(Z_B), Tr G(Z̄_B), Tr cos 2H, Tr cos 2H) = 0', [a, aBar, b, bBar, cos, cos], n, g),
    );
  }
  return checks;
}
