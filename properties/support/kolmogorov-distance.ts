import { semicircleCdf } from '../../reference-values/semicircle-law.js';

/**
 * Kolmogorov distance sup_x |F_N(x) − F_sc(x)| between the empirical spectral distribution of
 * the given eigenvalues and the semicircle CDF. F_N jumps by 1/N at each eigenvalue, so the supremum
 * is attained at an eigenvalue, from the left or the right: max_i max(i/N − F(λ_(i)),
 * F(λ_(i)) − (i − 1)/N) over the sorted eigenvalues (common practice). The input is not modified.
 */
export function kolmogorovDistanceToSemicircle(eigenvalues: ArrayLike<number>): number {
  const sorted = Float64Array.from(eigenvalues).sort();
  const n = sorted.length;
  let worst = 0;
  for (let i = 0; i < n; i++) {
    const f = semicircleCdf(sorted[i]);
    worst = Math.max(worst, (i + 1) / n - f, f - i / n);
  }
  return worst;
}
