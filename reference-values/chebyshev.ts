/**
 * Chebyshev coefficients on [−2, 2], the basis in which the fluctuation and mean-correction
 * formulas for linear statistics Tr f(H) are written (THEORY.md, "Fluctuations: linear
 * statistics"):
 *
 *   f(x) = Σ_{k≥0} c_k T_k(x/2),  c_k = (2/π) ∫_0^π f(2cos θ) cos kθ dθ  (k ≥ 1),
 *   c_0 = (1/π) ∫_0^π f(2cos θ) dθ  (the 1/π convention, so that the series starts with c_0·T_0),
 *
 * and τ_k(f) = (1/π) ∫_{−2}^{2} f(x) T_k(x/2)/√(4 − x²) dx, which with x = 2cos θ is
 * (1/π) ∫_0^π f(2cos θ) cos kθ dθ: τ_0 = c_0 and τ_k = c_k/2 for k ≥ 1.
 *
 * Method: the trapezoid rule in θ on M intervals (a DCT-I of the values at the Chebyshev points
 * of the second kind x_j = 2cos(jπ/M)), c_k ≈ (2/M) Σ''_{j=0}^{M} f(x_j) cos(kjπ/M) (Σ'' halves
 * the end terms). The integrand is smooth and periodic in θ, so the error is the aliasing sum
 * c_{2M−k} + c_{2M+k} + …, which decays geometrically in M for f analytic on a neighbourhood of
 * [−2, 2] and vanishes for polynomials of degree < 2M − k. M is doubled (reusing the old nodes)
 * until two successive estimates of c_0…c_K agree to 16ε·max|f(x_j)|; the second estimate's error
 * is then far below that (it is the square, roughly, of the first's). The nodes are computed as
 * x_j = 2 sin((M − 2j)π/(2M)), which makes them exactly symmetric and x_{M/2} = 0.
 *
 * References:
 * - L. N. Trefethen and J. A. C. Weideman, 2014, "The exponentially convergent trapezoidal rule",
 *   SIAM Review 56(3), 385–458.
 * - L. N. Trefethen, 2013, Approximation Theory and Approximation Practice, SIAM, ch. 2–3 and 8
 *   (Chebyshev points by the sine formula, coefficients, aliasing; chapter numbers from memory).
 */

export interface ChebyshevExpansion {
  /** c_0 … c_K (length K + 1), with the conventions above. */
  readonly coefficients: Float64Array;
  /** M, the number of trapezoid intervals of the last estimate (M + 1 function values). */
  readonly intervals: number;
  /** max_k of the change between the last two estimates: an upper estimate of the error. */
  readonly aliasingEstimate: number;
  /** Whether aliasingEstimate fell below 16ε·max|f| before maxIntervals was reached. */
  readonly converged: boolean;
}

export interface ChebyshevOptions {
  /** Upper bound on M (default 2^16); f is evaluated at most M + 1 times. */
  readonly maxIntervals?: number;
}

const DEFAULT_MAX_INTERVALS = 1 << 16;

/** x_j = 2 sin((M − 2j)π/(2M)) = 2cos(jπ/M), exactly symmetric about 0. */
function chebyshevPoint(j: number, intervals: number): number {
  return 2 * Math.sin(((intervals - 2 * j) * Math.PI) / (2 * intervals));
}

/** DCT-I of the samples with the c_k normalisation; cos(kjπ/M) read from a table by kj mod 2M. */
function dctCoefficients(values: Float64Array, intervals: number, K: number): Float64Array {
  const period = 2 * intervals;
  const cosTable = new Float64Array(period);
  for (let i = 0; i < period; i++) cosTable[i] = Math.cos((i * Math.PI) / intervals);
  const c = new Float64Array(K + 1);
  for (let k = 0; k <= K; k++) {
    let sum = 0.5 * (values[0] + (k % 2 === 0 ? values[intervals] : -values[intervals]));
    for (let j = 1; j < intervals; j++) sum += values[j] * cosTable[(k * j) % period];
    c[k] = ((k === 0 ? 1 : 2) * sum) / intervals;
  }
  return c;
}

/**
 * c_0 … c_K of f on [−2, 2] with a convergence report (see the module note for the method). Use
 * this when f may not be smooth; `chebyshevCoefficients` insists on convergence.
 */
export function chebyshevExpansion(f: (x: number) => number, K: number, options: ChebyshevOptions = {}): ChebyshevExpansion {
  if (!Number.isInteger(K) || K < 0) throw new RangeError(`chebyshevExpansion: K must be an integer ≥ 0, got ${K}`);
  const maxIntervals = options.maxIntervals ?? DEFAULT_MAX_INTERVALS;
  let intervals = 32;
  while (intervals < 2 * K + 2) intervals *= 2;
  if (intervals > maxIntervals) throw new RangeError(`chebyshevExpansion: K = ${K} needs maxIntervals ≥ ${intervals}`);

  let values = new Float64Array(intervals + 1);
  for (let j = 0; j <= intervals; j++) values[j] = f(chebyshevPoint(j, intervals));
  let coefficients = dctCoefficients(values, intervals, K);
  let aliasingEstimate = Infinity;
  while (2 * intervals <= maxIntervals) {
    // The old nodes are the even-indexed new ones: x_j(M) = x_{2j}(2M).
    const refined = new Float64Array(2 * intervals + 1);
    for (let j = 0; j <= intervals; j++) refined[2 * j] = values[j];
    for (let j = 1; j < 2 * intervals; j += 2) refined[j] = f(chebyshevPoint(j, 2 * intervals));
    intervals *= 2;
    values = refined;
    const next = dctCoefficients(values, intervals, K);
    aliasingEstimate = 0;
    for (let k = 0; k <= K; k++) aliasingEstimate = Math.max(aliasingEstimate, Math.abs(next[k] - coefficients[k]));
    coefficients = next;
    let scale = 0;
    for (let j = 0; j <= intervals; j++) scale = Math.max(scale, Math.abs(values[j]));
    if (!Number.isFinite(scale)) break;
    if (aliasingEstimate <= 16 * Number.EPSILON * scale) return { coefficients, intervals, aliasingEstimate, converged: true };
  }
  return { coefficients, intervals, aliasingEstimate, converged: false };
}

/**
 * c_0 … c_K of f on [−2, 2] to full double precision (absolute error a few ε·max|f| on [−2, 2]);
 * throws a RangeError if f is not smooth enough for that within options.maxIntervals.
 */
export function chebyshevCoefficients(f: (x: number) => number, K: number, options: ChebyshevOptions = {}): Float64Array {
  const e = chebyshevExpansion(f, K, options);
  if (!e.converged) {
    throw new RangeError(
      `chebyshevCoefficients: no convergence to double precision with ${e.intervals} intervals (change between estimates ${e.aliasingEstimate}); f is not smooth enough on [−2, 2], use chebyshevExpansion for a best effort`,
    );
  }
  return e.coefficients;
}

/** τ_k(f) = (1/π) ∫_{−2}^{2} f(x) T_k(x/2)/√(4 − x²) dx: c_0 for k = 0, c_k/2 for k ≥ 1. */
export function chebyshevTau(f: (x: number) => number, k: number, options: ChebyshevOptions = {}): number {
  const c = chebyshevCoefficients(f, k, options);
  return k === 0 ? c[0] : c[k] / 2;
}
