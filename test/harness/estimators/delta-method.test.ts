import { describe, expect, it } from 'vitest';
import { addObservation, emptyCoMoments, type CoMoments } from '../../../harness/estimators/co-moment-accumulator.js';
import { complexDeltaMethodStandardError, deltaMethodStandardError, holomorphicDeltaMethodStandardError } from '../../../harness/estimators/delta-method.js';
import { randomStream } from '../../../harness/numeric/random-stream.js';
import { expectCalibrated, meanAndSpread } from '../../support/streaming-estimator-checks.js';

/** n rows (x, y) with x ~ N(2, 1), y = 4 + 0.3(x − 2) + 0.5 Z: E x = 2, E y = 4. */
function ratioRows(seed: number, index: number, n: number): { readonly state: CoMoments; readonly rows: Float64Array[] } {
  const s = randomStream(seed, 'delta-method-ratio', index);
  const state = emptyCoMoments(2);
  const rows: Float64Array[] = [];
  for (let k = 0; k < n; k++) {
    const x = 2 + s.nextNormal();
    const row = Float64Array.of(x, 4 + 0.3 * (x - 2) + 0.5 * s.nextNormal());
    rows.push(row);
    addObservation(state, row);
  }
  return { state, rows };
}

describe('delta method', () => {
  it('is the sample variance of the linear combination gᵀx over n, exactly', () => {
    const { state, rows } = ratioRows(3, 0, 500);
    const g = [0.7, -1.9];
    const combination = rows.map((r) => g[0] * r[0] + g[1] * r[1]);
    const { spread } = meanAndSpread(combination);
    expect(Math.abs(deltaMethodStandardError(state, g) / (spread / Math.sqrt(500)) - 1)).toBeLessThan(1e-12);
    // g = e₁ is the standard error of the mean of x.
    const { spread: sx } = meanAndSpread(rows.map((r) => r[0]));
    expect(deltaMethodStandardError(state, [1, 0])).toBeCloseTo(sx / Math.sqrt(500), 14);
  });

  it('turns complex partials of a holomorphic θ into the real gradients of Re θ and Im θ', () => {
    // θ = M² for one complex feature M = a + ib: Re θ = a² − b² (gradient 2a, −2b), Im θ = 2ab
    // (gradient 2b, 2a); ∂θ/∂M = 2M.
    const s = randomStream(3, 'delta-method-holomorphic', 0);
    const state = emptyCoMoments(2);
    for (let k = 0; k < 300; k++) addObservation(state, [1.5 + s.nextNormal(), -0.5 + 0.7 * s.nextNormal()]);
    const [a, b] = state.mean;
    const byHand = complexDeltaMethodStandardError(state, [2 * a, -2 * b], [2 * b, 2 * a]);
    const holomorphic = holomorphicDeltaMethodStandardError(state, Float64Array.of(2 * a, 2 * b));
    expect(holomorphic.re).toBeCloseTo(byHand.re, 15);
    expect(holomorphic.im).toBeCloseTo(byHand.im, 15);
    expect(byHand.re).toBeGreaterThan(0);
  });

  it('is calibrated for the ratio of means x̄/ȳ: z-scores over 200 replications have spread ≈ 1', () => {
    // θ = E x / E y = 1/2; gradient (1/ȳ, −x̄/ȳ²). The ratio's bias is O(1/n), far below its SE.
    const z: number[] = [];
    for (let r = 0; r < 200; r++) {
      const { state } = ratioRows(5, r, 400);
      const [x, y] = state.mean;
      z.push((x / y - 0.5) / deltaMethodStandardError(state, [1 / y, -x / (y * y)]));
    }
    expectCalibrated(z);
  });

  it('rejects a gradient of the wrong length and a state of fewer than two samples', () => {
    const { state } = ratioRows(3, 1, 10);
    expect(() => deltaMethodStandardError(state, [1])).toThrow(RangeError);
    expect(() => deltaMethodStandardError(emptyCoMoments(2), [1, 0])).toThrow(RangeError);
    expect(() => holomorphicDeltaMethodStandardError(state, new Float64Array(4))).toThrow(RangeError);
  });
});
