import { describe, expect, it } from 'vitest';
import { type Complex, ONE, abs, add, complex, div, exp, mul, sub } from '../../harness/numeric/complex.js';
import { dividedDifference, dividedDifferenceRule } from '../../reference-values/divided-difference.js';
import { stieltjesSemicircle, stieltjesSemicircleDerivative } from '../../reference-values/semicircle-law.js';
import { expectClose } from './fluctuation-estimates.js';

/** Comparison relative to |expected|. */
function expectRelative(label: string, observed: Complex, expected: Complex, relative: number): void {
  expectClose(label, observed, expected, relative * Math.max(abs(expected), 1e-300));
}

/** 1/Π_j (x0 − z_j): the divided difference over the z_j of ζ ↦ 1/(x0 − ζ) (partial fractions; exact). */
function inverseProduct(x0: number, points: readonly Complex[]): Complex {
  let p = ONE;
  for (const z of points) p = mul(p, complex(x0 - z.re, -z.im));
  return div(ONE, p);
}

const upper = (re: number, im: number): Complex => complex(re, im);

describe('dividedDifference (Hermite contour form, trapezoid rule; Trefethen and Weideman 2014)', () => {
  // Configurations: distinct, coincident (up to four-fold), nearly coincident, both half-planes,
  // a row of points close to the segment, real points outside [−2, 2].
  const configurations: ReadonlyArray<[string, Complex[]]> = [
    ['one point', [upper(0.3, 0.2)]],
    ['two distinct', [upper(0.3, 0.2), upper(-1, 0.5)]],
    ['double point', [upper(0.3, 0.2), upper(0.3, 0.2)]],
    ['four-fold point', [upper(-0.7, 0.1), upper(-0.7, 0.1), upper(-0.7, 0.1), upper(-0.7, 0.1)]],
    ['nearly coincident (1e-9 apart)', [upper(0.3, 0.2), upper(0.3 + 1e-9, 0.2)]],
    ['conjugate pair', [upper(0.3, 0.2), upper(0.3, -0.2)]],
    ['double point and its conjugate', [upper(1, 0.05), upper(1, 0.05), upper(1, -0.05)]],
    ['row of six at height 0.05', [0, 1, 2, 3, 4, 5].map((j) => upper(-0.5 + 0.04 * j, 0.05))],
    ['cluster and singleton', [upper(0.2, 0.3), upper(0.21, 0.31), upper(0.2, 0.29), upper(-1.5, -0.4)]],
    ['real points beyond the edge', [complex(2.5, 0), complex(2.5001, 0), complex(-3, 0)]],
  ];

  it('reproduces 1/Π(x0 − z_j) for f(ζ) = 1/(x0 − ζ), x0 ∈ [−2, 2] (partial fractions), within the rule\'s rounding bound', () => {
    // f is analytic off x0 ∈ [−2, 2], so the default singular segment applies. The trapezoid error is
    // below ε by construction, so what remains is rounding in Σ w_j f(ζ_j): at most about
    // (k + 2)ε·Σ|w_j f(ζ_j)| (summation bound, Higham 2002, §4.2), here allowed 64ε·Σ|w_j f(ζ_j)|,
    // plus 1e-13 relative for the nodes' own rounding. The rule is built for functions singular
    // along the whole segment (circles of radius ≥ D/2, D the distance to the segment); for this f,
    // smooth on the larger scale |x0 − z|, Σ|w_j f(ζ_j)| exceeds the result by up to
    // (|x0 − z|/D)^{k−1}, and so does the rounding error (up to about 1e-9 relative for the row of six).
    for (const [label, points] of configurations) {
      const rule = dividedDifferenceRule(points);
      for (const x0 of [-1.9, -0.4, 0, 0.55, 2]) {
        const f = (zeta: Complex): Complex => div(ONE, complex(x0 - zeta.re, -zeta.im));
        let size = 0;
        rule.nodes.forEach((zeta, j) => (size += abs(mul(rule.weights[j], f(zeta)))));
        const expected = inverseProduct(x0, points);
        const observed = dividedDifference(f, points);
        const tolerance = 64 * Number.EPSILON * size + 1e-13 * abs(expected);
        const diff = abs(sub(observed, expected));
        if (!(diff <= tolerance)) expect.fail(`${label}, x0 = ${x0}: observed ${observed.re}+${observed.im}i, expected ${expected.re}+${expected.im}i, |diff| ${diff} > ${tolerance}`);
      }
    }
  });

  it('gives f^{(k−1)}(z)/(k−1)! at coincident points (e^ζ, with a custom segment) and m′ for the Stieltjes transform', () => {
    const z = complex(0.4, -0.3);
    const segment = { lo: -10, hi: -9 }; // e^ζ is entire: any segment away from the points will do
    let factorial = 1;
    for (let k = 1; k <= 5; k++) {
      factorial *= k > 1 ? k - 1 : 1;
      const expected = div(exp(z), complex(factorial, 0));
      expectRelative(`e^ζ, ${k}-fold`, dividedDifference(exp, new Array(k).fill(z), segment), expected, 1e-12);
    }
    for (const w of [complex(0.3, 0.1), complex(-1.5, -0.02), complex(3, 0)]) {
      expectRelative(`m at ${w.re}+${w.im}i doubled`, dividedDifference(stieltjesSemicircle, [w, w]), stieltjesSemicircleDerivative(w), 1e-10);
    }
  });

  it('is the Stieltjes-transform identity m[z1, z2] = m1m2/(1 − m1m2) for distinct points', () => {
    for (const [z1, z2] of [
      [complex(0.3, 0.2), complex(-1, 0.5)],
      [complex(0.3, 0.2), complex(0.3, -0.2)],
      [complex(1.9, 0.01), complex(1.95, -0.01)],
    ]) {
      const m1 = stieltjesSemicircle(z1);
      const m2 = stieltjesSemicircle(z2);
      const p = mul(m1, m2);
      expectRelative(`${z1.re}+${z1.im}i, ${z2.re}+${z2.im}i`, dividedDifference(stieltjesSemicircle, [z1, z2]), div(p, sub(ONE, p)), 1e-10);
    }
  });

  it('is linear in f and uses few nodes; rejects points on the segment and empty input', () => {
    const points = [complex(0.3, 0.2), complex(0.3, 0.2), complex(-1, -0.5)];
    const f = (z: Complex): Complex => stieltjesSemicircle(z);
    const g = (z: Complex): Complex => mul(z, z);
    const sum = dividedDifference((z) => add(f(z), g(z)), points);
    expectRelative('linearity', sum, add(dividedDifference(f, points), dividedDifference(g, points)), 1e-13);
    expect(dividedDifferenceRule(points).nodes.length).toBeLessThanOrEqual(200);
    expect(() => dividedDifferenceRule([complex(0.5, 0)])).toThrow(RangeError);
    expect(() => dividedDifferenceRule([])).toThrow(RangeError);
  });
});
