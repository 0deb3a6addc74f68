import { type Complex, ONE, ZERO, add, complex, mul, neg, scale, sub } from '../harness/numeric/complex.js';

/**
 * Wick's rule and the moment–cumulant relations, for the Gaussian limit of trace statistics
 * (THEORY.md, "Wick rule": the statistics are asymptotically jointly Gaussian, their joint
 * cumulants of order ≥ 3 are O(1/N) for macroscopic statistics).
 *
 * - Isserlis (Wick): for jointly Gaussian centred X_1 … X_n, E[X_{i_1}⋯X_{i_n}] is the sum over the
 *   perfect matchings of the n positions of the products of covariances (0 for odd n). Bilinear:
 *   complex Gaussian vectors whose real and imaginary parts are jointly Gaussian obey the same rule
 *   with Cov(X, Y) = E[XY] − E[X]E[Y] (no conjugation), by multilinearity. L. Isserlis, 1918,
 *   Biometrika 12, 134–139 (sources.ts: ISSERLIS_1918).
 * - Joint cumulants from moments: κ(X_1, …, X_n) = Σ_π (−1)^{|π|−1} (|π| − 1)! Π_{B∈π} E[Π_{i∈B} X_i],
 *   over the set partitions π of {1..n} (P. McCullagh, 1987, Tensor Methods in Statistics, Chapman
 *   and Hall, §2.3–2.4; from memory; sources.ts: MCCULLAGH_1987). For centred variables and n = 4
 *   it reduces to E[X1X2X3X4] minus the three pairings.
 *
 * Method: the matching sum (a hafnian) by recursion on the first unmatched position with memoised
 * subsets, O(n² 2^n) instead of (n − 1)!! products (common practice); set partitions by restricted
 * growth strings (common practice), at most Bell(10) = 115975 of them.
 */

const MAX_PAIRING_LENGTH = 26;
const MAX_CUMULANT_ORDER = 10;

/** Σ over perfect matchings of the positions of `indices` of Π cov(indices[a], indices[b]); 0 for odd length, 1 for none. */
export function pairingSum(cov: (i: number, j: number) => Complex, indices: readonly number[]): Complex {
  const n = indices.length;
  if (n % 2 === 1) return ZERO;
  if (n > MAX_PAIRING_LENGTH) throw new RangeError(`pairingSum: at most ${MAX_PAIRING_LENGTH} indices, got ${n}`);
  const table: Complex[][] = indices.map((a) => indices.map((b) => cov(a, b)));
  const memo = new Map<number, Complex>();
  const sum = (mask: number): Complex => {
    if (mask === 0) return ONE;
    const known = memo.get(mask);
    if (known !== undefined) return known;
    let first = 0;
    while (((mask >> first) & 1) === 0) first++;
    const rest = mask & ~(1 << first);
    let total = ZERO;
    for (let j = first + 1; j < n; j++) {
      if (((rest >> j) & 1) === 1) total = add(total, mul(table[first][j], sum(rest & ~(1 << j))));
    }
    memo.set(mask, total);
    return total;
  };
  return sum((1 << n) - 1);
}

/** Calls `visit` with every set partition of {0..n−1}, as a list of blocks. */
function forEachSetPartition(n: number, visit: (blocks: readonly number[][]) => void): void {
  const labels = new Array<number>(n).fill(0);
  const recurse = (position: number, count: number): void => {
    if (position === n) {
      const blocks: number[][] = Array.from({ length: count }, () => []);
      labels.forEach((b, i) => blocks[b].push(i));
      visit(blocks);
      return;
    }
    for (let b = 0; b <= count; b++) {
      labels[position] = b;
      recurse(position + 1, Math.max(count, b + 1));
    }
  };
  recurse(0, 0);
}

/**
 * κ(X_0, …, X_{n−1}) from the joint moments, `moment(block)` = E[Π_{i∈block} X_i] for a block of
 * positions (ascending). n ≤ 10.
 */
export function jointCumulant(moment: (block: readonly number[]) => Complex, n: number): Complex {
  if (!Number.isInteger(n) || n < 1 || n > MAX_CUMULANT_ORDER) throw new RangeError(`jointCumulant: order must be 1 … ${MAX_CUMULANT_ORDER}, got ${n}`);
  const cache = new Map<string, Complex>();
  const m = (block: readonly number[]): Complex => {
    const key = block.join(',');
    let value = cache.get(key);
    if (value === undefined) cache.set(key, (value = moment(block)));
    return value;
  };
  let total = ZERO;
  forEachSetPartition(n, (blocks) => {
    let term: Complex = ONE;
    for (const block of blocks) term = mul(term, m(block));
    let factorial = 1;
    for (let j = 2; j < blocks.length; j++) factorial *= j;
    const signed = scale(term, factorial);
    total = blocks.length % 2 === 1 ? add(total, signed) : add(total, neg(signed));
  });
  return total;
}

/**
 * κ(X1, X2, X3, X4) of centred variables: E[X1X2X3X4] − E[X1X2]E[X3X4] − E[X1X3]E[X2X4] − E[X1X4]E[X2X3],
 * given the fourth moment and the covariance cov(i, j) of positions 0..3.
 */
export function centredJointCumulant4(fourthMoment: Complex, cov: (i: number, j: number) => Complex): Complex {
  return sub(fourthMoment, pairingSum(cov, [0, 1, 2, 3]));
}

/**
 * The plug-in estimate of κ(X1, X2, X3, X4) from n joint samples (samples[v][s] = sample s of
 * variable v): centre each variable by its sample mean, then E[X1X2X3X4] and the covariances by
 * sample averages (bilinear). Its bias is O(1/n) (McCullagh 1987, ch. 4, k-statistics for the
 * unbiased version; from memory); adequate where n is in the thousands.
 */
export function sampleJointCumulant4(samples: readonly (readonly Complex[])[]): Complex {
  if (samples.length !== 4) throw new RangeError(`sampleJointCumulant4: four variables needed, got ${samples.length}`);
  const n = samples[0].length;
  if (n < 2 || samples.some((s) => s.length !== n)) throw new RangeError('sampleJointCumulant4: four samples of equal length ≥ 2 needed');
  const centred = samples.map((s) => {
    let mean = ZERO;
    for (const x of s) mean = add(mean, x);
    mean = scale(mean, 1 / n);
    return s.map((x) => sub(x, mean));
  });
  const average = (positions: readonly number[]): Complex => {
    let total = ZERO;
    for (let t = 0; t < n; t++) {
      let p: Complex = ONE;
      for (const v of positions) p = mul(p, centred[v][t]);
      total = add(total, p);
    }
    return scale(total, 1 / n);
  };
  const covariances = [0, 1, 2, 3].map((i) => [0, 1, 2, 3].map((j) => (i < j ? average([i, j]) : complex(NaN, NaN))));
  return centredJointCumulant4(average([0, 1, 2, 3]), (i, j) => covariances[Math.min(i, j)][Math.max(i, j)]);
}
