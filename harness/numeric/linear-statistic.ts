/**
 * The linear eigenvalue statistic Tr f(H) = Σ_i f(λ_i) (THEORY.md, "Fluctuations: linear
 * statistics"; not centred, not normalised).
 *
 * Method: Neumaier's compensated summation, so the sum of N terms carries an error of O(ε) times
 * Σ|f(λ_i)| rather than O(N ε) (A. Neumaier, 1974, "Rundungsfehleranalyse einiger Verfahren zur
 * Summation endlicher Summen", Z. Angew. Math. Mech. 54, 39–51). The centred statistic
 * Tr f(H) − E Tr f(H) is O(1) while each term is O(1) and N of them add up to O(N), so the
 * compensation keeps its relative accuracy.
 */
export function linearStatistic(values: Float64Array, f: (x: number) => number): number {
  let sum = 0;
  let compensation = 0;
  for (let i = 0; i < values.length; i++) {
    const term = f(values[i]);
    const t = sum + term;
    if (Math.abs(sum) >= Math.abs(term)) compensation += sum - t + term;
    else compensation += term - t + sum;
    sum = t;
  }
  return sum + compensation;
}
