import { describe, expect, it } from 'vitest';
// @ts-expect-error: a plain JavaScript example module without type declarations.
import { seededNormals, splitMix64 } from '../../examples/node-process/seeded-normals.mjs';

describe('examples/node-process/seeded-normals.mjs', () => {
  it('seeds with SplitMix64, whose first outputs from seed 0 are the published ones', () => {
    // S. Vigna's reference splitmix64.c from seed 0: 0xe220a8397b1dcdaf, 0x6e789e6aa1b965f4.
    const outputs = splitMix64(0) as Generator<bigint>;
    expect(outputs.next().value).toBe(0xe220a8397b1dcdafn);
    expect(outputs.next().value).toBe(0x6e789e6aa1b965f4n);
  });

  it('draws standard normals: mean 0, variance 1, fourth moment 3 within 5 standard errors', () => {
    const random = seededNormals(2024) as { normal(): number };
    const count = 50_000;
    const draws = Array.from({ length: count }, () => random.normal());
    // Standard errors from the normal law's own moments: Var x = 1, Var x² = 2, Var x⁴ = 105 − 9 = 96.
    const mean = (f: (x: number) => number) => draws.reduce((s, x) => s + f(x), 0) / count;
    expect(Math.abs(mean((x) => x))).toBeLessThanOrEqual(5 * Math.sqrt(1 / count));
    expect(Math.abs(mean((x) => x * x) - 1)).toBeLessThanOrEqual(5 * Math.sqrt(2 / count));
    expect(Math.abs(mean((x) => x ** 4) - 3)).toBeLessThanOrEqual(5 * Math.sqrt(96 / count));
  });
});
