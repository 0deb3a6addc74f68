import type { Complex } from '../numeric/complex.js';
import { countOfAtLeast, type CoMoments } from './co-moment-accumulator.js';

/**
 * The delta-method standard error of θ̂ = f(x̄), a smooth function of the sample mean of a real
 * feature vector observed on n independent samples, from the gradient g = ∇f(x̄) and the
 * co-moment state of the features.
 *
 * Method: θ̂ − θ = gᵀ(x̄ − μ) + O_p(1/n), so Var θ̂ ≈ gᵀ Σ g / n with Σ estimated by C/(n − 1)
 * (the delta method; A. W. van der Vaart, 1998, Asymptotic Statistics, Cambridge University Press,
 * ch. 3, Theorem 3.1; theorem number from memory). gᵀCg/(n − 1) is the sample variance of the
 * linear combinations gᵀx_k, the empirical influence values of θ̂ up to a constant, so this is also
 * the infinitesimal jackknife (L. A. Jaeckel, 1972, "The infinitesimal jackknife", Bell
 * Laboratories memorandum MM 72-1215-11; B. Efron, 1982, The Jackknife, the Bootstrap and Other
 * Resampling Plans, SIAM, ch. 6, from memory), which agrees with the delete-one jackknife to first
 * order. Needs finite second moments of the features.
 */
export function deltaMethodStandardError(state: CoMoments, gradient: ArrayLike<number>): number {
  const d = state.mean.length;
  if (gradient.length !== d) throw new RangeError(`deltaMethodStandardError: gradient of length ${gradient.length} for width ${d}`);
  const n = countOfAtLeast(state, 2, 'deltaMethodStandardError');
  const c = state.comoment;
  let form = 0;
  for (let j = 0, column = 0; j < d; column += ++j) {
    const gj = gradient[j];
    if (gj === 0) continue;
    let offDiagonal = 0;
    for (let i = 0; i < j; i++) offDiagonal += c[column + i] * gradient[i];
    form += gj * (c[column + j] * gj + 2 * offDiagonal);
  }
  // gᵀCg ≥ 0 in exact arithmetic; a rounding below zero means a zero spread.
  return Math.sqrt(Math.max(0, form) / (n - 1) / n);
}

/** Standard errors of Re θ̂ and Im θ̂ of a complex θ̂ = f(x̄), from the real gradients of its two parts. */
export function complexDeltaMethodStandardError(state: CoMoments, gradientRe: ArrayLike<number>, gradientIm: ArrayLike<number>): Complex {
  return { re: deltaMethodStandardError(state, gradientRe), im: deltaMethodStandardError(state, gradientIm) };
}

/**
 * Standard errors of Re θ̂ and Im θ̂ for θ̂ = f(M̄) a holomorphic function of the means M̄_b of complex
 * features, where feature b has its Re and Im at components 2b and 2b + 1, given the complex partial
 * derivatives D_b = ∂f/∂M_b interleaved in `partials` (length d).
 *
 * Method: dθ = Σ_b D_b (da_b + i db_b) for M_b = a_b + i b_b (the Cauchy–Riemann equations), so
 * ∂Re θ/∂(a_b, b_b) = (Re D_b, −Im D_b) and ∂Im θ/∂(a_b, b_b) = (Im D_b, Re D_b); common practice.
 */
export function holomorphicDeltaMethodStandardError(state: CoMoments, partials: Float64Array): Complex {
  const d = state.mean.length;
  if (partials.length !== d) throw new RangeError(`holomorphicDeltaMethodStandardError: partials of length ${partials.length} for width ${d}`);
  const gradientRe = new Float64Array(d);
  const gradientIm = new Float64Array(d);
  for (let b = 0; b < d; b += 2) {
    gradientRe[b] = partials[b];
    gradientRe[b + 1] = -partials[b + 1];
    gradientIm[b] = partials[b + 1];
    gradientIm[b + 1] = partials[b];
  }
  return complexDeltaMethodStandardError(state, gradientRe, gradientIm);
}

