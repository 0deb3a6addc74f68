import { type IntegerPolynomial, addScaledShifted } from './integer-polynomial.js';

/**
 * a_k(N) = E Tr X^{2k} for an N×N GUE matrix with E|x_ij|² = 1, as a polynomial in N with integer
 * coefficients, by the Harer–Zagier recursion applied coefficient by coefficient:
 *   a_0 = N, a_1 = N², (k + 2) a_{k+1} = (4k + 2) N a_k + k(4k² − 1) a_{k−1}.
 * The coefficient of N^{k+1−2g} counts the gluings of a 2k-gon into a surface of genus g, so every
 * coefficient of the right-hand side is divisible by k + 2 (the division is checked, not assumed).
 *
 * References: J. Harer and D. Zagier, 1986, Invent. Math. 85, 457–485 (`HARER_ZAGIER_1986` in sources.ts).
 */
export function harerZagierPolynomial(k: number): IntegerPolynomial {
  if (!Number.isInteger(k) || k < 0) throw new RangeError(`harerZagierPolynomial: k must be an integer ≥ 0, got ${k}`);
  let previous: IntegerPolynomial = [0n, 1n];
  let current: IntegerPolynomial = [0n, 0n, 1n];
  if (k === 0) return previous;
  for (let j = 1; j < k; j++) {
    const J = BigInt(j);
    const numerator = addScaledShifted(addScaledShifted([], 4n * J + 2n, current, 1), J * (4n * J * J - 1n), previous);
    const next = numerator.map((c) => {
      if (c % (J + 2n) !== 0n) throw new Error(`harerZagierPolynomial: ${c} is not divisible by ${J + 2n}`);
      return c / (J + 2n);
    });
    previous = current;
    current = next;
  }
  return current;
}
