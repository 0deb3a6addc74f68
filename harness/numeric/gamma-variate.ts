import type { RandomStream } from './random-stream.js';

/**
 * One draw from the Gamma(a, 1) law (density x^{a−1} e^{−x}/Γ(a) on x > 0), for any shape a > 0.
 *
 * Method: Marsaglia and Tsang's squeeze-and-reject method. For a ≥ 1, with d = a − 1/3 and
 * c = 1/√(9d): draw x ~ N(0, 1) and v = (1 + cx)³ until v > 0; with u uniform on (0, 1), accept
 * d·v when u < 1 − 0.0331 x⁴ (the squeeze, which takes almost every draw) or when
 * ln u < x²/2 + d(1 − v + ln v); otherwise start again. The acceptance rate is above 95 % for
 * every a ≥ 1 (their Table; from memory). For a < 1 their boost is used: G·U^{1/a} with
 * G ~ Gamma(a + 1, 1) and U uniform on (0, 1) is Gamma(a, 1).
 * The method is exact (a rejection sampler, no approximation); draws use the stream's nextNormal
 * and nextUniform only, so a draw is reproducible from the stream.
 *
 * Reference: G. Marsaglia and W. W. Tsang, "A simple method for generating gamma variables",
 * ACM Trans. Math. Softw. 26(3) (2000) 363–372, doi:10.1145/358407.358414.
 */
export function gammaVariate(stream: RandomStream, shape: number): number {
  if (!(shape > 0) || !Number.isFinite(shape)) throw new RangeError(`gammaVariate: shape must be a finite number > 0, got ${shape}`);
  if (shape < 1) {
    const boosted = marsagliaTsang(stream, shape + 1);
    return boosted * Math.pow(stream.nextUniform(), 1 / shape);
  }
  return marsagliaTsang(stream, shape);
}

function marsagliaTsang(stream: RandomStream, shape: number): number {
  const d = shape - 1 / 3;
  const c = 1 / Math.sqrt(9 * d);
  for (;;) {
    let x = 0;
    let v = 0;
    do {
      x = stream.nextNormal();
      v = 1 + c * x;
    } while (v <= 0);
    v = v * v * v;
    const u = stream.nextUniform();
    const x2 = x * x;
    if (u < 1 - 0.0331 * x2 * x2) return d * v;
    if (Math.log(u) < 0.5 * x2 + d * (1 - v + Math.log(v))) return d * v;
  }
}
