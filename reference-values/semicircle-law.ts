import { type Complex, add, complex, div, mul, sqrt, sub } from '../harness/numeric/complex.js';

/**
 * Wigner's semicircle law on [−2, 2]: the limiting spectral distribution of a Wigner matrix whose
 * off-diagonal entries have variance 1/N (THEORY.md, "Conventions"). Density, distribution
 * function, Stieltjes transform and its derivative, and the moments (Catalan numbers).
 *
 * References:
 * - E. P. Wigner, 1955, Ann. of Math. 62, 548–564; 1958, Ann. of Math. 67, 325–327 (sources.ts).
 * - G. W. Anderson, A. Guionnet and O. Zeitouni, 2010, An Introduction to Random Matrices,
 *   Cambridge University Press, Theorem 2.1.1 and Section 2.4 (numbers from memory).
 * - OEIS A000108 (Catalan numbers).
 * - W. Kahan, 1987, "Branch cuts for complex elementary functions" (signed zeros on the cut).
 */

/** ρ(x) = √(4 − x²)/(2π) on [−2, 2], 0 outside. √((2 − x)(2 + x)) avoids cancellation in 4 − x² near ±2. */
export function semicircleDensity(x: number): number {
  if (!(x > -2 && x < 2)) return Number.isNaN(x) ? NaN : 0;
  return Math.sqrt((2 - x) * (2 + x)) / (2 * Math.PI);
}

/**
 * For 0 ≤ t ≤ 2, the semicircle mass of [2 − t, 2], which by symmetry equals that of [−2, −2 + t].
 *
 * Method: with y = 2 cos θ, ∫_{2−t}^{2} ρ = (ψ − sin ψ cos ψ)/π, ψ = 2 asin(√(t/4)) (so that
 * 2 cos ψ = 2 − t without evaluating acos near 1). For ψ < 0.25 the difference
 * ψ − sin(2ψ)/2 = Σ_{k≥1} (−1)^{k+1} (2ψ)^{2k+1}/(2 (2k+1)!) is summed as a series, which keeps
 * full relative accuracy in the tail where the closed form cancels.
 */
function edgeMass(t: number): number {
  const psi = 2 * Math.asin(Math.sqrt(t / 4));
  if (psi >= 0.25) return (psi - Math.sin(psi) * Math.cos(psi)) / Math.PI;
  const u = 2 * psi;
  const u2 = u * u;
  let term = (u * u2) / 6; // u³/3!
  let sum = 0;
  for (let k = 1; k <= 12; k++) {
    sum += term;
    term *= -u2 / ((2 * k + 2) * (2 * k + 3));
  }
  return sum / (2 * Math.PI);
}

/**
 * F(x) = ∫_{−2}^{x} ρ = 1/2 + x√(4 − x²)/(4π) + asin(x/2)/π on [−2, 2]; 0 below, 1 above.
 *
 * Method: the closed form for |x| ≤ 1; for |x| > 1 the mass between x and the nearer edge
 * (edgeMass), so that F is accurate to a few ulps relative in the lower tail and 1 − F in the
 * upper tail is accurate to a few ulps absolute. Error: ≤ ~4ε absolute everywhere (tested).
 */
export function semicircleCdf(x: number): number {
  if (Number.isNaN(x)) return NaN;
  if (x <= -2) return 0;
  if (x >= 2) return 1;
  if (x < -1) return edgeMass(2 + x);
  if (x > 1) return 1 - edgeMass(2 - x);
  return 0.5 + (x * Math.sqrt((2 - x) * (2 + x))) / (4 * Math.PI) + Math.asin(x / 2) / Math.PI;
}

/**
 * Stieltjes transform m(z) = ∫ ρ(x)/(x − z) dx = (−z + √(z² − 4))/2, on the branch with
 * Im m > 0 for Im z > 0, m(z̄) = conj m(z), |m| < 1 off [−2, 2], m(z) ~ −1/z at infinity.
 *
 * Method: s = √(z − 2)·√(z + 2) with principal roots is analytic off [−2, 2] (the two cuts on
 * (−∞, −2) cancel) and s ~ z at infinity, so it is the right branch of √(z² − 4) everywhere; the
 * naive principal √(z² − 4) has its cut on the imaginary axis too and gives Im m < 0 in the left
 * half-plane. Since (−z + s)(−z − s) = 4, m = (−z + s)/2 = −2/(z + s): the second form has no
 * cancellation for large |z|, and |z + s| ≥ 2 holds on this branch (|m| ≤ 1), so the division is
 * well conditioned. Residual |m² + zm + 1| is a few ε relative (tested).
 *
 * On the real axis (Im z = ±0): outside [−2, 2] the real limit, −2/(x + sign(x)√(x² − 4)); inside,
 * the sign of zero picks the side (Kahan 1987): Im z = +0 (as `complex(x)` produces) gives the limit
 * from above, (−x + i√(4 − x²))/2 with Im m = πρ(x) > 0; Im z = −0 gives its conjugate, the limit
 * from below. Off the cut Im m carries the sign of Im z, zeros included. m(±2) = ∓1. Valid for |z| below about 1e307 (z + s overflows beyond).
 */
export function stieltjesSemicircle(z: Complex): Complex {
  const s = mul(sqrt(complex(z.re - 2, z.im)), sqrt(complex(z.re + 2, z.im)));
  const m = div(complex(-2, 0), add(z, s));
  // Im m = Im z·∫ρ(x)/|x − z|² dx has the sign of Im z; keep that for a signed zero too.
  return m.im === 0 ? complex(m.re, z.im === 0 ? z.im : m.im) : m;
}

/**
 * m′(z) = m²/(1 − m²), from differentiating m² + zm + 1 = 0 (m′(2m + z) = −m, and
 * 2m + z = m − 1/m). Infinite at z = ±2, where m² = 1.
 */
export function stieltjesSemicircleDerivative(z: Complex): Complex {
  const m = stieltjesSemicircle(z);
  const m2 = mul(m, m);
  return div(m2, sub(complex(1, 0), m2));
}

/**
 * Catalan number C_k = (2k)!/(k!(k+1)!), exact (OEIS A000108), by C_{k+1} = C_k·2(2k+1)/(k+2),
 * whose division is exact in integers.
 */
export function catalanNumber(k: number): bigint {
  if (!Number.isInteger(k) || k < 0) throw new RangeError(`catalanNumber: k must be an integer ≥ 0, got ${k}`);
  let c = 1n;
  for (let j = 0n; j < BigInt(k); j++) c = (c * 2n * (2n * j + 1n)) / (j + 2n);
  return c;
}

/** ∫ x^{2k} ρ(x) dx = C_k (Catalan), as a double (correctly rounded from the exact integer). */
export function semicircleEvenMoment(k: number): number {
  return Number(catalanNumber(k));
}

/** ∫ xⁿ ρ(x) dx: C_{n/2} for even n, 0 for odd n (ρ is even). */
export function semicircleMoment(n: number): number {
  if (!Number.isInteger(n) || n < 0) throw new RangeError(`semicircleMoment: n must be an integer ≥ 0, got ${n}`);
  return n % 2 === 1 ? 0 : semicircleEvenMoment(n / 2);
}
