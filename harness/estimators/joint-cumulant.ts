import type { Complex } from '../numeric/complex.js';
import { complexMean } from './bilinear-covariance.js';

/** A joint cumulant estimate with its jackknife standard error per component. */
export interface CumulantEstimate {
  readonly estimate: Complex;
  readonly standardError: Complex;
  readonly count: number;
}

/** Highest order handled (Bell(8) = 4140 partitions). */
export const MAX_CUMULANT_ORDER = 8;

/**
 * The joint cumulant κ(X1, …, Xn) of complex statistics observed together on K independent
 * samples (bilinear throughout: no conjugation), with a delete-one jackknife standard error.
 * `columns[i]` holds X_i complex interleaved (Re, Im per sample); a column may appear more than
 * once (κ(X, X, Y, Y)).
 *
 * Method: each column is first centred by its sample mean, which changes no cumulant of order
 * ≥ 2 and avoids the cancellation of raw moments of O(N) traces. With the plug-in moments
 * M_B = (1/K) Σ_k Π_{i∈B} x_ik for every non-empty subset B, the cumulant is the Möbius sum over
 * set partitions π of {1..n}: κ = Σ_π (−1)^{|π|−1} (|π| − 1)! Π_{B∈π} M_B (P. McCullagh, 1987,
 * Tensor Methods in Statistics, Chapman and Hall, ch. 2; for order 4 with centred variables it is
 * E[X1X2X3X4] minus the three pairings, Isserlis 1918). For a Gaussian vector every cumulant of
 * order ≥ 3 vanishes. The estimate is a smooth function of sample means, so the delete-one
 * jackknife applies: θ_(k) from the K − 1 other samples (moments (S_B − P_Bk)/(K − 1)), and
 * SE² = ((K − 1)/K) Σ_k (θ_(k) − θ̄)² per component (B. Efron and C. Stein, 1981, "The jackknife
 * estimate of variance", Ann. Statist. 9(3), 586–596; B. Efron, 1982, The Jackknife, the Bootstrap
 * and Other Resampling Plans, SIAM). The plug-in estimate's bias is O(1/K), far below its O(1/√K)
 * standard error at the sample sizes used.
 */
export function jointCumulant(columns: readonly Float64Array[]): CumulantEstimate {
  const order = columns.length;
  if (order < 1 || order > MAX_CUMULANT_ORDER) throw new RangeError(`jointCumulant: order must be 1 to ${MAX_CUMULANT_ORDER}, got ${order}`);
  const length = columns[0].length;
  if (columns.some((c) => c.length !== length) || length % 2 !== 0) {
    throw new RangeError('jointCumulant: columns need one common even length (complex interleaved)');
  }
  const n = length / 2;
  if (n < 3) throw new RangeError('jointCumulant: at least three samples are needed');
  const centred = columns.map(centredCopy);
  const subsets = 1 << order;
  // products[k * subsets + B], complex interleaved: Π_{i∈B} x_ik (B = 0 gives 1).
  const products = new Float64Array(2 * n * subsets);
  const sums = new Float64Array(2 * subsets);
  for (let k = 0; k < n; k++) {
    const base = 2 * k * subsets;
    products[base] = 1;
    for (let b = 1; b < subsets; b++) {
      const low = 31 - Math.clz32(b & -b);
      const rest = base + 2 * (b & (b - 1));
      const xr = centred[low][2 * k];
      const xi = centred[low][2 * k + 1];
      const pr = products[rest] * xr - products[rest + 1] * xi;
      const pi = products[rest] * xi + products[rest + 1] * xr;
      products[base + 2 * b] = pr;
      products[base + 2 * b + 1] = pi;
      sums[2 * b] += pr;
      sums[2 * b + 1] += pi;
    }
  }
  const partitions = setPartitions(order);
  const moments = new Float64Array(2 * subsets);
  const evaluate = (count: number, leaveOut: number): Complex => {
    for (let b = 1; b < subsets; b++) {
      const out = leaveOut < 0 ? 0 : 2 * leaveOut * subsets + 2 * b;
      moments[2 * b] = (sums[2 * b] - (leaveOut < 0 ? 0 : products[out])) / count;
      moments[2 * b + 1] = (sums[2 * b + 1] - (leaveOut < 0 ? 0 : products[out + 1])) / count;
    }
    return mobiusSum(partitions, moments);
  };
  const estimate = evaluate(n, -1);
  const re = new Float64Array(n);
  const im = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    const t = evaluate(n - 1, k);
    re[k] = t.re;
    im[k] = t.im;
  }
  return { estimate, standardError: { re: jackknifeSpread(re), im: jackknifeSpread(im) }, count: n };
}

function centredCopy(column: Float64Array): Float64Array {
  const n = column.length / 2;
  const [re, im] = complexMean(column);
  const out = new Float64Array(column.length);
  for (let k = 0; k < n; k++) {
    out[2 * k] = column[2 * k] - re;
    out[2 * k + 1] = column[2 * k + 1] - im;
  }
  return out;
}

/** √(((K − 1)/K) Σ (θ_k − θ̄)²). */
function jackknifeSpread(values: Float64Array): number {
  const n = values.length;
  let mean = 0;
  for (let k = 0; k < n; k++) mean += values[k];
  mean /= n;
  let s = 0;
  for (let k = 0; k < n; k++) s += (values[k] - mean) ** 2;
  return Math.sqrt(((n - 1) / n) * s);
}

interface Partition {
  readonly blocks: readonly number[];
  /** (−1)^{|π|−1} (|π| − 1)!. */
  readonly coefficient: number;
}

const partitionCache = new Map<number, readonly Partition[]>();

/** Every set partition of {0 … n − 1}, blocks as bitmasks (restricted growth strings). */
export function setPartitions(n: number): readonly Partition[] {
  const cached = partitionCache.get(n);
  if (cached) return cached;
  const out: Partition[] = [];
  const blocks: number[] = [];
  const place = (i: number) => {
    if (i === n) {
      let factorial = 1;
      for (let j = 2; j < blocks.length; j++) factorial *= j;
      out.push({ blocks: [...blocks], coefficient: (blocks.length % 2 === 1 ? 1 : -1) * factorial });
      return;
    }
    for (let b = 0; b < blocks.length; b++) {
      blocks[b] |= 1 << i;
      place(i + 1);
      blocks[b] &= ~(1 << i);
    }
    blocks.push(1 << i);
    place(i + 1);
    blocks.pop();
  };
  place(0);
  partitionCache.set(n, out);
  return out;
}

function mobiusSum(partitions: readonly Partition[], moments: Float64Array): Complex {
  let re = 0;
  let im = 0;
  for (const p of partitions) {
    let pr = p.coefficient;
    let pi = 0;
    for (const b of p.blocks) {
      const mr = moments[2 * b];
      const mi = moments[2 * b + 1];
      const t = pr * mr - pi * mi;
      pi = pr * mi + pi * mr;
      pr = t;
    }
    re += pr;
    im += pi;
  }
  return { re, im };
}
