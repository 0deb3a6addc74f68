import { Decimal } from 'decimal.js';
import { describe, expect, it } from 'vitest';
import { airyDoubleDouble } from '../../reference-values/high-precision/airy-double-double.js';
import { airyAiTable } from '../../reference-values/high-precision/airy-taylor-table.js';
import { decimalDoubleDouble } from '../../reference-values/high-precision/decimal-double-double.js';
import { type DoubleDouble, dd } from '../../reference-values/high-precision/double-double.js';
import { expDoubleDouble } from '../../reference-values/high-precision/exp-double-double.js';
import { gammaDecimal } from '../../reference-values/high-precision/gamma-decimal.js';
import { gaussLegendreDoubleDouble } from '../../reference-values/high-precision/gauss-legendre-double-double.js';
import { positiveDefiniteDeterminant } from '../../reference-values/high-precision/positive-definite-determinant.js';
import { pythonHas, runPython } from './python-reference.js';

const D = Decimal.clone({ precision: 60 });
const exact = (x: DoubleDouble): Decimal => decimalDoubleDouble.toDecimal(x);
const relative = (x: DoubleDouble, reference: Decimal.Value): number => {
  const r = new D(reference);
  return new D(exact(x)).minus(r).abs().div(r.abs()).toNumber();
};

/** A fixed linear congruential sequence of doubles in (−8, 8), for reproducible operands. */
function operands(count: number): number[] {
  let state = 987654321;
  return Array.from({ length: count }, () => {
    state = (state * 1103515245 + 12345) % 2 ** 31;
    return (state / 2 ** 31 - 0.5) * 16 + 1e-3;
  });
}

describe('double-double arithmetic (Dekker 1971; Hida, Li and Bailey 2001), checked in 60-digit decimal arithmetic', () => {
  it('adds, multiplies, divides and takes square roots to about 1e-31 relative', () => {
    const xs = operands(400);
    for (let i = 0; i + 3 < xs.length; i += 4) {
      const a = dd.div(dd.of(xs[i]), dd.of(3)); // a genuine double-double (1/3 is inexact)
      const b = dd.add(dd.of(xs[i + 1]), dd.of(xs[i + 2] * 1e-17));
      const [A, B] = [exact(a), exact(b)];
      expect(relative(dd.add(a, b), A.plus(B))).toBeLessThan(1e-30 * Math.max(1, A.abs().plus(B.abs()).div(A.plus(B).abs()).toNumber()));
      expect(relative(dd.mul(a, b), A.times(B))).toBeLessThan(4e-32);
      expect(relative(dd.div(a, b), A.div(B))).toBeLessThan(1e-31);
      expect(relative(dd.sqrt(dd.mul(a, a)), A.abs())).toBeLessThan(1e-31);
      expect(relative(dd.divNumber(a, xs[i + 3]), A.div(exact(dd.of(xs[i + 3]))))).toBeLessThan(1e-31);
    }
  });

  it('round-trips through decimal.js', () => {
    const third = new D(1).div(3);
    expect(relative(decimalDoubleDouble.fromDecimal(third), third)).toBeLessThan(1e-32);
  });

  it('computes e^x to a few 1e-30 relative for |x| ≤ 120 (against decimal.js exp)', () => {
    for (const x of [-120, -42.5, -1, -1e-5, 0, 0.3, 1, 10, 77.7]) {
      const value = dd.div(dd.of(x * 3), dd.of(3));
      expect(relative(expDoubleDouble(value), new D(exact(value)).exp()), `e^${x}`).toBeLessThan(4e-30);
    }
  });
});

describe('Γ in decimal arithmetic (Stirling series, DLMF 5.11.1)', () => {
  it('satisfies Γ(n) = (n − 1)!, Γ(1/2)² = π and the reflection Γ(1/3)Γ(2/3) = 2π/√3 to 43 digits', () => {
    const G = Decimal.clone({ precision: 50 });
    expect(gammaDecimal(G, 6).minus(120).abs().toNumber()).toBeLessThan(1e-43);
    expect(gammaDecimal(G, 0.5).pow(2).minus(G.acos(-1)).abs().toNumber()).toBeLessThan(1e-43);
    const reflection = gammaDecimal(G, new G(1).div(3)).times(gammaDecimal(G, new G(2).div(3)));
    expect(reflection.minus(G.acos(-1).times(2).div(new G(3).sqrt())).abs().toNumber()).toBeLessThan(1e-43);
    // Γ(1/3) = 2.678938534707747633… (value from memory), here to 19 digits.
    expect(gammaDecimal(G, new G(1).div(3)).toSignificantDigits(19).toString()).toBe('2.678938534707747634');
  });
});

describe('the Airy function in double-double', () => {
  it('has Ai(0) = 0.3550280538878172392… and Ai′(0) = −0.2588194037928067984… (DLMF 9.2.3, 9.2.4; 19 digits, from memory)', () => {
    const { ai, derivative } = airyDoubleDouble(dd.of(0));
    expect(exact(ai).toSignificantDigits(19).toString()).toBe('0.3550280538878172393');
    expect(exact(derivative).toSignificantDigits(19).toString()).toBe('-0.2588194037928067984');
  });

  it('gives through its Taylor table (built from Ai, Ai′ and y″ = xy) the values of the direct evaluation, between grid points', () => {
    // The table's polynomial about a grid point must reproduce the direct evaluation between grid points.
    for (const x of [-15.97, -9.31, -3.3, -0.07, 0.61, 4.44, 8.9, 9.2, 13.1, 27.03, 39.9]) {
      const direct = airyDoubleDouble(dd.of(x)).ai;
      const viaTable = airyAiTable(dd.of(x));
      const scale = Math.max(Math.abs(direct.hi), 1e-300);
      expect(Math.abs(exact(dd.sub(direct, viaTable)).toNumber()) / scale, `x = ${x}`).toBeLessThan(x < -12 ? 1e-13 : 1e-15);
    }
  });

  it.skipIf(!pythonHas('mpmath'))('agrees with mpmath.airyai at 40 digits: 1e-28 relative on [−3, 3] and beyond 16, 1e-24 absolute elsewhere (the error bounds stated in airy-double-double.ts) (skipped without mpmath)', () => {
    const xs = [-10, -7.5, -5, -2.2, -1, 0, 0.5, 1.7, 3, 5, 6.5, 8, 9, 9.2, 10, 12, 16, 22, 30, 41];
    const theirs = runPython<string[][]>([
      'import json, mpmath as mp',
      'mp.mp.dps = 40',
      `print(json.dumps([[mp.nstr(mp.airyai(x), 35), mp.nstr(mp.airyai(x, 1), 35)] for x in ${JSON.stringify(xs)}]))`,
    ]);
    xs.forEach((x, i) => {
      const ours = airyDoubleDouble(dd.of(x));
      for (const [value, reference, name] of [
        [ours.ai, theirs[i][0], 'Ai'],
        [ours.derivative, theirs[i][1], 'Ai′'],
      ] as const) {
        const error = new D(exact(value)).minus(reference).abs();
        const relativeError = error.div(new D(reference).abs()).toNumber();
        if (Math.abs(x) <= 3) expect(relativeError, `${name}(${x})`).toBeLessThan(1e-28);
        if (x >= 16) expect(relativeError, `${name}(${x})`).toBeLessThan(1e-28);
        expect(error.toNumber(), `${name}(${x})`).toBeLessThan(1e-24);
      }
    });
  });
});

describe('Gauss–Legendre rules and the LDLᵀ determinant in double-double', () => {
  it('integrates x^{2j} over [−1, 1] exactly (2/(2j + 1)) up to degree 2m − 1, to a few 1e-31', () => {
    for (const m of [20, 64]) {
      const { nodes, weights } = gaussLegendreDoubleDouble(m);
      for (let j = 0; 2 * j <= 2 * m - 1; j += 5) {
        let sum = dd.of(0);
        nodes.forEach((x, i) => {
          let power = dd.of(1);
          for (let p = 0; p < 2 * j; p++) power = dd.mul(power, x);
          sum = dd.add(sum, dd.mul(weights[i], power));
        });
        expect(relative(sum, new D(2).div(2 * j + 1)), `m = ${m}, x^${2 * j}`).toBeLessThan(4e-30);
      }
    }
  });

  it('gives the determinant of a symmetric positive definite integer matrix to 1e-30 relative (exact value by Bareiss elimination in BigInt), and refuses an indefinite one', () => {
    const m = 7;
    // Symmetric integer entries with a dominant diagonal: positive definite, and no Bareiss pivot is zero.
    const entry = (i: number, j: number): number => (i === j ? 40 : (((Math.min(i, j) * 7 + Math.max(i, j) * 11) % 19) - 9));
    const entries = Array.from({ length: m * m }, (_, k) => entry(Math.floor(k / m), k % m));
    // Bareiss: fraction-free elimination, every division exact in integers.
    const a = entries.map(BigInt);
    let previous = 1n;
    for (let k = 0; k < m - 1; k++) {
      for (let i = k + 1; i < m; i++) {
        for (let j = k + 1; j < m; j++) a[i * m + j] = (a[i * m + j] * a[k * m + k] - a[i * m + k] * a[k * m + j]) / previous;
      }
      previous = a[k * m + k];
    }
    const determinant = a[m * m - 1];
    expect(relative(positiveDefiniteDeterminant(Float64Array.from(entries), new Float64Array(m * m), m), determinant.toString())).toBeLessThan(1e-30);
    expect(() => positiveDefiniteDeterminant(Float64Array.from([1, 2, 2, 1]), new Float64Array(4), 2)).toThrow(/not positive definite/);
  });
});
