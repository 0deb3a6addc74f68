/**
 * Euclidean norm of `count` entries of `x` starting at `start`, `stride` apart, safe from
 * overflow and harmful underflow.
 *
 * Method: the plain sum of squares is used when it lands in [1e-290, 1e290], where neither the
 * sum nor its significant terms can have overflowed or lost relative precision to underflow
 * (a term small enough to underflow is then below 1e-18 of the sum); otherwise the entries are
 * rescaled by their largest magnitude first (the idea of LAPACK dnrm2/dlassq; common practice).
 */
export function stridedNorm(x: Float64Array, start: number, count: number, stride: number): number {
  let ss = 0;
  const end = start + count * stride;
  for (let k = start; k < end; k += stride) ss += x[k] * x[k];
  if (ss >= 1e-290 && ss <= 1e290) return Math.sqrt(ss);
  if (Number.isNaN(ss)) return Number.NaN;
  let big = 0;
  for (let k = start; k < end; k += stride) big = Math.max(big, Math.abs(x[k]));
  if (big === 0 || big === Number.POSITIVE_INFINITY) return big;
  let scaled = 0;
  for (let k = start; k < end; k += stride) {
    const t = x[k] / big;
    scaled += t * t;
  }
  return big * Math.sqrt(scaled);
}
