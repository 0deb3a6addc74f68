import { airyHankelDeterminants } from './airy-hankel-determinants.js';
import { type DoubleDouble, dd } from './double-double.js';
import { gaussLegendreDoubleDouble } from './gauss-legendre-double-double.js';

/**
 * The Tracy–Widom distribution functions at an argument t, from det(I ∓ B_t) (airy-hankel-determinants.ts):
 * F1(t) = det(I − B_t), F2(t) = det(I − B_t)·det(I + B_t), and G(t) = (det(I − B_t) + det(I + B_t))/2,
 * with F4(s) = G(√2 s) in Tracy and Widom's 1996 normalisation (mean ≈ −2.3069).
 */
export interface TracyWidomValues {
  readonly f1: DoubleDouble;
  readonly f2: DoubleDouble;
  readonly g: DoubleDouble;
}

export function tracyWidomValues(t: DoubleDouble, nodes: number): TracyWidomValues {
  const { minus, plus } = airyHankelDeterminants(t, nodes);
  return { f1: minus, f2: dd.mul(minus, plus), g: dd.mulNumber(dd.add(minus, plus), 0.5) };
}

/** Panels of the moment integrals; beyond them F (left) or 1 − F (right) is below 1e-35. */
const LEFT_PANELS: readonly (readonly [number, number])[] = [
  [-12, -9],
  [-9, -6],
  [-6, -4],
  [-4, -2],
  [-2, 0],
];
const RIGHT_PANELS: readonly (readonly [number, number])[] = [
  [0, 2],
  [2, 4],
  [4, 7],
  [7, 11],
  [11, 16],
  [16, 22],
];

/** E T, E T², E T³, E T⁴ for T with distribution function F1, F2 and G. */
export interface RawMoments {
  readonly f1: readonly DoubleDouble[];
  readonly f2: readonly DoubleDouble[];
  readonly g: readonly DoubleDouble[];
}

/**
 * The first four raw moments of the laws F1, F2 and G.
 *
 * Method: integration by parts, E T^n = n∫_0^∞ t^{n−1}(1 − F(t)) dt − n∫_{−∞}^0 t^{n−1} F(t) dt, which
 * needs F only (no density). Each integral is a sum of Gauss–Legendre rules with `quadratureNodes`
 * nodes on the panels above (F is entire in t, so the rules converge exponentially); the far tails
 * left out are below 1e-30 (F1(−12) ≈ 2e-36; 1 − F1(22) ≈ e^{−(2/3)·22^{3/2}} ≈ 1e-30 before the factor t³
 * and the decay beyond). Each F comes from the Nyström determinants with `nodes` nodes.
 */
export function tracyWidomRawMoments(nodes: number, quadratureNodes: number): RawMoments {
  const rule = gaussLegendreDoubleDouble(quadratureNodes);
  const zero = (): DoubleDouble[] => [0, 1, 2, 3].map(() => dd.of(0));
  const sums = { f1: zero(), f2: zero(), g: zero() };
  const accumulate = (panels: typeof LEFT_PANELS, side: 'left' | 'right'): void => {
    for (const [a, b] of panels) {
      const half = (b - a) / 2;
      rule.nodes.forEach((x, i) => {
        const t = dd.add(dd.mulNumber(x, half), dd.of((a + b) / 2));
        const weight = dd.mulNumber(rule.weights[i], half);
        const values = tracyWidomValues(t, nodes);
        for (const law of ['f1', 'f2', 'g'] as const) {
          // right: n t^{n−1} (1 − F); left: −n t^{n−1} F
          let integrand = side === 'right' ? dd.sub(dd.of(1), values[law]) : dd.neg(values[law]);
          integrand = dd.mul(integrand, weight);
          for (let n = 1; n <= 4; n++) {
            sums[law][n - 1] = dd.add(sums[law][n - 1], dd.mulNumber(integrand, n));
            integrand = dd.mul(integrand, t);
          }
        }
      });
    }
  };
  accumulate(LEFT_PANELS, 'left');
  accumulate(RIGHT_PANELS, 'right');
  return sums;
}

/** Mean, variance, skewness and excess kurtosis from the first four raw moments, in double-double. */
export function cumulantSummary(raw: readonly DoubleDouble[], scale: DoubleDouble = dd.of(1)) {
  const [m1, m2, m3, m4] = raw;
  const mean = m1;
  const meanSquared = dd.mul(m1, m1);
  const variance = dd.sub(m2, meanSquared);
  // μ3 = m3 − 3 m1 m2 + 2 m1³, μ4 = m4 − 4 m1 m3 + 6 m1² m2 − 3 m1⁴
  const mu3 = dd.add(dd.sub(m3, dd.mulNumber(dd.mul(m1, m2), 3)), dd.mulNumber(dd.mul(meanSquared, m1), 2));
  const mu4 = dd.sub(
    dd.add(dd.sub(m4, dd.mulNumber(dd.mul(m1, m3), 4)), dd.mulNumber(dd.mul(meanSquared, m2), 6)),
    dd.mulNumber(dd.mul(meanSquared, meanSquared), 3),
  );
  const sd = dd.sqrt(variance);
  return {
    mean: dd.div(mean, scale),
    variance: dd.div(variance, dd.mul(scale, scale)),
    skewness: dd.div(mu3, dd.mul(variance, sd)),
    excessKurtosis: dd.sub(dd.div(mu4, dd.mul(variance, variance)), dd.of(3)),
  };
}
