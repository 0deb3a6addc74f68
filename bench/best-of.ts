/**
 * Best (minimum) wall-clock seconds of `fn` over `reps` runs: on a shared machine the minimum is
 * the run least disturbed by other work, the usual estimate of a routine's own cost (common
 * practice; the numpy peer reports its best the same way).
 */
export function bestOf(reps: number, fn: () => unknown): number {
  let best = Number.POSITIVE_INFINITY;
  for (let r = 0; r < reps; r++) {
    const t0 = performance.now();
    fn();
    best = Math.min(best, (performance.now() - t0) / 1000);
  }
  return best;
}
