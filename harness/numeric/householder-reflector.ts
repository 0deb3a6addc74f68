import { stridedNorm } from './householder-norm.js';

const SAFE_MIN = 2.2250738585072014e-308;

/**
 * The elementary reflector H = I − τ v vᵀ with Hx = β e₁ for the real vector x = x[at … at + count − 1]
 * (α = x[at], the tail x[at + 1 …]), in place: on return x[at + 1 …] holds the tail of v (v₀ = 1 is
 * implicit; x[at] is left as it was) and the result gives τ and β. τ = 0 (H = I, β = α) when the
 * tail is zero.
 *
 * Method: LAPACK dlarfg (Anderson et al., LAPACK Users' Guide, 3rd ed., SIAM, 1999): β = −sign(α)‖x‖,
 * τ = (β − α)/β, v = tail/(α − β), with dlarfg's rescaling by 1/safmin (up to 20 times) while |β| is
 * below the safe minimum, so 1/(α − β) cannot overflow; β is scaled back at the end. The norm is
 * taken safely (householder-norm.ts). Golub and Van Loan 2013, §5.1.2, for the reflector itself.
 */
export function householderReflector(x: Float64Array, at: number, count: number): { tau: number; beta: number } {
  let alpha = x[at];
  const tail = at + 1;
  const end = at + count;
  let xnorm = stridedNorm(x, tail, count - 1, 1);
  if (xnorm === 0) return { tau: 0, beta: alpha };
  let beta = -Math.sign(alpha || 1) * Math.hypot(alpha, xnorm);
  let rescale = 1;
  let steps = 0;
  while (Math.abs(beta) < SAFE_MIN && steps < 20) {
    steps++;
    rescale /= SAFE_MIN;
    for (let j = tail; j < end; j++) x[j] /= SAFE_MIN;
    alpha /= SAFE_MIN;
    beta /= SAFE_MIN;
  }
  if (steps > 0) {
    xnorm = stridedNorm(x, tail, count - 1, 1);
    beta = -Math.sign(alpha || 1) * Math.hypot(alpha, xnorm);
  }
  const tau = (beta - alpha) / beta;
  const s = 1 / (alpha - beta);
  for (let j = tail; j < end; j++) x[j] *= s;
  return { tau, beta: beta / rescale };
}
