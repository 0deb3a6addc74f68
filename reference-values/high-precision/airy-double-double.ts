import { type DoubleDouble, dd } from './double-double.js';
import { doubleDoubleConstants } from './double-double-constants.js';
import { expDoubleDouble } from './exp-double-double.js';

/** Below this, the Maclaurin series; above, the asymptotic expansion (where their errors cross). */
const SWITCH = 9.125;

export interface AiryValues {
  readonly ai: DoubleDouble;
  readonly derivative: DoubleDouble;
}

/**
 * The Airy function Ai(x) and its derivative Ai′(x) in double-double, for real −16 ≤ x ≤ 600.
 *
 * Method (DLMF §9.4 and §9.7):
 * - x ≤ 9.125: the Maclaurin series Ai = Ai(0) f + Ai′(0) g, f = Σ_k a_k x^{3k}, a_k = a_{k−1}/((3k − 1)3k),
 *   g = Σ_k b_k x^{3k+1}, b_k = b_{k−1}/(3k(3k + 1)), a_0 = b_0 = 1, and their derivatives term by term,
 *   summed until the terms fall below 10⁻³⁶ of the largest. The absolute error is about 10⁻³² times
 *   the largest term, ≈ e^{ζ}·10⁻³² (ζ = (2/3)|x|^{3/2}): below 10⁻²⁴ for −10 ≤ x ≤ 9.125, about
 *   10⁻¹⁷ at x = −14 and 10⁻¹⁴ at x = −16 (only the far left tail of the determinants uses these).
 * - x > 9.125: Ai = e^{−ζ}/(2√π x^{1/4}) Σ_k (−1)^k u_k ζ^{−k}, Ai′ = −x^{1/4}e^{−ζ}/(2√π) Σ_k (−1)^k v_k ζ^{−k},
 *   u_0 = v_0 = 1, u_k = u_{k−1}(6k − 5)(6k − 3)(6k − 1)/((2k − 1)·216·k), v_k = −u_k(6k + 1)/(6k − 1),
 *   each summed to its smallest term; relative error about e^{−2ζ} (≈ 10⁻¹⁶ at the switch, falling
 *   fast beyond), absolute error below 10⁻²⁴.
 * The switch sits where the series' relative error e^{2ζ}·10⁻³² meets the expansion's e^{−2ζ}.
 */
export function airyDoubleDouble(x: DoubleDouble): AiryValues {
  if (!(x.hi >= -16 && x.hi <= 600)) throw new RangeError(`airyDoubleDouble: x must lie in [−16, 600], got ${x.hi}`);
  return x.hi <= SWITCH ? maclaurin(x) : asymptotic(x);
}

function maclaurin(x: DoubleDouble): AiryValues {
  const { airyAtZero, minusAiryDerivativeAtZero } = doubleDoubleConstants();
  const cube = dd.mul(dd.mul(x, x), x);
  let termF = dd.of(1); // a_k x^{3k}
  let termG = x; // b_k x^{3k+1}
  let termFPrime = dd.divNumber(dd.mul(x, x), 2); // 3k a_k x^{3k−1}, from k = 1
  let termGPrime = dd.of(1); // (3k + 1) b_k x^{3k}
  let f = termF;
  let g = termG;
  let fPrime = termFPrime;
  let gPrime = termGPrime;
  let largest = Math.max(1, Math.abs(x.hi), Math.abs(termFPrime.hi));
  for (let k = 1; ; k++) {
    termF = dd.divNumber(dd.mul(termF, cube), (3 * k - 1) * 3 * k);
    termG = dd.divNumber(dd.mul(termG, cube), 3 * k * (3 * k + 1));
    termGPrime = dd.divNumber(dd.mul(termGPrime, cube), (3 * k - 2) * 3 * k);
    f = dd.add(f, termF);
    g = dd.add(g, termG);
    gPrime = dd.add(gPrime, termGPrime);
    if (k >= 2) {
      termFPrime = dd.divNumber(dd.mul(termFPrime, cube), (3 * k - 3) * (3 * k - 1));
      fPrime = dd.add(fPrime, termFPrime);
    }
    const size = Math.max(Math.abs(termF.hi), Math.abs(termG.hi), Math.abs(termFPrime.hi), Math.abs(termGPrime.hi));
    largest = Math.max(largest, size);
    if (size < 1e-36 * largest && k > 2) break;
  }
  return {
    ai: dd.sub(dd.mul(airyAtZero, f), dd.mul(minusAiryDerivativeAtZero, g)),
    derivative: dd.sub(dd.mul(airyAtZero, fPrime), dd.mul(minusAiryDerivativeAtZero, gPrime)),
  };
}

/** Σ_k (−1)^k c_k ζ^{−k} to its smallest term, c_k = u_k (or v_k when `derivative`). */
function asymptoticSum(zeta: DoubleDouble, derivative: boolean): DoubleDouble {
  let u = dd.of(1); // (−1)^k u_k ζ^{−k}
  let sum = dd.of(1);
  let previous = Infinity;
  for (let k = 1; k < 200; k++) {
    u = dd.div(dd.divNumber(dd.mulNumber(u, -(6 * k - 5) * (6 * k - 3) * (6 * k - 1)), (2 * k - 1) * 216 * k), zeta);
    const term = derivative ? dd.divNumber(dd.mulNumber(u, -(6 * k + 1)), 6 * k - 1) : u;
    if (Math.abs(term.hi) >= previous) break; // past the smallest term: optimal truncation
    previous = Math.abs(term.hi);
    sum = dd.add(sum, term);
    if (previous < 1e-34 * Math.abs(sum.hi)) break;
  }
  return sum;
}

function asymptotic(x: DoubleDouble): AiryValues {
  const { sqrtPi } = doubleDoubleConstants();
  const root = dd.sqrt(x);
  const fourthRoot = dd.sqrt(root);
  const zeta = dd.divNumber(dd.mulNumber(dd.mul(x, root), 2), 3);
  const common = dd.div(expDoubleDouble(dd.neg(zeta)), dd.mulNumber(sqrtPi, 2));
  return {
    ai: dd.mul(dd.div(common, fourthRoot), asymptoticSum(zeta, false)),
    derivative: dd.neg(dd.mul(dd.mul(common, fourthRoot), asymptoticSum(zeta, true))),
  };
}
