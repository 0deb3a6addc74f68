/**
 * An independent dense complex solver for the tests: X = M⁻¹ B by Gaussian elimination with
 * partial pivoting (Golub and Van Loan 2013, Matrix Computations, 4th ed., Algorithm 3.4.1),
 * written plainly on arrays of {re, im} pairs, sharing no code with the library.
 */
export interface Entry {
  re: number;
  im: number;
}

export type ComplexRows = Entry[][];

function mul(a: Entry, b: Entry): Entry {
  return { re: a.re * b.re - a.im * b.im, im: a.re * b.im + a.im * b.re };
}

function divide(a: Entry, b: Entry): Entry {
  const d = b.re * b.re + b.im * b.im;
  return { re: (a.re * b.re + a.im * b.im) / d, im: (a.im * b.re - a.re * b.im) / d };
}

/** Solves M X = B (N×N and N×K); M and B are not modified. */
export function complexSolve(m: ComplexRows, b: ComplexRows): ComplexRows {
  const n = m.length;
  const a = m.map((row) => row.map((e) => ({ ...e })));
  const x = b.map((row) => row.map((e) => ({ ...e })));
  for (let k = 0; k < n; k++) {
    let p = k;
    for (let i = k + 1; i < n; i++) if (Math.hypot(a[i][k].re, a[i][k].im) > Math.hypot(a[p][k].re, a[p][k].im)) p = i;
    [a[k], a[p]] = [a[p], a[k]];
    [x[k], x[p]] = [x[p], x[k]];
    for (let i = k + 1; i < n; i++) {
      const f = divide(a[i][k], a[k][k]);
      for (let j = k; j < n; j++) {
        const t = mul(f, a[k][j]);
        a[i][j] = { re: a[i][j].re - t.re, im: a[i][j].im - t.im };
      }
      for (let j = 0; j < x[i].length; j++) {
        const t = mul(f, x[k][j]);
        x[i][j] = { re: x[i][j].re - t.re, im: x[i][j].im - t.im };
      }
    }
  }
  for (let k = n - 1; k >= 0; k--) {
    for (let j = 0; j < x[k].length; j++) {
      let s = x[k][j];
      for (let i = k + 1; i < n; i++) {
        const t = mul(a[k][i], x[i][j]);
        s = { re: s.re - t.re, im: s.im - t.im };
      }
      x[k][j] = divide(s, a[k][k]);
    }
  }
  return x;
}

export function complexProduct(x: ComplexRows, y: ComplexRows): ComplexRows {
  return x.map((row) =>
    y[0].map((_, j) => {
      let re = 0;
      let im = 0;
      for (let s = 0; s < row.length; s++) {
        const t = mul(row[s], y[s][j]);
        re += t.re;
        im += t.im;
      }
      return { re, im };
    }),
  );
}

export function identityRows(n: number): ComplexRows {
  return Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => ({ re: i === j ? 1 : 0, im: 0 })));
}
