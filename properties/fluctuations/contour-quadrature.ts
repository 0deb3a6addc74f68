import { mul, scale, type Complex } from '../../harness/numeric/complex.js';

/**
 * Tr f(H) from resolvent traces, for an f analytic inside and on an ellipse around the spectrum:
 * Tr f(H) = Σ_λ f(λ) = −(1/2πi) ∮ f(z) Tr G(z) dz (Cauchy's integral formula, counter-clockwise),
 * so a linear statistic is a fixed linear combination of the statistics Tr G(z_j) at the nodes.
 * This lets every fluctuation check be stated through chain traces, which is what both an
 * implementation's sampleStatistics and the harness's engine produce.
 *
 * Method: the contour z(θ) = ρe^{iθ} + ρ⁻¹e^{−iθ} (an ellipse with foci ±2, semi-axes ρ + 1/ρ and
 * ρ − 1/ρ), dz = i(ρe^{iθ} − ρ⁻¹e^{−iθ}) dθ, and the trapezoid rule at θ_j = 2π(j + ½)/M, which
 * avoids the real axis and pairs each node with its conjugate. The integrand is periodic and
 * analytic in θ, so the error decays geometrically in M (L. N. Trefethen and J. A. C. Weideman,
 * 2014, "The exponentially convergent trapezoidal rule", SIAM Review 56(3), 385–458, §2): with
 * every eigenvalue inside |w + 1/w| < 2.2 (so |w| < 1.6 in w = ρe^{iθ}) the spectral side contributes
 * about (1.6/ρ)^M, and an entire f of order at most 2 (polynomials, e^x, e^{−x²}, e^{2ix}) contributes
 * through its Taylor tail. With ρ = 2.5 and M = 128 both are below 10⁻¹² relative to N·max|f| on the
 * contour (tested against direct sums over the eigenvalues). An eigenvalue outside the ellipse
 * (|λ| ≳ 2.9) would be missed: that happens only to a matrix far from the semicircle, which the
 * other checks fail anyway.
 */
export const CONTOUR_RADIUS = 2.5;
export const CONTOUR_NODES = 128;

export interface ContourNode {
  readonly z: Complex;
  /** Multiplies f(z)·Tr G(z) in the trapezoid sum: −(1/M)(ρe^{iθ} − ρ⁻¹e^{−iθ}). */
  readonly weight: Complex;
}

export function contourNodes(radius = CONTOUR_RADIUS, nodes = CONTOUR_NODES): ContourNode[] {
  return Array.from({ length: nodes }, (_, j) => {
    const theta = (2 * Math.PI * (j + 0.5)) / nodes;
    const c = Math.cos(theta);
    const s = Math.sin(theta);
    const z = { re: (radius + 1 / radius) * c, im: (radius - 1 / radius) * s };
    const derivativeOverI = { re: (radius - 1 / radius) * c, im: (radius + 1 / radius) * s };
    return { z, weight: scale(derivativeOverI, -1 / nodes) };
  });
}

/** The coefficients a_j with Tr f(H) ≈ Σ_j a_j Tr G(z_j), for f given on complex arguments. */
export function contourCoefficients(f: (z: Complex) => Complex, nodes: readonly ContourNode[]): Complex[] {
  return nodes.map((node) => mul(node.weight, f(node.z)));
}
