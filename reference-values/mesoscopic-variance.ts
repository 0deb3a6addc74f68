import { semicircleDensity } from './semicircle-law.js';
import { periodicFourierCoefficients, periodicSynthesis } from './periodic-fourier.js';

/**
 * Mesoscopic linear statistics L_f(E) = Tr f(N^γ(H − E)), E in the bulk (|E| < 2), 0 < γ < 1, for
 * GOE (β = 1) and GUE (β = 2) (THEORY.md, "Fluctuations: linear statistics" and "Mesoscopic scales
 * and chains"):
 *
 *   lim Var L_f = (1/(2βπ²)) ∫∫ ((f(x) − f(y))/(x − y))² dx dy = (1/(2βπ²)) ∫ |k| |f̂(k)|² dk,
 *
 * f̂(k) = ∫ f e^{−ikx} dx (He and Knowles 2017; Boutet de Monvel and Khorunzhy 1999). Closed forms:
 * e^{−x²/2} → 1/(βπ), 1/(1 + x²) → 1/(4β).
 *
 * Finite-N corrections and the cross-covariance at two energies. The macroscopic covariance
 * (linear-statistic-variance.ts; for GOE and GUE σ_d² = 2/β and κ4 = 0) has the kernel form
 * (1/(2βπ²)) ∫∫ (f(x) − f(y))(g(x) − g(y))/(x − y)² K(x, y) dx dy on [−2, 2]², with
 * K(x, y) = (4 − xy)/√((4 − x²)(4 − y²)) (it gives σ_d² = 2/β for f = g = x and 4/β for x²; the
 * test checks it against the Chebyshev form). Since (4 − xy)² − (4 − x²)(4 − y²) = 4(x − y)²,
 * K = √(1 + 4(x − y)²/((4 − x²)(4 − y²))) = 1 + 2(x − y)²/(4 − E²)² + … near (E, E); for
 * f_N = f(N^γ(· − E)) the 1 gives the limit and the next term, which multiplies −2 f_N(x) f_N(y),
 * gives
 *   ΔVar_macro = −(2/(βπ²)) (∫f)² / ((4 − E²)² N^{2γ})    (+ O(N^{−4γ})).
 * For f_N at E1 and g_N at E2 ≠ E1 only the cross terms −f_N(x)g_N(y) − f_N(y)g_N(x) survive, so
 *   Cov(L_f(E1), L_f(E2)) ≈ −(1/(βπ²)) (∫f)² K(E1, E2) / ((E1 − E2)² N^{2γ}).
 * GOE has in addition a finite-N term beyond the macroscopic limit, found by simulation and a
 * loop-equation argument in THEORY.md (no published source is claimed here):
 *   ΔVar_GOE = −∫ f′² dx / (2π² ρ(E) N^{1−γ}),
 * which dominates the first for γ > 1/3. These are THEORY.md's forms; the macroscopic ones are
 * checked against the Chebyshev formula and all are checked by simulation in the test.
 *
 * Method (quadrature). The Douglas integral D(f) = ∫∫ ((f(x) − f(y))/(x − y))² dx dy is invariant
 * under Möbius maps of the line (|T(u) − T(v)|² = |T′(u)||T′(v)||u − v|² and dx = |T′(u)||du|), so
 * with the Cayley map x = c + s·tan(φ/2) it equals the same integral on the unit circle,
 * ∫∫ (F(φ) − F(ψ))² / (4 sin²((φ − ψ)/2)) dφ dψ with F(φ) = f(c + s tan(φ/2)), and for
 * F = Σ a_n e^{inφ} that is 4π² Σ_n |n| |a_n|² (the Fejér integral ∫ sin²(nt/2)/sin²(t/2) dt = 2π|n|).
 * The a_n come from the trapezoid rule on M equispaced, half-offset nodes (an FFT, periodic-fourier.ts),
 * which is spectrally accurate for F smooth on the circle (f smooth and decaying at ±∞ with smooth
 * behaviour in 1/x, e.g. Gaussian, rational; Trefethen and Weideman 2014, SIAM Rev. 56). In the same
 * variables ∫ f dx = ∫ F(φ) (s/2) sec²(φ/2) dφ and ∫ f′² dx = ∫ F′(φ)² (2/s) cos²(φ/2) dφ, F′ by
 * spectral differentiation. M doubles from 256 until D and the two integrals change by less than
 * 1e-13 relative (at most M = 2^17; otherwise a RangeError). Choose c and s near the centre and
 * width of f (defaults 0 and 1).
 *
 * References: Y. He and A. Knowles, 2017, "Mesoscopic eigenvalue statistics of Wigner matrices",
 * Ann. Appl. Probab. 27(3), 1510–1550; A. Boutet de Monvel and A. Khorunzhy, 1999, "Asymptotic
 * distribution of smoothed eigenvalue density. I. Gaussian random matrices", Random Oper. Stochastic
 * Equations 7(1), 1–22 (both from memory; sources.ts).
 */

export interface MesoscopicQuadratureOptions {
  /** Centre c of the Cayley map x = c + s·tan(φ/2) (default 0). */
  readonly center?: number;
  /** Scale s > 0 of the map (default 1). */
  readonly scale?: number;
}

/** D(f) = ∫∫ ((f(x) − f(y))/(x − y))² dx dy, ∫ f, ∫ f′², by the Cayley-map quadrature. */
export interface DouglasIntegrals {
  readonly douglas: number;
  readonly integral: number;
  readonly derivativeSquared: number;
  /** Nodes of the last estimate. */
  readonly nodes: number;
}

const FIRST_NODES = 256;
const MAX_NODES = 1 << 17;
const RELATIVE_TOLERANCE = 1e-13;

function estimate(f: (x: number) => number, M: number, c: number, s: number): DouglasIntegrals {
  const h = (2 * Math.PI) / M;
  const values = new Float64Array(M);
  const angles = new Float64Array(M);
  for (let j = 0; j < M; j++) {
    angles[j] = -Math.PI + (j + 0.5) * h;
    values[j] = f(c + s * Math.tan(angles[j] / 2));
  }
  if (!values.every(Number.isFinite)) throw new RangeError('mesoscopic quadrature: f is not finite at a node');
  const a = periodicFourierCoefficients(values);
  let douglas = 0;
  const dre = new Float64Array(M);
  const dim = new Float64Array(M);
  for (let n = 1; n < M / 2; n++) {
    douglas += n * (a.re[n] ** 2 + a.im[n] ** 2 + a.re[M - n] ** 2 + a.im[M - n] ** 2);
    // F′ has coefficients i n a_n; the Nyquist term is left out.
    dre[n] = -n * a.im[n];
    dim[n] = n * a.re[n];
    dre[M - n] = n * a.im[M - n];
    dim[M - n] = -n * a.re[M - n];
  }
  const derivative = periodicSynthesis({ re: dre, im: dim }).re;
  let integral = 0;
  let derivativeSquared = 0;
  for (let j = 0; j < M; j++) {
    const cosHalf = Math.cos(angles[j] / 2);
    integral += (values[j] * s * h) / (2 * cosHalf * cosHalf);
    derivativeSquared += (derivative[j] ** 2 * 2 * cosHalf * cosHalf * h) / s;
  }
  return { douglas: 4 * Math.PI ** 2 * douglas, integral, derivativeSquared, nodes: M };
}

/** The Douglas integral, ∫ f and ∫ f′² to about 1e-13 relative (module note, "Method"). */
export function douglasIntegrals(f: (x: number) => number, options: MesoscopicQuadratureOptions = {}): DouglasIntegrals {
  const c = options.center ?? 0;
  const s = options.scale ?? 1;
  if (!(s > 0) || !Number.isFinite(s) || !Number.isFinite(c)) throw new RangeError('mesoscopic quadrature: scale must be > 0 and finite, centre finite');
  let previous = estimate(f, FIRST_NODES, c, s);
  for (let M = 2 * FIRST_NODES; M <= MAX_NODES; M *= 2) {
    const next = estimate(f, M, c, s);
    const close = (x: number, y: number, size: number): boolean => Math.abs(x - y) <= RELATIVE_TOLERANCE * size;
    const size = Math.abs(next.douglas) + Math.abs(next.integral) + Math.abs(next.derivativeSquared);
    if (close(next.douglas, previous.douglas, size) && close(next.integral, previous.integral, size) && close(next.derivativeSquared, previous.derivativeSquared, size)) {
      return next;
    }
    previous = next;
  }
  throw new RangeError(`mesoscopic quadrature: no convergence with ${MAX_NODES} nodes; f must be smooth and decay at ±∞`);
}

function checkBulk(E: number, N: number, gamma: number): void {
  if (!(Math.abs(E) < 2)) throw new RangeError(`mesoscopic: E must be in the bulk (|E| < 2), got ${E}`);
  if (!(N >= 1) || !(gamma > 0 && gamma < 1)) throw new RangeError(`mesoscopic: need N ≥ 1 and 0 < γ < 1, got N = ${N}, γ = ${gamma}`);
}

/** lim Var Tr f(N^γ(H − E)) = D(f)/(2βπ²) for GOE (β = 1) or GUE (β = 2). */
export function mesoscopicVariance(f: (x: number) => number, beta: 1 | 2, options: MesoscopicQuadratureOptions = {}): number {
  return douglasIntegrals(f, options).douglas / (2 * beta * Math.PI ** 2);
}

/**
 * Var Tr f(N^γ(H − E)) − lim ≈ −(2/(βπ²))(∫f)²/((4 − E²)² N^{2γ}), and for GOE (β = 1) also
 * −∫f′²/(2π² ρ(E) N^{1−γ}) (module note).
 */
export function mesoscopicVarianceCorrection(
  f: (x: number) => number,
  beta: 1 | 2,
  E: number,
  N: number,
  gamma: number,
  options: MesoscopicQuadratureOptions = {},
): number {
  checkBulk(E, N, gamma);
  const q = douglasIntegrals(f, options);
  const macroscopic = (-(2 / (beta * Math.PI ** 2)) * q.integral ** 2) / ((4 - E * E) ** 2 * N ** (2 * gamma));
  const orthogonal = beta === 1 ? -q.derivativeSquared / (2 * Math.PI ** 2 * semicircleDensity(E) * N ** (1 - gamma)) : 0;
  return macroscopic + orthogonal;
}

/** K(x, y) = (4 − xy)/√((4 − x²)(4 − y²)), the macroscopic covariance kernel (module note). */
export function semicircleCovarianceKernel(x: number, y: number): number {
  return (4 - x * y) / Math.sqrt((4 - x * x) * (4 - y * y));
}

/** Cov(Tr f(N^γ(H − E1)), Tr f(N^γ(H − E2))) ≈ −(1/(βπ²))(∫f)² K(E1, E2)/((E1 − E2)² N^{2γ}), E1 ≠ E2. */
export function mesoscopicCrossCovariance(
  f: (x: number) => number,
  beta: 1 | 2,
  E1: number,
  E2: number,
  N: number,
  gamma: number,
  options: MesoscopicQuadratureOptions = {},
): number {
  checkBulk(E1, N, gamma);
  checkBulk(E2, N, gamma);
  if (E1 === E2) throw new RangeError('mesoscopicCrossCovariance: the energies must differ (use mesoscopicVariance)');
  const integral = douglasIntegrals(f, options).integral;
  return (-(1 / (beta * Math.PI ** 2)) * integral ** 2 * semicircleCovarianceKernel(E1, E2)) / ((E1 - E2) ** 2 * N ** (2 * gamma));
}
