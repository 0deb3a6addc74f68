import { type Complex, ONE, abs, add, complex, div, mul, scale, sub } from '../harness/numeric/complex.js';

/**
 * Divided differences f[z_1, …, z_k] of a function analytic off a segment [a, b] of the real axis
 * (by default the semicircle support [−2, 2]), coincident points included, as a quadrature rule:
 * f[z_1..z_k] = Σ_j w_j f(ζ_j). A rule can be applied to many functions (chain-covariance.ts applies
 * one in each variable of a function of two variables).
 *
 * Method. f[z_1..z_k] = (1/2πi) ∮ f(ζ)/P(ζ) dζ, P(ζ) = Π_j (ζ − z_j), on a contour around the points
 * inside the domain of analyticity (the Hermite formula; it reduces to f^{(k−1)}(z)/(k−1)! when all
 * points coincide). The points are split into clusters; f[z_1..z_k] is the sum over clusters C of
 * (1/2πi) ∮_C f/P, i.e. of (f/P_{not C})[C] (partial fractions, the residue theorem).
 * - A cluster of one point z contributes f(z)/P′-type weight 1/Π_{j ∉ C}(z − z_j) exactly.
 * - A larger cluster (centroid c, radius R = max|z − c|, nearest singularity D = the distance from c
 *   to [a, b] or to the nearest point outside C) uses the circle |ζ − c| = r with r = D·max(1/2, √(R/D))
 *   and the trapezoid rule on M equispaced nodes, weight (ζ_j − c)/(M P(ζ_j)). The integrand is
 *   analytic in the annulus R < |ζ − c| < D, so the error is O(ρ^M) with ρ = max(R/r, r/D) ≤ √(1/2)
 *   (Trefethen and Weideman 2014, SIAM Rev. 56, §2 and §7 on the trapezoid rule for periodic analytic
 *   integrands on circles); M = ⌈log(ε/8)/log ρ⌉ (at most about 110) makes it below ε relative to
 *   the integrand's size. Keeping r ≥ D/2 bounds the rounding amplification by 2^{k−1}.
 * Clusters are the single-linkage groups of points closer than τ·min(d_i, d_j), d_i the distance of
 * z_i to [a, b], with τ = 1/4; a cluster with R > D/2 makes τ halve and the clustering repeat (as
 * τ → 0 only coincident points stay together, and those always pass), so the construction ends.
 * Between clusters the partial fractions amplify rounding by at most about (1/τ)^{k−1}.
 *
 * Accuracy: the trapezoid error is below ε relative to the integrand, so the result carries the
 * rounding error of Σ_j w_j f(ζ_j), about (k + 2)ε·Σ_j |w_j f(ζ_j)| (Higham 2002, Accuracy and
 * Stability of Numerical Algorithms, §4.2). For functions singular along the whole segment, as the
 * semicircle quantities are, that is a small multiple of ε times the result; for a function smooth
 * on a larger scale L than the distance D to the segment it can exceed ε|result| by (L/D)^{k−1}.
 *
 * References: L. N. Trefethen and J. A. C. Weideman, 2014, "The exponentially convergent trapezoidal
 * rule", SIAM Review 56(3), 385–458; the contour-integral (Hermite) form of divided differences is
 * common practice (e.g. C. de Boor, 2005, "Divided differences", Surv. Approx. Theory 1, 46–69;
 * from memory).
 */

export interface DividedDifferenceRule {
  readonly nodes: readonly Complex[];
  readonly weights: readonly Complex[];
}

/** The real segment off which the function is analytic. */
export interface SingularSegment {
  readonly lo: number;
  readonly hi: number;
}

export const SEMICIRCLE_SUPPORT: SingularSegment = { lo: -2, hi: 2 };

const LINK_FACTOR = 0.25;
const RADIUS_RATIO = 0.5;
const MAX_RECLUSTERINGS = 64;

function distanceToSegment(z: Complex, s: SingularSegment): number {
  const dx = z.re < s.lo ? s.lo - z.re : z.re > s.hi ? z.re - s.hi : 0;
  return Math.hypot(dx, z.im);
}

/** Single-linkage clusters (lists of point indices) of points closer than tau·min(d_i, d_j). */
function linkClusters(points: readonly Complex[], d: readonly number[], tau: number): number[][] {
  const k = points.length;
  const parent = Array.from({ length: k }, (_, i) => i);
  const find = (i: number): number => {
    while (parent[i] !== i) i = parent[i] = parent[parent[i]];
    return i;
  };
  for (let i = 0; i < k; i++) {
    for (let j = i + 1; j < k; j++) {
      if (abs(sub(points[i], points[j])) <= tau * Math.min(d[i], d[j])) parent[find(i)] = find(j);
    }
  }
  const groups = new Map<number, number[]>();
  for (let i = 0; i < k; i++) {
    const r = find(i);
    const g = groups.get(r);
    if (g === undefined) groups.set(r, [i]);
    else g.push(i);
  }
  return [...groups.values()];
}

interface Circle {
  readonly center: Complex;
  readonly inner: number;
  readonly outer: number;
}

function clusterCircle(points: readonly Complex[], members: readonly number[], segment: SingularSegment): Circle {
  let center = complex(0, 0);
  for (const i of members) center = add(center, points[i]);
  center = scale(center, 1 / members.length);
  let inner = 0;
  for (const i of members) inner = Math.max(inner, abs(sub(points[i], center)));
  let outer = distanceToSegment(center, segment);
  const inside = new Set(members);
  points.forEach((p, j) => {
    if (!inside.has(j)) outer = Math.min(outer, abs(sub(p, center)));
  });
  return { center, inner, outer };
}

/** 1/Π_{j ∈ indices}(ζ − z_j). */
function inverseProduct(zeta: Complex, points: readonly Complex[], skip: ReadonlySet<number>): Complex {
  let p = ONE;
  points.forEach((z, j) => {
    if (!skip.has(j)) p = mul(p, sub(zeta, z));
  });
  return div(ONE, p);
}

/**
 * The rule for f[z_1..z_k] (k ≥ 1), f analytic on C \ [segment.lo, segment.hi]. Throws a
 * RangeError for no points or a point on the segment (or not finite).
 */
export function dividedDifferenceRule(points: readonly Complex[], segment: SingularSegment = SEMICIRCLE_SUPPORT): DividedDifferenceRule {
  if (points.length === 0) throw new RangeError('dividedDifferenceRule: at least one point is needed');
  const d = points.map((z) => distanceToSegment(z, segment));
  d.forEach((dist, j) => {
    if (!(dist > 0) || !Number.isFinite(dist)) {
      throw new RangeError(`dividedDifferenceRule: point ${j} (${points[j].re}, ${points[j].im}) is on the singular segment or not finite`);
    }
  });
  let tau = LINK_FACTOR;
  for (let attempt = 0; attempt < MAX_RECLUSTERINGS; attempt++, tau /= 2) {
    const clusters = linkClusters(points, d, tau);
    const circles = clusters.map((members) => (members.length > 1 ? clusterCircle(points, members, segment) : null));
    if (circles.some((c) => c !== null && !(c.inner <= RADIUS_RATIO * c.outer))) continue;
    const nodes: Complex[] = [];
    const weights: Complex[] = [];
    clusters.forEach((members, g) => {
      const circle = circles[g];
      if (circle === null) {
        nodes.push(points[members[0]]);
        weights.push(inverseProduct(points[members[0]], points, new Set(members)));
        return;
      }
      const r = circle.outer * Math.max(0.5, Math.sqrt(circle.inner / circle.outer));
      const rho = Math.max(circle.inner / r, r / circle.outer);
      const count = Math.max(8, members.length + 2, Math.ceil(Math.log(Number.EPSILON / 8) / Math.log(rho)));
      for (let j = 0; j < count; j++) {
        const angle = (2 * Math.PI * (j + 0.5)) / count;
        const offset = complex(r * Math.cos(angle), r * Math.sin(angle));
        const zeta = add(circle.center, offset);
        nodes.push(zeta);
        weights.push(scale(mul(offset, inverseProduct(zeta, points, new Set())), 1 / count));
      }
    });
    return { nodes, weights };
  }
  throw new RangeError('dividedDifferenceRule: no admissible clustering (points too close to the singular segment)');
}

/** f[z_1..z_k] by `dividedDifferenceRule`. */
export function dividedDifference(f: (z: Complex) => Complex, points: readonly Complex[], segment: SingularSegment = SEMICIRCLE_SUPPORT): Complex {
  const rule = dividedDifferenceRule(points, segment);
  let sum = complex(0, 0);
  rule.nodes.forEach((zeta, j) => {
    sum = add(sum, mul(rule.weights[j], f(zeta)));
  });
  return sum;
}
