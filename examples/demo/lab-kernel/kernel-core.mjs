// The spectral kernel of a fictitious lab, used by rmt-assay's demo. Invented for the demo: no
// real codebase is described. It samples GOE matrices with its own generator and computes
// eigenvalues (with ml-matrix) and normalised resolvent traces ⟨G(z)⟩ from them.
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';

// mulberry32, a small public-domain 32-bit generator (common practice for demo code).
function mulberry32(seed) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function gaussian(next) {
  // Box–Muller (Box and Muller 1958, Ann. Math. Stat. 29).
  const u = 1 - next();
  return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * next());
}

function sampleGoe(size, next) {
  const data = new Float64Array(size * size);
  const offDiagonal = 1 / Math.sqrt(size);
  const diagonal = Math.sqrt(2 / size);
  for (let i = 0; i < size; i++) {
    data[i * size + i] = diagonal * gaussian(next);
    for (let j = i + 1; j < size; j++) {
      const h = offDiagonal * gaussian(next);
      data[i * size + j] = h;
      data[j * size + i] = h;
    }
  }
  return { size, field: 'real', data };
}

function decompose(matrix) {
  if (matrix.field !== 'real') throw new Error('this kernel handles real symmetric matrices only');
  const rows = Array.from({ length: matrix.size }, (_, i) => Array.from(matrix.data.subarray(i * matrix.size, (i + 1) * matrix.size)));
  return new EigenvalueDecomposition(new Matrix(rows), { assumeSymmetric: true });
}

function spectrum(matrix) {
  return Float64Array.from(decompose(matrix).realEigenvalues).sort();
}

// (vᵢᵀ A vᵢ) for each eigenvector vᵢ, as [re, im]; A real or complex (interleaved).
function eigenbasisDiagonal(vectors, weight) {
  const n = weight.size;
  const stride = weight.field === 'complex' ? 2 : 1;
  return Array.from({ length: n }, (_, i) => {
    const v = vectors.getColumn(i);
    let re = 0;
    let im = 0;
    for (let j = 0; j < n; j++) {
      for (let k = 0; k < n; k++) {
        const w = v[j] * v[k];
        const at = (j * n + k) * stride;
        re += w * weight.data[at];
        if (stride === 2) im += w * weight.data[at + 1];
      }
    }
    return [re, im];
  });
}

/**
 * Builds the kernel. `traceDenominator(N)` is what the normalised trace divides by: N in a
 * correct kernel.
 */
export function makeKernel({ name, version, traceDenominator }) {
  return {
    name,
    version,
    eigenvalues: spectrum,
    resolventTrace(matrix, points, weight) {
      const decomposition = decompose(matrix);
      const values = decomposition.realEigenvalues;
      const diagonal = weight === undefined ? values.map(() => [1, 0]) : eigenbasisDiagonal(decomposition.eigenvectorMatrix, weight);
      const denominator = traceDenominator(matrix.size);
      return points.map(([re, im]) => {
        let sumRe = 0;
        let sumIm = 0;
        values.forEach((lambda, i) => {
          // a/(λ − z) with a = diagonal[i]: multiply by conj(λ − z) = (λ − re) + i·im.
          const dr = lambda - re;
          const d = dr * dr + im * im;
          const [ar, ai] = diagonal[i];
          sumRe += (ar * dr - ai * im) / d;
          sumIm += (ar * im + ai * dr) / d;
        });
        return [sumRe / denominator, sumIm / denominator];
      });
    },
    sample(ensemble, size, seed, count) {
      if (ensemble.kind !== 'goe') return null;
      const next = mulberry32(seed);
      return Array.from({ length: count }, () => sampleGoe(size, next));
    },
  };
}
