import { complex, conj, scale } from '../../harness/numeric/complex.js';
import { ensembleConstants, type EnsembleConstants, type EnsembleSpec } from '../../harness/numeric/ensemble.js';
import { mesoscopicCrossCovariance, mesoscopicVariance, mesoscopicVarianceCorrection } from '../../reference-values/mesoscopic-variance.js';
import { tracialResolventCovariance } from '../../reference-values/resolvent-covariance.js';
import { covarianceCheck, type Allowance } from './covariance-check.js';
import { TRACIAL_SOURCE } from './covariance-sources.js';
import { MESOSCOPIC_CONSTANT, nonGaussianFactor } from './fluctuation-allowances.js';
import type { FluctuationCheck } from './fluctuation-check.js';
import { MESOSCOPIC_ENERGIES, MESOSCOPIC_GAMMA } from './fluctuation-design.js';
import { conjugated, type Statistic, type StatisticBook } from './statistic-book.js';

/** The mesoscopic test function: the Lorentzian, so that Tr f(N^γ(H − E)) = η Im Tr G(E + iη). */
const lorentzian = (x: number) => 1 / (1 + x * x);

export const MESOSCOPIC_SOURCE =
  'Var Tr f(N^γ(H − E)) → (1/(2βπ²))∫∫((f(x) − f(y))/(x − y))² dx dy = 1/(4β) for f = 1/(1 + x²) (He and Knowles 2017, Ann. Appl. Probab. 27; Boutet de Monvel and Khorunzhy 1999), plus for GOE and GUE the finite-N terms −(2/(βπ²))(∫f)²/((4 − E²)²N^{2γ}) and (GOE) −∫f′²/(2π²ρ(E)N^{1−γ}) (THEORY.md), reference-values/mesoscopic-variance.ts';

export const DECORRELATION_SOURCE =
  'Cov(Tr f(N^γ(H − E1)), Tr f(N^γ(H − E2))) ≈ −(1/(βπ²))(∫f)²K(E1, E2)/((E1 − E2)²N^{2γ}), K(x, y) = (4 − xy)/√((4 − x²)(4 − y²)): statistics at different bulk energies decorrelate like N^{−2γ} (THEORY.md; the macroscopic kernel of Bai and Yao 2005), reference-values/mesoscopic-variance.ts';

/** GOE and GUE have the finite-N corrections of mesoscopic-variance.ts; other ensembles the limit alone. */
function gaussianBeta(ensemble: EnsembleSpec): 1 | 2 | null {
  return ensemble.kind === 'goe' ? 1 : ensemble.kind === 'gue' ? 2 : null;
}

/** O(1/(Nη)) corrections at the mesoscopic scale (THEORY.md: the GOE loop term, −3.6 % at N = 200, γ = 1/2). */
function mesoscopicAllowance(size: number, eta: number, c: EnsembleConstants): Allowance {
  const g = nonGaussianFactor(c);
  return {
    factor: (MESOSCOPIC_CONSTANT * g) / (size * eta),
    reason: `O(1/(Nη)) corrections at the mesoscopic scale (the GOE 1/N loop term), C·g/(Nη) with C = ${MESOSCOPIC_CONSTANT}, g = ${g}, calibrated by simulation`,
  };
}

/**
 * Item 4 at the book's size: the variance of the Lorentzian statistic at E1, the resolvent form
 * η²Cov(Tr G(z), Tr G(z̄)), and the covariance of the statistics at E1 ≠ E2 (decorrelation).
 * `crossOnly` gives the last alone (the smaller size of the decay comparison).
 */
export function mesoscopicChecks(book: StatisticBook, ensemble: EnsembleSpec, crossOnly = false): FluctuationCheck[] {
  const size = book.size;
  const c = ensembleConstants(ensemble, size);
  const gaussian = gaussianBeta(ensemble);
  const eta = size ** -MESOSCOPIC_GAMMA;
  const [e1, e2] = MESOSCOPIC_ENERGIES;
  const l1 = book.lorentzian(e1, eta);
  const l2 = book.lorentzian(e2, eta);
  const allowance = mesoscopicAllowance(size, eta, c);
  const cross = covarianceCheck(
    `mesoscopic/cov E=${e1},${e2}`,
    `Cov of Tr f(N^γ(H − E)) at E = ${e1} and ${e2} (γ = ${MESOSCOPIC_GAMMA}, f = 1/(1 + x²)): near 0, shrinking like N^{−2γ}`,
    l1,
    l2,
    complex(mesoscopicCrossCovariance(lorentzian, c.beta, e1, e2, size, MESOSCOPIC_GAMMA)),
    DECORRELATION_SOURCE,
    allowance,
  );
  if (crossOnly) return [cross];
  const variance = mesoscopicVariance(lorentzian, c.beta) + (gaussian === null ? 0 : mesoscopicVarianceCorrection(lorentzian, gaussian, e1, size, MESOSCOPIC_GAMMA));
  const z = complex(e1, eta);
  const scaled = (statistic: Statistic): Statistic => ({
    ...statistic,
    label: `η ${statistic.label}`,
    terms: statistic.terms.map((t) => ({ ...t, coefficient: scale(t.coefficient, eta) })),
  });
  return [
    covarianceCheck(
      `mesoscopic/var E=${e1}`,
      `Var Tr f(N^γ(H − E)) at E = ${e1}, γ = ${MESOSCOPIC_GAMMA}, f = 1/(1 + x²), against the He–Knowles limit 1/(4β)${gaussian === null ? '' : ' with its finite-N terms'}`,
      l1,
      l1,
      complex(variance),
      MESOSCOPIC_SOURCE,
      allowance,
    ),
    covarianceCheck(
      `mesoscopic/resolvent E=${e1}`,
      `η² E|Tr G(z) − E|² at z = ${e1} + iN^{−γ}: the formula of item 1 at (z, z̄), at the mesoscopic scale`,
      scaled(book.resolvent(z)),
      scaled(conjugated(book.resolvent(z))),
      scale(tracialResolventCovariance(z, conj(z), c), eta * eta),
      TRACIAL_SOURCE,
      allowance,
    ),
    cross,
  ];
}
