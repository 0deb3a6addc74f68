import { type DoubleDouble, dd } from './double-double.js';

export interface QuadratureRule {
  readonly nodes: readonly DoubleDouble[];
  readonly weights: readonly DoubleDouble[];
}

const cache = new Map<number, QuadratureRule>();

/** P_m(x) and P_{m−1}(x) by the three-term recurrence (n + 1)P_{n+1} = (2n + 1)x P_n − n P_{n−1}. */
function legendre(m: number, x: DoubleDouble): { p: DoubleDouble; previous: DoubleDouble } {
  let previous = dd.of(1);
  let p = x;
  for (let n = 1; n < m; n++) {
    const next = dd.divNumber(dd.sub(dd.mulNumber(dd.mul(x, p), 2 * n + 1), dd.mulNumber(previous, n)), n + 1);
    previous = p;
    p = next;
  }
  return { p, previous };
}

/**
 * The m-point Gauss–Legendre rule on [−1, 1] in double-double (nodes ascending).
 * Method: Newton's method on P_m from the asymptotic guesses cos(π(i − 1/4)/(m + 1/2)), with
 * P_m′ = m(x P_m − P_{m−1})/(x² − 1), iterated in double-double until the step is below 10⁻³²;
 * weights 2/((1 − x²) P_m′(x)²). Exact for polynomials of degree 2m − 1.
 * References: P. J. Davis and P. Rabinowitz, 1984, Methods of Numerical Integration, 2nd ed.,
 * Academic Press, §2.7 (from memory); the guesses are Tricomi's (common practice).
 */
export function gaussLegendreDoubleDouble(m: number): QuadratureRule {
  if (!Number.isInteger(m) || m < 1) throw new RangeError(`gaussLegendreDoubleDouble: m must be a positive integer, got ${m}`);
  const known = cache.get(m);
  if (known !== undefined) return known;
  const nodes: DoubleDouble[] = [];
  const weights: DoubleDouble[] = [];
  for (let i = 1; i <= m; i++) {
    let x = dd.of(Math.cos((Math.PI * (i - 0.25)) / (m + 0.5)));
    let derivative = dd.of(1);
    for (let iteration = 0; iteration < 100; iteration++) {
      const { p, previous } = legendre(m, x);
      derivative = dd.div(dd.mulNumber(dd.sub(dd.mul(x, p), previous), m), dd.sub(dd.mul(x, x), dd.of(1)));
      const step = dd.div(p, derivative);
      x = dd.sub(x, step);
      if (Math.abs(step.hi) < 1e-32) break;
    }
    const { p, previous } = legendre(m, x);
    derivative = dd.div(dd.mulNumber(dd.sub(dd.mul(x, p), previous), m), dd.sub(dd.mul(x, x), dd.of(1)));
    nodes.push(x);
    weights.push(dd.div(dd.of(2), dd.mul(dd.sub(dd.of(1), dd.mul(x, x)), dd.mul(derivative, derivative))));
  }
  const rule = { nodes: nodes.reverse(), weights: weights.reverse() };
  cache.set(m, rule);
  return rule;
}
