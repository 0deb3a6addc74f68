/**
 * The upper tail of Kolmogorov's limiting distribution,
 *   Q(λ) = P(K > λ) = 2 Σ_{k≥1} (−1)^{k−1} e^{−2k²λ²},
 * the asymptotic law of √n·sup|F_n − F| (Kolmogorov 1933) and of √(nm/(n+m))·sup|F_n − G_m| for two
 * samples from one continuous distribution (Smirnov 1948).
 *
 * Method: for λ ≥ 1.18 the alternating series above (three terms reach double precision); below,
 * the theta-function form 1 − (√(2π)/λ) Σ_{k≥1} e^{−(2k−1)²π²/(8λ²)}, which converges fast there
 * (W. H. Press et al., 2007, Numerical Recipes, 3rd ed., §6.14, "KSdist"; the switch point is
 * theirs).
 * References: A. N. Kolmogorov, 1933, "Sulla determinazione empirica di una legge di
 * distribuzione", Giornale dell'Istituto Italiano degli Attuari 4, 83–91; N. Smirnov, 1948,
 * "Table for estimating the goodness of fit of empirical distributions", Annals of Mathematical
 * Statistics 19(2), 279–281.
 */
export function kolmogorovTail(lambda: number): number {
  if (Number.isNaN(lambda)) return NaN;
  if (lambda <= 0) return 1;
  if (lambda < 1.18) {
    const y = Math.exp(-(Math.PI * Math.PI) / (8 * lambda * lambda));
    // Σ e^{−(2k−1)²π²/(8λ²)} = y + y⁹ + y²⁵ + y⁴⁹ + …; four terms exceed double precision for λ < 1.18.
    const sum = y + y ** 9 + y ** 25 + y ** 49;
    return Math.min(1, Math.max(0, 1 - (Math.sqrt(2 * Math.PI) / lambda) * sum));
  }
  const x = Math.exp(-2 * lambda * lambda);
  // 2(x − x⁴ + x⁹ − x¹⁶): the next term, x²⁵ < 1e-30, is beyond double precision for λ ≥ 1.18.
  return Math.min(1, Math.max(0, 2 * (x - x ** 4 + x ** 9 - x ** 16)));
}
