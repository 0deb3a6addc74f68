/**
 * Holm's step-down adjustment of p-values, controlling the family-wise error rate at any level
 * under arbitrary dependence between the tests.
 *
 * Method: sort p ascending; adjusted p_(i) = max_{j ≤ i} min(1, (m − j + 1) p_(j)). A test is
 * rejected at level α exactly when its adjusted p-value is ≤ α.
 * References: S. Holm, 1979, "A simple sequentially rejective multiple test procedure",
 * Scandinavian Journal of Statistics 6(2), 65–70.
 *
 * NaN p-values (an undefined test) are treated as 0: the check fails rather than passing unseen.
 */
export function holmAdjust(pValues: readonly number[]): number[] {
  const m = pValues.length;
  const order = pValues.map((p, i) => ({ p: Number.isNaN(p) ? 0 : p, i })).sort((a, b) => a.p - b.p || a.i - b.i);
  const adjusted = new Array<number>(m);
  let running = 0;
  order.forEach(({ p, i }, rank) => {
    running = Math.max(running, Math.min(1, (m - rank) * p));
    adjusted[i] = running;
  });
  return adjusted;
}
