import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import type { Adapter, AdapterDescription } from '../../adapters/adapter.js';
import type { Complex } from '../../harness/numeric/complex.js';
import type { SquareMatrix } from '../../harness/numeric/square-matrix.js';
import { complexProduct, complexSolve, identityRows, type ComplexRows } from '../harness/numeric/complex-solve.js';
import { realEmbedding } from '../harness/numeric/spectral-fixtures.js';
import { reference } from './mutant-adapter.js';

function rowsOf(m: SquareMatrix): ComplexRows {
  const n = m.size;
  const c = m.field === 'complex';
  return Array.from({ length: n }, (_, i) =>
    Array.from({ length: n }, (_, j) => (c ? { re: m.data[2 * (i * n + j)], im: m.data[2 * (i * n + j) + 1] } : { re: m.data[i * n + j], im: 0 })),
  );
}

function shifted(h: ComplexRows, z: Complex): ComplexRows {
  return h.map((row, i) => row.map((e, j) => (i === j ? { re: e.re - z.re, im: e.im - z.im } : e)));
}

function normalisedTrace(x: ComplexRows): Complex {
  let re = 0;
  let im = 0;
  x.forEach((row, i) => {
    re += row[i].re;
    im += row[i].im;
  });
  return { re: re / x.length, im: im / x.length };
}

/**
 * A correct implementation that shares no numerical code with the reference engine: eigenvalues
 * by ml-matrix's symmetric QL (JAMA's tred2/tql2) on the real 2N×2N embedding [[A, −B], [B, A]]
 * of H = A + iB, whose spectrum is H's with each eigenvalue twice (common practice); resolvents
 * by Gaussian elimination with partial pivoting, G(z)A = (H − z)⁻¹A, and chains by successive
 * solves from the right. Its answers differ from the reference engine's in the last bits, by
 * amounts of the size the suite's error scales allow: a check that failed it would be too tight.
 */
export const independentAdapter: Adapter = {
  async describe(): Promise<AdapterDescription> {
    const d = await reference.describe();
    return { ...d, name: 'independent engine (ml-matrix QL, Gaussian elimination)', kind: 'module', capabilities: ['eigenvalues', 'resolvent_trace', 'chain_trace'] };
  },
  async eigenvalues(m) {
    const values = new EigenvalueDecomposition(new Matrix(realEmbedding(m)), { assumeSymmetric: true }).realEigenvalues.sort((a, b) => a - b);
    return Float64Array.from({ length: m.size }, (_, i) => (values[2 * i] + values[2 * i + 1]) / 2);
  },
  async resolventTrace(m, points, weight) {
    const h = rowsOf(m);
    const a = weight === undefined ? identityRows(m.size) : rowsOf(weight);
    return points.map((z) => normalisedTrace(complexSolve(shifted(h, z), a)));
  },
  async chainTrace(m, points, weights) {
    const h = rowsOf(m);
    let y = identityRows(m.size);
    for (let j = points.length - 1; j >= 0; j--) y = complexSolve(shifted(h, points[j]), complexProduct(rowsOf(weights[j]), y));
    return normalisedTrace(y);
  },
  sample: (e, n, s, c) => reference.sample(e, n, s, c),
  close: async () => {},
};
