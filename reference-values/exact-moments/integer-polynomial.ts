/**
 * Polynomials in N with integer coefficients, as bigint arrays: index r holds the coefficient of
 * N^r. The exact finite-N moments are polynomials in N (they count Wick pairings by the number of
 * free indices), so they are computed in this form once and evaluated at any N without rounding.
 */
export type IntegerPolynomial = readonly bigint[];

/** p(N) exactly, by Horner's rule. */
export function evaluateIntegerPolynomial(p: IntegerPolynomial, N: number | bigint): bigint {
  const n = BigInt(N);
  let value = 0n;
  for (let r = p.length - 1; r >= 0; r--) value = value * n + p[r];
  return value;
}

/** p + c·N^shift·q, trailing zero coefficients removed. */
export function addScaledShifted(p: IntegerPolynomial, c: bigint, q: IntegerPolynomial, shift = 0): bigint[] {
  const out = p.slice();
  for (let r = 0; r < q.length; r++) {
    while (out.length <= r + shift) out.push(0n);
    out[r + shift] += c * q[r];
  }
  while (out.length > 0 && out[out.length - 1] === 0n) out.pop();
  return out;
}
