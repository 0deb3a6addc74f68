import type { SpectralDecomposition } from '../../../harness/numeric/spectral-decomposition.js';
import type { Field, SquareMatrix } from '../../../harness/numeric/square-matrix.js';

/**
 * Test matrices and LAPACK-style checks for the eigen-solver and the resolvent statistics.
 *
 * The generator is local on purpose (the project's random stream is tested elsewhere and must not
 * be a dependency of these tests): a 32-bit xorshift (G. Marsaglia, 2003, "Xorshift RNGs",
 * J. Stat. Softw. 8(14), the triple 13, 17, 5), two draws per double, uniform on [−1/2, 1/2).
 * Statistical quality does not matter here, only determinism and variety.
 */
export function testStream(seed: number): () => number {
  let s = seed >>> 0 || 0x9e3779b9;
  const next32 = (): number => {
    s ^= s << 13;
    s >>>= 0;
    s ^= s >>> 17;
    s ^= s << 5;
    s >>>= 0;
    return s;
  };
  return () => (next32() * 2 ** 21 + (next32() >>> 11)) / 2 ** 53 - 0.5;
}

/** A random real symmetric or complex Hermitian matrix, entries uniform on [−1/2, 1/2). */
export function randomHermitian(field: Field, n: number, seed: number): SquareMatrix {
  const draw = testStream(seed);
  const stride = field === 'complex' ? 2 : 1;
  const data = new Float64Array(stride * n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j <= i; j++) {
      const re = draw();
      const im = field === 'complex' && i !== j ? draw() : 0;
      data[stride * (i * n + j)] = re;
      data[stride * (j * n + i)] = re;
      if (stride === 2) {
        data[2 * (i * n + j) + 1] = im;
        data[2 * (j * n + i) + 1] = -im;
      }
    }
  }
  return { field, size: n, data };
}

/** D R D with D = diag(10^(−decades·i/(N−1))): entries graded over `decades` orders per side. */
export function gradedHermitian(field: Field, n: number, seed: number, decades: number): SquareMatrix {
  const m = randomHermitian(field, n, seed);
  const stride = field === 'complex' ? 2 : 1;
  const d = Array.from({ length: n }, (_, i) => 10 ** (-decades * (n > 1 ? i / (n - 1) : 0)));
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) for (let c = 0; c < stride; c++) m.data[stride * (i * n + j) + c] *= d[i] * d[j];
  return m;
}

/**
 * U diag(spectrum) U* with U a product of N random (complex) Householder reflectors, so the
 * spectrum is prescribed exactly up to rounding: used for clustered eigenvalues.
 */
export function withSpectrum(field: Field, spectrum: readonly number[], seed: number): SquareMatrix {
  const n = spectrum.length;
  const draw = testStream(seed);
  // Columns of U, complex interleaved, start as the identity.
  const u = new Float64Array(2 * n * n);
  for (let i = 0; i < n; i++) u[2 * (i * n + i)] = 1;
  for (let k = 0; k < n; k++) {
    const h = new Float64Array(2 * n);
    let norm2 = 0;
    for (let i = 0; i < n; i++) {
      h[2 * i] = draw();
      h[2 * i + 1] = field === 'complex' ? draw() : 0;
      norm2 += h[2 * i] ** 2 + h[2 * i + 1] ** 2;
    }
    // U ← (I − 2 h h*/‖h‖²) U, column by column.
    for (let c = 0; c < n; c++) {
      let sr = 0;
      let si = 0;
      for (let i = 0; i < n; i++) {
        const xr = u[2 * (i * n + c)];
        const xi = u[2 * (i * n + c) + 1];
        sr += h[2 * i] * xr + h[2 * i + 1] * xi;
        si += h[2 * i] * xi - h[2 * i + 1] * xr;
      }
      const f = 2 / norm2;
      for (let i = 0; i < n; i++) {
        u[2 * (i * n + c)] -= f * (h[2 * i] * sr - h[2 * i + 1] * si);
        u[2 * (i * n + c) + 1] -= f * (h[2 * i] * si + h[2 * i + 1] * sr);
      }
    }
  }
  const stride = field === 'complex' ? 2 : 1;
  const data = new Float64Array(stride * n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      let re = 0;
      let im = 0;
      for (let k = 0; k < n; k++) {
        // U_ik λ_k conj(U_jk)
        const ar = u[2 * (i * n + k)], ai = u[2 * (i * n + k) + 1];
        const br = u[2 * (j * n + k)], bi = -u[2 * (j * n + k) + 1];
        re += spectrum[k] * (ar * br - ai * bi);
        im += spectrum[k] * (ar * bi + ai * br);
      }
      data[stride * (i * n + j)] = re;
      if (stride === 2) data[2 * (i * n + j) + 1] = i === j ? 0 : im;
    }
  }
  // Symmetrise exactly from the lower triangle.
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < i; j++) {
      data[stride * (j * n + i)] = data[stride * (i * n + j)];
      if (stride === 2) data[2 * (j * n + i) + 1] = -data[2 * (i * n + j) + 1];
    }
  }
  return { field, size: n, data };
}

/** Complex entry (i, j) of an N×N matrix stored real or complex interleaved. */
function at(data: Float64Array, complex: boolean, n: number, i: number, j: number): [number, number] {
  return complex ? [data[2 * (i * n + j)], data[2 * (i * n + j) + 1]] : [data[i * n + j], 0];
}

/** ‖A‖₁, the largest column sum of moduli (LAPACK's norm for these ratios). */
export function oneNorm(m: SquareMatrix): number {
  const n = m.size;
  let best = 0;
  for (let j = 0; j < n; j++) {
    let s = 0;
    for (let i = 0; i < n; i++) s += Math.hypot(...at(m.data, m.field === 'complex', n, i, j));
    best = Math.max(best, s);
  }
  return best;
}

const ULP = Number.EPSILON;

/**
 * LAPACK's normalised residual ‖AV − VΛ‖₁/(N ‖A‖₁ ulp) (LAPACK dsyt21/zhet21, test ratio 1;
 * ulp = ε·base = 2⁻⁵²). O(1) for a backward stable solver.
 */
export function residualRatio(m: SquareMatrix, dec: SpectralDecomposition): number {
  const n = m.size;
  if (n === 0) return 0;
  const cm = m.field === 'complex';
  const cv = dec.field === 'complex';
  let worst = 0;
  for (let j = 0; j < n; j++) {
    let colSum = 0;
    for (let i = 0; i < n; i++) {
      let re = 0;
      let im = 0;
      for (let k = 0; k < n; k++) {
        const [ar, ai] = at(m.data, cm, n, i, k);
        const [vr, vi] = at(dec.vectors, cv, n, k, j);
        re += ar * vr - ai * vi;
        im += ar * vi + ai * vr;
      }
      const [vr, vi] = at(dec.vectors, cv, n, i, j);
      colSum += Math.hypot(re - dec.values[j] * vr, im - dec.values[j] * vi);
    }
    worst = Math.max(worst, colSum);
  }
  const anorm = Math.max(oneNorm(m), Number.MIN_VALUE);
  return worst / (n * anorm * ULP);
}

/** LAPACK's orthogonality ratio ‖V*V − I‖₁/(N ulp) (dsyt21/zhet21, test ratio 2). */
export function orthogonalityRatio(dec: SpectralDecomposition): number {
  const n = dec.size;
  if (n === 0) return 0;
  const cv = dec.field === 'complex';
  let worst = 0;
  for (let j = 0; j < n; j++) {
    let colSum = 0;
    for (let i = 0; i < n; i++) {
      let re = i === j ? -1 : 0;
      let im = 0;
      for (let k = 0; k < n; k++) {
        const [ar, ai] = at(dec.vectors, cv, n, k, i);
        const [br, bi] = at(dec.vectors, cv, n, k, j);
        re += ar * br + ai * bi;
        im += ar * bi - ai * br;
      }
      colSum += Math.hypot(re, im);
    }
    worst = Math.max(worst, colSum);
  }
  return worst / (n * ULP);
}

/** Rows of a real matrix as arrays (for ml-matrix). */
export function realRows(m: SquareMatrix): number[][] {
  return Array.from({ length: m.size }, (_, i) => Array.from(m.data.subarray(i * m.size, (i + 1) * m.size)));
}

/** The real 2N×2N embedding [[A, −B], [B, A]] of H = A + iB (each eigenvalue of H twice). */
export function realEmbedding(m: SquareMatrix): number[][] {
  const n = m.size;
  const rows = Array.from({ length: 2 * n }, () => new Array<number>(2 * n).fill(0));
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      const [a, b] = at(m.data, m.field === 'complex', n, i, j);
      rows[i][j] = a;
      rows[i][j + n] = -b;
      rows[i + n][j] = b;
      rows[i + n][j + n] = a;
    }
  }
  return rows;
}
