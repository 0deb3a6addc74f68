import { Decimal } from 'decimal.js';
import { describe, expect, it } from 'vitest';
import { type Complex, abs, complex, div, mul, sub } from '../../harness/numeric/complex.js';
import { builtInTable } from '../../reference-values/reference-table-catalog.js';
import { logRelativeError } from '../../reference-values/log-relative-error.js';
import { stieltjesSemicircle, stieltjesSemicircleDerivative } from '../../reference-values/semicircle-law.js';
import { pythonHas, runPython } from './python-reference.js';

const stieltjes = builtInTable('semicircle-stieltjes');
const tracial = builtInTable('resolvent-covariance-tracial');
const traceless = builtInTable('resolvent-covariance-traceless');

type Row = readonly (number | string)[];
const cell = (row: Row, j: number): number => Number(row[j]);
const complexAt = (row: Row, j: number): Complex => complex(cell(row, j), cell(row, j + 1));

/** Digits of agreement of two complex numbers, relative to |certified| (LRE of the modulus of the difference). */
function complexLre(computed: Complex, certified: Complex, cap = 15): number {
  const size = abs(certified);
  return logRelativeError(size + abs(sub(computed, certified)), size, cap);
}

/** |a − b|/|b| for decimal strings, in decimal arithmetic: for comparisons beyond double precision. */
function decimalRelativeDifference(a: string, b: string): number {
  const D = Decimal.clone({ precision: 40 });
  const y = new D(b);
  return y.isZero() ? new D(a).abs().toNumber() : new D(a).minus(y).abs().div(y.abs()).toNumber();
}

/**
 * m(z) and m′(z) by quadrature of the definition, with no branch to choose: with x = 2cos θ,
 * ∫ρ(x) g(x) dx = (2/π)∫_0^π sin²θ g(2cos θ) dθ; the integrand is smooth and 2π-periodic, so the
 * trapezoid rule converges geometrically (Trefethen and Weideman 2014, SIAM Rev. 56) at a rate set
 * by the distance a of the pole from the real θ axis, a ≥ Im z/2 here: 2^k ≥ 100/Im z nodes make the
 * error below e^{−50}.
 */
function stieltjesByQuadrature(z: Complex): { m: Complex; derivative: Complex } {
  let nodes = 1 << 10;
  while (nodes < 100 / z.im) nodes *= 2;
  let [mRe, mIm, dRe, dIm] = [0, 0, 0, 0];
  for (let j = 1; j < nodes; j++) {
    const theta = (Math.PI * j) / nodes;
    const weight = Math.sin(theta) ** 2;
    // r = 1/(2cos θ − z), then r and r² weighted
    const a = 2 * Math.cos(theta) - z.re;
    const b = -z.im;
    const norm = a * a + b * b;
    const rRe = a / norm;
    const rIm = -b / norm;
    mRe += weight * rRe;
    mIm += weight * rIm;
    dRe += weight * (rRe * rRe - rIm * rIm);
    dIm += weight * 2 * rRe * rIm;
  }
  const scale = 2 / nodes; // (2/π)·(π/nodes); the end points have sin θ = 0
  return { m: complex(mRe * scale, mIm * scale), derivative: complex(dRe * scale, dIm * scale) };
}

describe('semicircle-stieltjes (m and m′ to 20 digits, certified to 15)', () => {
  it('agrees with quadrature of ∫ρ(x)/(x − z) dx and ∫ρ(x)/(x − z)² dx (no branch chosen) to 12 and 10 digits', () => {
    // The sums hold terms up to 1/Im z (1/Im z² for m′) that cancel to O(1): rounding costs the
    // quadrature about log10(1/Im z) digits for m′ at Im z = 10⁻³, not the table.
    for (const row of stieltjes.table.rows) {
      const z = complex(cell(row, 0), cell(row, 1));
      const q = stieltjesByQuadrature(z);
      expect(complexLre(q.m, complexAt(row, 2)), `m(${z.re}+${z.im}i)`).toBeGreaterThanOrEqual(12);
      expect(complexLre(q.derivative, complexAt(row, 4)), `m′(${z.re}+${z.im}i)`).toBeGreaterThanOrEqual(10);
    }
  });

  it('agrees with the double-precision closed form of semicircle-law.ts to 14 digits (LRE, NIST StRD convention)', () => {
    for (const row of stieltjes.table.rows) {
      const z = complex(cell(row, 0), cell(row, 1));
      expect(complexLre(stieltjesSemicircle(z), complexAt(row, 2)), `m(${z.re}+${z.im}i)`).toBeGreaterThanOrEqual(14);
      expect(complexLre(stieltjesSemicircleDerivative(z), complexAt(row, 4)), `m′(${z.re}+${z.im}i)`).toBeGreaterThanOrEqual(12);
    }
  });

  it.skipIf(!pythonHas('numpy'))('agrees with numpy\u2019s complex square roots in double precision (skipped without numpy)', () => {
    const points = stieltjes.table.rows.map((row) => [cell(row, 0), cell(row, 1)]);
    const values = runPython<number[][]>([
      'import json, numpy as np',
      `z = np.array([complex(a, b) for a, b in ${JSON.stringify(points)}])`,
      'm = -2 / (z + np.sqrt(z - 2) * np.sqrt(z + 2))',
      'd = m**2 / (1 - m**2)',
      'print(json.dumps([[v.real, v.imag, w.real, w.imag] for v, w in zip(m, d)]))',
    ]);
    stieltjes.table.rows.forEach((row, i) => {
      expect(complexLre(complex(values[i][0], values[i][1]), complexAt(row, 2))).toBeGreaterThanOrEqual(14);
      expect(complexLre(complex(values[i][2], values[i][3]), complexAt(row, 4))).toBeGreaterThanOrEqual(12);
    });
  });

  it.skipIf(!pythonHas('mpmath'))('agrees with mpmath at 40 digits in every printed digit (skipped without mpmath)', () => {
    const points = stieltjes.table.rows.map((row) => [String(row[0]), String(row[1])]);
    const values = runPython<string[][]>([
      'import json, mpmath as mp',
      'mp.mp.dps = 40',
      'out = []',
      `for a, b in ${JSON.stringify(points)}:`,
      '    z = mp.mpc(a, b)',
      '    m = -2 / (z + mp.sqrt(z - 2) * mp.sqrt(z + 2))',
      '    d = m**2 / (1 - m**2)',
      '    out.append([mp.nstr(v, 30) for v in (m.real, m.imag, d.real, d.imag)])',
      'print(json.dumps(out))',
    ]);
    stieltjes.table.rows.forEach((row, i) => {
      for (let j = 0; j < 4; j++) expect(decimalRelativeDifference(String(row[2 + j]), values[i][j]), `row ${i}, column ${j + 2}`).toBeLessThan(1e-19);
    });
  });
});

describe('resolvent-covariance-tracial and -traceless (the kernels of THEORY.md, by term)', () => {
  const terms = (z1: Complex, z2: Complex) => {
    const [m1, m2] = [stieltjesSemicircle(z1), stieltjesSemicircle(z2)];
    const [d1, d2] = [stieltjesSemicircleDerivative(z1), stieltjesSemicircleDerivative(z2)];
    const p = mul(m1, m2);
    const gap = sub(complex(1, 0), p);
    const dd = mul(d1, d2);
    return {
      tracial: [div(dd, mul(gap, gap)), dd, mul(mul(dd, p), complex(2, 0))],
      traceless: [div(mul(p, p), gap), mul(p, p), mul(mul(p, p), p)],
    };
  };

  it('agree with a double-precision evaluation from semicircle-law.ts to 11 digits (LRE)', () => {
    for (const [table, kind] of [
      [tracial, 'tracial'],
      [traceless, 'traceless'],
    ] as const) {
      for (const row of table.table.rows) {
        const ours = terms(complex(cell(row, 0), cell(row, 1)), complex(cell(row, 2), cell(row, 3)))[kind];
        ours.forEach((v, t) => expect(complexLre(v, complexAt(row, 4 + 2 * t)), `${kind} term ${t} at ${row.slice(0, 4).join(', ')}`).toBeGreaterThanOrEqual(11));
      }
    }
  });

  it('has the pairing term of the tracial kernel equal to ∂z1∂z2[−log(1 − m1m2)] (THEORY.md; Khorunzhy, Khoruzhenko and Pastur 1996), by finite differences', () => {
    const h = 1e-3;
    const potential = (z1: Complex, z2: Complex): Complex => {
      const g = sub(complex(1, 0), mul(stieltjesSemicircle(z1), stieltjesSemicircle(z2)));
      return complex(-Math.log(abs(g)), -Math.atan2(g.im, g.re));
    };
    for (const row of tracial.table.rows) {
      const [z1, z2] = [complex(cell(row, 0), cell(row, 1)), complex(cell(row, 2), cell(row, 3))];
      if (z1.re === z2.re && z1.im === z2.im) continue; // a mixed difference needs two variables
      const at = (a: number, b: number) => potential(complex(z1.re + a, z1.im), complex(z2.re + b, z2.im));
      // Central mixed difference [f(+,+) − f(+,−) − f(−,+) + f(−,−)]/(4h²), error O(h²).
      const [pp, pm, mp, mm] = [at(h, h), at(h, -h), at(-h, h), at(-h, -h)];
      const mixed = complex((pp.re - pm.re - mp.re + mm.re) / (4 * h * h), (pp.im - pm.im - mp.im + mm.im) / (4 * h * h));
      expect(complexLre(mixed, complexAt(row, 4)), `z1 = ${z1.re}+${z1.im}i, z2 = ${z2.re}+${z2.im}i`).toBeGreaterThanOrEqual(4);
    }
  });

  it('has the traceless pairing term m1²m2²/(1 − m1m2) = m1m2 (m1 − m2)/(z1 − z2) (THEORY.md, the divided difference)', () => {
    for (const row of traceless.table.rows) {
      const [z1, z2] = [complex(cell(row, 0), cell(row, 1)), complex(cell(row, 2), cell(row, 3))];
      if (z1.re === z2.re && z1.im === z2.im) continue;
      const [m1, m2] = [stieltjesSemicircle(z1), stieltjesSemicircle(z2)];
      const divided = mul(mul(m1, m2), div(sub(m1, m2), sub(z1, z2)));
      expect(complexLre(divided, complexAt(row, 4))).toBeGreaterThanOrEqual(11);
    }
  });

  it.skipIf(!pythonHas('mpmath'))('agree with mpmath at 40 digits in every printed digit (skipped without mpmath)', () => {
    const pairs = tracial.table.rows.map((row) => row.slice(0, 4).map(String));
    const values = runPython<string[][]>([
      'import json, mpmath as mp',
      'mp.mp.dps = 40',
      'def m(z):',
      '    return -2 / (z + mp.sqrt(z - 2) * mp.sqrt(z + 2))',
      'out = []',
      `for a, b, c, d in ${JSON.stringify(pairs)}:`,
      '    m1, m2 = m(mp.mpc(a, b)), m(mp.mpc(c, d))',
      '    d1, d2 = m1**2 / (1 - m1**2), m2**2 / (1 - m2**2)',
      '    p = m1 * m2',
      '    terms = [d1*d2/(1-p)**2, d1*d2, 2*d1*d2*p, p**2/(1-p), p**2, p**3]',
      '    out.append([mp.nstr(x, 30) for t in terms for x in (t.real, t.imag)])',
      'print(json.dumps(out))',
    ]);
    tracial.table.rows.forEach((row, i) => {
      const all = [...row.slice(4), ...traceless.table.rows[i].slice(4)].map(String);
      all.forEach((text, j) => {
        const scale = Math.max(Math.abs(Number(values[i][j - (j % 2)])), Math.abs(Number(values[i][j - (j % 2) + 1])));
        // Relative to the modulus of the complex term: a part that is zero up to rounding has no relative digits.
        expect(Math.abs(Number(new Decimal(text).minus(values[i][j]))) / scale, `pair ${i}, value ${j}`).toBeLessThan(1e-19);
      });
    });
  });
});
