import { describe, expect, it } from 'vitest';
import { type Complex, abs, add, complex, div, mul, scale, sqrt, sub } from '../../harness/numeric/complex.js';
import {
  catalanNumber,
  semicircleCdf,
  semicircleDensity,
  semicircleEvenMoment,
  semicircleMoment,
  stieltjesSemicircle,
  stieltjesSemicircleDerivative,
} from '../../reference-values/semicircle-law.js';

const EPS = Number.EPSILON;

/** Fails with input, observed, expected, difference and tolerance (stdlib-style message). */
function expectNear(label: string, observed: number, expected: number, tolerance: number): void {
  const diff = Math.abs(observed - expected);
  if (!(diff <= tolerance)) {
    expect.fail(`${label}: observed ${observed}, expected ${expected}, |diff| ${diff} > tolerance ${tolerance}`);
  }
}

function expectComplexNear(label: string, observed: Complex, expected: Complex, tolerance: number): void {
  const diff = abs(sub(observed, expected));
  if (!(diff <= tolerance)) {
    expect.fail(
      `${label}: observed ${observed.re}${observed.im >= 0 ? '+' : ''}${observed.im}i, expected ${expected.re}${expected.im >= 0 ? '+' : ''}${expected.im}i, |diff| ${diff} > tolerance ${tolerance}`,
    );
  }
}

/**
 * Independent quadrature of ∫ρ(x)/(x − z)dx: with x = 2cos θ, ρ dx = (2/π) sin²θ dθ, and the
 * integrand is even and 2π-periodic, so the n-point trapezoid rule over [0, 2π] converges
 * geometrically, like e^{−n·δ}, δ the distance of the pole 2cos θ = z from the real θ axis
 * (Trefethen and Weideman 2014, SIAM Review 56, Theorem 3.2; theorem number from memory).
 */
function stieltjesByQuadrature(z: Complex, n: number): Complex {
  let sum = complex(0, 0);
  for (let j = 0; j < n; j++) {
    const theta = (2 * Math.PI * j) / n;
    const s = Math.sin(theta);
    sum = add(sum, div(complex(s * s, 0), complex(2 * Math.cos(theta) - z.re, -z.im)));
  }
  return scale(sum, 2 / n);
}

/** Points where a naive branch choice goes wrong: both half-planes, near the cut, near ±2, far away. */
const TEST_POINTS: readonly Complex[] = [
  complex(0, 1),
  complex(0, -1),
  complex(-1, 3),
  complex(-1, -3),
  complex(1, 3),
  complex(-3, 0.1),
  complex(-3, -0.1),
  complex(3, 0.1),
  complex(0.5, 0.05),
  complex(0.5, -0.05),
  complex(-1.7, 0.05),
  complex(1.99, 0.05),
  complex(-2.01, 0.05),
  complex(2.2, -0.3),
  complex(-5, 0.5),
  complex(0.3, 10),
  complex(-40, -7),
];

describe('semicircleDensity', () => {
  it('is √(4 − x²)/(2π) inside, 0 outside and at the edges', () => {
    expectNear('ρ(0)', semicircleDensity(0), 1 / Math.PI, 2 * EPS);
    expectNear('ρ(1)', semicircleDensity(1), Math.sqrt(3) / (2 * Math.PI), 4 * EPS);
    expect(semicircleDensity(2)).toBe(0);
    expect(semicircleDensity(-2)).toBe(0);
    expect(semicircleDensity(2.5)).toBe(0);
    expect(semicircleDensity(-7)).toBe(0);
    expect(semicircleDensity(NaN)).toBeNaN();
    for (const x of [0.3, 1.2, 1.999]) expect(semicircleDensity(-x)).toBe(semicircleDensity(x));
  });

  it('integrates to 1 (trapezoid in θ, independent of the closed-form CDF)', () => {
    // ∫ρ = (2/π)∫_0^π sin²θ dθ; the trapezoid rule is exact for this trigonometric polynomial.
    const n = 64;
    let sum = 0;
    for (let j = 0; j < n; j++) {
      const theta = (Math.PI * (j + 0.5)) / n;
      sum += semicircleDensity(2 * Math.cos(theta)) * 2 * Math.sin(theta);
    }
    expectNear('∫ρ', (sum * Math.PI) / n, 1, 16 * EPS);
  });
});

describe('semicircleCdf', () => {
  it('takes the values 0, 1/2, 1 at −2, 0, 2 and satisfies F(x) + F(−x) = 1', () => {
    expect(semicircleCdf(-2)).toBe(0);
    expect(semicircleCdf(-3)).toBe(0);
    expect(semicircleCdf(2)).toBe(1);
    expect(semicircleCdf(5)).toBe(1);
    expect(semicircleCdf(0)).toBe(0.5);
    for (let x = 0.01; x < 2; x += 0.0731) expectNear(`F(${x}) + F(−${x})`, semicircleCdf(x) + semicircleCdf(-x), 1, 4 * EPS);
  });

  it('agrees with the closed form 1/2 + x√(4 − x²)/(4π) + asin(x/2)/π to a few ε absolute', () => {
    for (let x = -1.9999; x < 2; x += 0.0377) {
      const closed = 0.5 + (x * Math.sqrt(4 - x * x)) / (4 * Math.PI) + Math.asin(x / 2) / Math.PI;
      expectNear(`F(${x})`, semicircleCdf(x), closed, 4 * EPS);
    }
  });

  it('keeps relative accuracy in the lower tail (series of ∫ρ near −2)', () => {
    // ρ(−2 + t) = (√t/π)(1 − t/4)^{1/2} = (√t/π)(1 − t/8 − t²/128 − …), integrated term by term:
    // F(−2 + t) = (2t^{3/2}/3 − t^{5/2}/20 − t^{7/2}/448)/π + O(t^{9/2}) (binomial series, common practice).
    for (const requested of [1e-12, 1e-8, 1e-5, 1e-3]) {
      const t = -2 + requested + 2; // the t actually represented in −2 + t (Sterbenz: the sum is exact)
      expect(2 - (2 - t)).toBe(t); // and 2 − t represents the same t
      const series = ((2 * t ** 1.5) / 3 - t ** 2.5 / 20 - t ** 3.5 / 448) / Math.PI;
      expectNear(`F(−2 + ${t}) relative`, semicircleCdf(-2 + t) / series, 1, 8 * EPS + 10 * t ** 3);
      expectNear(`1 − F(2 − ${t}) relative`, (1 - semicircleCdf(2 - t)) / series, 1, 1e-16 / series + 10 * t ** 3);
    }
  });

  it('has derivative ρ (central difference)', () => {
    const h = 1e-5;
    for (const x of [-1.8, -1.0001, -0.9999, -0.4, 0.7, 1.0001, 1.5]) {
      const fd = (semicircleCdf(x + h) - semicircleCdf(x - h)) / (2 * h);
      // truncation h²|ρ‴|/6 ~ 1e-10 here, rounding ε/h ~ 2e-11.
      expectNear(`F′(${x})`, fd, semicircleDensity(x), 1e-9);
    }
  });
});

describe('stieltjesSemicircle', () => {
  it('solves m² + zm + 1 = 0 to a few ε relative, with Im m·Im z > 0 and |m| < 1', () => {
    for (const z of TEST_POINTS) {
      const m = stieltjesSemicircle(z);
      const residual = abs(add(add(mul(m, m), mul(z, m)), complex(1, 0)));
      const size = abs(m) * abs(m) + abs(z) * abs(m) + 1;
      expect(residual / size, `residual at z = ${z.re}+${z.im}i`).toBeLessThanOrEqual(8 * EPS);
      expect(m.im * z.im, `Im m·Im z at z = ${z.re}+${z.im}i`).toBeGreaterThan(0);
      expect(abs(m)).toBeLessThan(1);
    }
  });

  it('differs from the naive principal √(z² − 4) in the left half-plane, where the naive branch is wrong', () => {
    for (const z of [complex(-1, 3), complex(-3, 0.1)]) {
      const naive = scale(add(scale(z, -1), sqrt(sub(mul(z, z), complex(4, 0)))), 0.5);
      expect(naive.im * z.im).toBeLessThan(0); // the wrong root: Im m has the wrong sign
      const m = stieltjesSemicircle(z);
      expect(m.im * z.im).toBeGreaterThan(0);
    }
  });

  it('equals ∫ρ(x)/(x − z)dx by independent quadrature', () => {
    for (const z of TEST_POINTS) {
      const expected = stieltjesByQuadrature(z, 4096);
      expectComplexNear(`m(${z.re}+${z.im}i)`, stieltjesSemicircle(z), expected, 1e-13 * Math.max(1, abs(expected)));
    }
  });

  it('is conjugate-symmetric and odd: m(z̄) = conj m(z), m(−z) = −m(z)', () => {
    for (const z of TEST_POINTS) {
      const m = stieltjesSemicircle(z);
      const mBar = stieltjesSemicircle(complex(z.re, -z.im));
      expectComplexNear('m(z̄)', mBar, complex(m.re, -m.im), 2 * EPS * abs(m));
      const mNeg = stieltjesSemicircle(complex(-z.re, -z.im));
      expectComplexNear('m(−z)', mNeg, complex(-m.re, -m.im), 4 * EPS * abs(m));
    }
  });

  it('takes the documented real-axis limits (signed zero picks the side on the cut)', () => {
    for (const x of [-1.9, -0.5, 0, 0.8, 1.99]) {
      const above = stieltjesSemicircle(complex(x, 0));
      expectNear(`Re m(${x}+i0)`, above.re, -x / 2, 4 * EPS);
      expectNear(`Im m(${x}+i0) = πρ`, above.im, Math.PI * semicircleDensity(x), 8 * EPS);
      const below = stieltjesSemicircle(complex(x, -0));
      expectNear(`Im m(${x}−i0)`, below.im, -Math.PI * semicircleDensity(x), 8 * EPS);
      // continuity from above: Im z = 1e-9 moves m by O(|m′|·1e-9)
      expectComplexNear(`m(${x}+1e-9i)`, stieltjesSemicircle(complex(x, 1e-9)), above, 1e-7);
    }
    for (const x of [2.5, 3, 10, -2.5, -3, -10]) {
      const m = stieltjesSemicircle(complex(x, 0));
      expect(Object.is(m.im, 0)).toBe(true);
      expect(Object.is(stieltjesSemicircle(complex(x, -0)).im, -0)).toBe(true);
      const expected = -2 / (x + Math.sign(x) * Math.sqrt(x * x - 4));
      expectNear(`m(${x})`, m.re, expected, 4 * EPS * Math.abs(expected));
      expectNear(`m(${x} − i0)`, stieltjesSemicircle(complex(x, -0)).re, expected, 4 * EPS * Math.abs(expected));
    }
    expectComplexNear('m(2)', stieltjesSemicircle(complex(2, 0)), complex(-1, 0), 0);
    expectComplexNear('m(−2)', stieltjesSemicircle(complex(-2, 0)), complex(1, 0), 0);
    expectComplexNear('m(0)', stieltjesSemicircle(complex(0, 0)), complex(0, 1), 2 * EPS);
  });

  it('behaves like −1/z − 1/z³ for large |z| without cancellation', () => {
    for (const z of [complex(1e8, 3e7), complex(-2e12, 5), complex(3, -1e150), complex(-1e200, 1e200)]) {
      const m = stieltjesSemicircle(z);
      const w = div(complex(1, 0), z);
      const expected = scale(add(w, mul(w, mul(w, w))), -1);
      expectComplexNear(`m(${z.re}+${z.im}i)`, m, expected, 8 * EPS * abs(expected));
    }
  });

  it('is accurate near the edges ±2 (Puiseux expansion m ≈ ∓1 + √(z ∓ 2)...)', () => {
    // Near z = 2, m = −1 + √δ − δ/2 + O(δ^{3/2}) with δ = z − 2, principal root (from m = −2/(z + s),
    // s = √δ √(4 + δ); common practice series algebra). Checked here against the quadratic's residual
    // and the quadrature above; this test pins the branch of the square root at the edge.
    for (const d of [complex(1e-6, 1e-6), complex(-1e-6, 1e-6), complex(1e-8, -1e-9)]) {
      const m = stieltjesSemicircle(add(complex(2, 0), d));
      const r = sqrt(d);
      const expected = add(add(complex(-1, 0), r), scale(d, -0.5));
      expectComplexNear(`m(2 + ${d.re}+${d.im}i)`, m, expected, 4 * abs(d) ** 1.5 + 8 * EPS);
      const mLeft = stieltjesSemicircle(sub(complex(-2, 0), d));
      expectComplexNear('m(−2 − δ) = −m(2 + δ)', mLeft, scale(m, -1), 8 * EPS);
    }
  });
});

describe('stieltjesSemicircleDerivative', () => {
  it('matches a central finite difference of m', () => {
    for (const z of TEST_POINTS) {
      const h = 1e-5 * Math.max(1, abs(z));
      const fd = scale(sub(stieltjesSemicircle(add(z, complex(h, 0))), stieltjesSemicircle(sub(z, complex(h, 0)))), 1 / (2 * h));
      const d = stieltjesSemicircleDerivative(z);
      // truncation h²|m‴|/6 and rounding ε|m|/h; the points near the cut (|Im z| = 0.05) have |m‴| ~ 1e4.
      expectComplexNear(`m′(${z.re}+${z.im}i)`, d, fd, 1e-6 * Math.max(1, abs(d)));
    }
  });
});

describe('Catalan numbers and semicircle moments', () => {
  // OEIS A000108, data section: C_0 … C_29 (terms transcribed from memory; each is also re-derived
  // below from the binomial formula C_k = binom(2k, k)/(k + 1), OEIS A000108 "Formula").
  const OEIS_A000108 = [
    1n, 1n, 2n, 5n, 14n, 42n, 132n, 429n, 1430n, 4862n, 16796n, 58786n, 208012n, 742900n, 2674440n, 9694845n,
    35357670n, 129644790n, 477638700n, 1767263190n, 6564120420n, 24466267020n, 91482563640n, 343059613650n,
    1289904147324n, 4861946401452n, 18367353072152n, 69533550916004n, 263747951750360n, 1002242216651368n,
  ];

  it('reproduces the first 30 terms of OEIS A000108 and the binomial formula', () => {
    for (let k = 0; k < OEIS_A000108.length; k++) expect(catalanNumber(k)).toBe(OEIS_A000108[k]);
    for (let k = 0; k <= 60; k++) {
      let binom = 1n;
      for (let j = 1n; j <= BigInt(k); j++) binom = (binom * (BigInt(k) + j)) / j; // binom(2k, k)
      expect(catalanNumber(k)).toBe(binom / BigInt(k + 1));
    }
    expect(() => catalanNumber(-1)).toThrow(RangeError);
    expect(() => catalanNumber(1.5)).toThrow(RangeError);
  });

  it('are the moments of the density (exact trapezoid rule in θ)', () => {
    // ∫x^n ρ = (2/π)∫_0^π (2cos θ)^n sin²θ dθ, a cosine polynomial of degree n + 2; the M-node midpoint
    // rule on [0, π] integrates cos jθ exactly for 0 < j < 2M (common practice), so M = 64 is exact
    // up to rounding for n ≤ 20.
    for (let n = 0; n <= 20; n++) {
      const nodes = 64;
      let sum = 0;
      for (let j = 0; j < nodes; j++) {
        const theta = (Math.PI * (j + 0.5)) / nodes;
        const s = Math.sin(theta);
        sum += (2 * Math.cos(theta)) ** n * s * s;
      }
      const quadrature = (2 / nodes) * sum;
      expectNear(`∫x^${n}ρ`, semicircleMoment(n), quadrature, 64 * EPS * 2 ** n);
    }
    expect(semicircleEvenMoment(5)).toBe(42);
    expect(semicircleMoment(7)).toBe(0);
  });
});
