/**
 * Dense square matrices, row-major in one Float64Array. A real matrix holds N² numbers; a complex
 * matrix holds 2N², each entry as its real part followed by its imaginary part (interleaved).
 * This is also the layout of the process protocol's base64 payload, so conversion at the adapter
 * boundary is a byte copy.
 */
export type Field = 'real' | 'complex';

export interface SquareMatrix {
  readonly field: Field;
  readonly size: number;
  /** Row-major entries; complex entries interleaved (re, im). Length N² (real) or 2N² (complex). */
  readonly data: Float64Array;
}

export function zeroMatrix(field: Field, size: number): SquareMatrix {
  return { field, size, data: new Float64Array((field === 'complex' ? 2 : 1) * size * size) };
}

export function identityMatrix(field: Field, size: number): SquareMatrix {
  const m = zeroMatrix(field, size);
  const stride = field === 'complex' ? 2 : 1;
  for (let i = 0; i < size; i++) m.data[(i * size + i) * stride] = 1;
  return m;
}

export function diagonalMatrix(field: Field, diagonal: ArrayLike<number>): SquareMatrix {
  const size = diagonal.length;
  const m = zeroMatrix(field, size);
  const stride = field === 'complex' ? 2 : 1;
  for (let i = 0; i < size; i++) m.data[(i * size + i) * stride] = diagonal[i];
  return m;
}

export function expectedDataLength(field: Field, size: number): number {
  return (field === 'complex' ? 2 : 1) * size * size;
}

/** The same matrix with complex storage (imaginary parts zero where the input is real). */
export function asComplex(m: SquareMatrix): SquareMatrix {
  if (m.field === 'complex') return m;
  const out = new Float64Array(2 * m.data.length);
  for (let k = 0; k < m.data.length; k++) out[2 * k] = m.data[k];
  return { field: 'complex', size: m.size, data: out };
}

/** Real part of entry (i, j). */
export function entryRe(m: SquareMatrix, i: number, j: number): number {
  return m.field === 'complex' ? m.data[2 * (i * m.size + j)] : m.data[i * m.size + j];
}

/** Imaginary part of entry (i, j) (0 for a real matrix). */
export function entryIm(m: SquareMatrix, i: number, j: number): number {
  return m.field === 'complex' ? m.data[2 * (i * m.size + j) + 1] : 0;
}

/** Normalised trace ⟨M⟩ = Tr M / N, as (re, im). */
export function normalisedTraceOf(m: SquareMatrix): { re: number; im: number } {
  let re = 0;
  let im = 0;
  for (let i = 0; i < m.size; i++) {
    re += entryRe(m, i, i);
    im += entryIm(m, i, i);
  }
  return { re: re / m.size, im: im / m.size };
}

/** Largest deviation from Hermitian symmetry, max |m_ij − conj(m_ji)|. */
export function hermitianDefect(m: SquareMatrix): number {
  let worst = 0;
  for (let i = 0; i < m.size; i++) {
    for (let j = i; j < m.size; j++) {
      const dr = entryRe(m, i, j) - entryRe(m, j, i);
      const di = entryIm(m, i, j) + entryIm(m, j, i);
      worst = Math.max(worst, Math.hypot(dr, di));
    }
  }
  return worst;
}

/** Frobenius norm ‖M‖_F. */
export function frobeniusNorm(m: SquareMatrix): number {
  let s = 0;
  for (let k = 0; k < m.data.length; k++) s += m.data[k] * m.data[k];
  return Math.sqrt(s);
}
