import fc from 'fast-check';
import { formatComplex, type Complex } from '../../harness/numeric/complex.js';

/**
 * Spectral parameters z for the exact identities, in both half-planes:
 * - near the spectrum: Re z in [−2.5, 2.5] (the semicircle's support [−2, 2] and a margin),
 *   |Im z| = 10^t with t in [−3, 0], so down to 10⁻³, where G(z) is large and its conditioning
 *   (1/dist(z, spectrum)²) is poor;
 * - far from it: Re z in [−8, 8], |Im z| = 10^t with t in [0, 1].
 * Re z and t are drawn uniformly on a grid of step 10⁻³ (integers scaled by 10⁻³: fast-check's
 * floating-point arbitrary favours tiny and extreme magnitudes, which are not what is wanted here);
 * shrinking moves Re z towards 0 and t towards 0 (|Im z| = 1), so a counterexample reads simply.
 * Im z is never 0: G(z) exists for every Hermitian H only off the real axis.
 */
export function spectralPointArbitrary(): fc.Arbitrary<Complex> {
  const point = (reMax: number, tMin: number, tMax: number) =>
    fc
      .record({
        re: milliGrid(-reMax, reMax),
        t: milliGrid(tMin, tMax),
        below: fc.boolean(),
      })
      .map(({ re, t, below }): Complex => ({ re: re + 0, im: (below ? -1 : 1) * 10 ** t }));
  return fc.oneof({ arbitrary: point(2.5, -3, 0), weight: 3 }, { arbitrary: point(8, 0, 1), weight: 1 });
}

/**
 * Pairs (z1, z2): half the time independent points, half the time a near-degenerate pair
 * z2 = z1 + r|Im z1|e^{iθ} with r = 10^s, s in [−9, −0.31] (step 10⁻³; so r < 1/2 and z2 stays
 * in z1's half-plane, |Im z2| > |Im z1|/2) and θ a whole number of degrees. Near pairs test identities whose two sides cancel, such as the
 * difference quotient of the resolvent identity.
 */
export function spectralPairArbitrary(): fc.Arbitrary<readonly [Complex, Complex]> {
  const independent = fc.tuple(spectralPointArbitrary(), spectralPointArbitrary());
  const near = fc
    .record({
      z1: spectralPointArbitrary(),
      s: milliGrid(-9, -0.31),
      degrees: fc.integer({ min: 0, max: 359 }),
    })
    .map(({ z1, s, degrees }): readonly [Complex, Complex] => {
      const r = 10 ** s * Math.abs(z1.im);
      const theta = (degrees * Math.PI) / 180;
      return [z1, { re: z1.re + r * Math.cos(theta), im: z1.im + r * Math.sin(theta) }];
    })
    .filter(([z1, z2]) => z1.re !== z2.re || z1.im !== z2.im);
  return fc.oneof(independent, near);
}

/** Numbers k/1000 for integers k with min ≤ k/1000 ≤ max; shrinks towards the one nearest 0. */
export function milliGrid(min: number, max: number): fc.Arbitrary<number> {
  return fc.integer({ min: Math.ceil(min * 1000), max: Math.floor(max * 1000) }).map((k) => k / 1000);
}

export function describePoints(points: readonly Complex[]): string {
  return points.map(formatComplex).join(', ');
}
