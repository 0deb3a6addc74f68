// Dense complex matrices for the example kernel: Float64Array, row-major, entries interleaved
// (re, im), the protocol's own layout. Independent of rmt-assay's engine.

/** M as a complex n×n array (a real matrix gets zero imaginary parts). */
export function toComplex({ size, field, data }) {
  if (field === 'complex') return Float64Array.from(data);
  const out = new Float64Array(2 * size * size);
  for (let k = 0; k < size * size; k++) out[2 * k] = data[k];
  return out;
}

export function identity(n) {
  const out = new Float64Array(2 * n * n);
  for (let i = 0; i < n; i++) out[2 * (i * n + i)] = 1;
  return out;
}

/** H − zI for complex H (n×n, interleaved). */
export function shift(h, n, z) {
  const out = Float64Array.from(h);
  for (let i = 0; i < n; i++) {
    out[2 * (i * n + i)] -= z.re;
    out[2 * (i * n + i) + 1] -= z.im;
  }
  return out;
}

/**
 * X = M⁻¹B for complex n×n M and n×n B, by Gaussian elimination with partial pivoting (row
 * interchanges by largest modulus), then back substitution: G. H. Golub and C. F. Van Loan, 2013,
 * Matrix Computations, 4th ed., Johns Hopkins, §3.4.
 */
export function solve(m, b, n) {
  const a = Float64Array.from(m);
  const x = Float64Array.from(b);
  const swapRows = (arr, i, j) => {
    for (let c = 0; c < 2 * n; c++) {
      const t = arr[2 * i * n + c];
      arr[2 * i * n + c] = arr[2 * j * n + c];
      arr[2 * j * n + c] = t;
    }
  };
  for (let k = 0; k < n; k++) {
    let pivot = k;
    let best = -1;
    for (let i = k; i < n; i++) {
      const modulus = Math.hypot(a[2 * (i * n + k)], a[2 * (i * n + k) + 1]);
      if (modulus > best) {
        best = modulus;
        pivot = i;
      }
    }
    if (best === 0) throw new Error(`singular matrix: no pivot in column ${k}`);
    if (pivot !== k) {
      swapRows(a, pivot, k);
      swapRows(x, pivot, k);
    }
    const pr = a[2 * (k * n + k)];
    const pi = a[2 * (k * n + k) + 1];
    const denominator = pr * pr + pi * pi;
    for (let i = k + 1; i < n; i++) {
      const ar = a[2 * (i * n + k)];
      const ai = a[2 * (i * n + k) + 1];
      // l = a_ik / a_kk
      const lr = (ar * pr + ai * pi) / denominator;
      const li = (ai * pr - ar * pi) / denominator;
      for (let j = k; j < n; j++) {
        const ur = a[2 * (k * n + j)];
        const ui = a[2 * (k * n + j) + 1];
        a[2 * (i * n + j)] -= lr * ur - li * ui;
        a[2 * (i * n + j) + 1] -= lr * ui + li * ur;
      }
      for (let j = 0; j < n; j++) {
        const ur = x[2 * (k * n + j)];
        const ui = x[2 * (k * n + j) + 1];
        x[2 * (i * n + j)] -= lr * ur - li * ui;
        x[2 * (i * n + j) + 1] -= lr * ui + li * ur;
      }
    }
  }
  for (let k = n - 1; k >= 0; k--) {
    const pr = a[2 * (k * n + k)];
    const pi = a[2 * (k * n + k) + 1];
    const denominator = pr * pr + pi * pi;
    for (let j = 0; j < n; j++) {
      let sr = x[2 * (k * n + j)];
      let si = x[2 * (k * n + j) + 1];
      for (let c = k + 1; c < n; c++) {
        const ur = a[2 * (k * n + c)];
        const ui = a[2 * (k * n + c) + 1];
        const vr = x[2 * (c * n + j)];
        const vi = x[2 * (c * n + j) + 1];
        sr -= ur * vr - ui * vi;
        si -= ur * vi + ui * vr;
      }
      x[2 * (k * n + j)] = (sr * pr + si * pi) / denominator;
      x[2 * (k * n + j) + 1] = (si * pr - sr * pi) / denominator;
    }
  }
  return x;
}

/** The product AB of complex n×n matrices. */
export function multiply(a, b, n) {
  const out = new Float64Array(2 * n * n);
  for (let i = 0; i < n; i++) {
    for (let k = 0; k < n; k++) {
      const ar = a[2 * (i * n + k)];
      const ai = a[2 * (i * n + k) + 1];
      for (let j = 0; j < n; j++) {
        const br = b[2 * (k * n + j)];
        const bi = b[2 * (k * n + j) + 1];
        out[2 * (i * n + j)] += ar * br - ai * bi;
        out[2 * (i * n + j) + 1] += ar * bi + ai * br;
      }
    }
  }
  return out;
}

/** Tr(M)/n as { re, im }. */
export function normalisedTrace(m, n) {
  let re = 0;
  let im = 0;
  for (let i = 0; i < n; i++) {
    re += m[2 * (i * n + i)];
    im += m[2 * (i * n + i) + 1];
  }
  return { re: re / n, im: im / n };
}
