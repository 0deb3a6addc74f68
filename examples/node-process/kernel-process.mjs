#!/usr/bin/env node
// A random-matrix kernel in plain JavaScript, served to rmt-assay as a separate process:
//
//   rmt-assay check --exec "node examples/node-process/kernel-process.mjs"
//
// It computes everything itself (ml-matrix for symmetric eigenproblems, its own complex
// elimination for resolvents, its own generator for samples), independently of rmt-assay's
// reference engine. Needs the ml-matrix package where it runs.
import { hermitianEigenvalues } from './hermitian-eigenvalues.mjs';
import { identity, multiply, normalisedTrace, shift, solve, toComplex } from './complex-dense.mjs';
import { EnsembleNotOffered, serve } from './rmt-assay-protocol.mjs';
import { seededNormals } from './seeded-normals.mjs';

/** ⟨G(z)A⟩ = Tr((H − z)⁻¹A)/N, one linear solve per point. */
function resolventTrace(matrix, points, weight) {
  const n = matrix.size;
  const h = toComplex(matrix);
  const a = weight === undefined ? identity(n) : toComplex(weight);
  return points.map((z) => normalisedTrace(solve(shift(h, n, z), a, n), n));
}

/** ⟨G(z1)A1 ⋯ G(zk)Ak⟩, each factor G(z_j)A_j by a linear solve. */
function chainTrace(matrix, points, weights) {
  const n = matrix.size;
  const h = toComplex(matrix);
  let product = identity(n);
  points.forEach((z, j) => {
    product = multiply(product, solve(shift(h, n, z), toComplex(weights[j]), n), n);
  });
  return normalisedTrace(product, n);
}

/**
 * GOE and GUE with the project's normalisation (shared/THEORY.md, "Conventions"): off-diagonal
 * E|h_ij|² = 1/N (GUE: real and imaginary parts of variance 1/(2N) each), diagonal variance 2/N
 * (GOE) or 1/N (GUE). Other ensembles are not offered.
 */
function sample(ensemble, size, seed, count) {
  if (ensemble.kind !== 'goe' && ensemble.kind !== 'gue') throw new EnsembleNotOffered(ensemble);
  const random = seededNormals(seed);
  const n = size;
  return Array.from({ length: count }, () => {
    if (ensemble.kind === 'goe') {
      const data = new Float64Array(n * n);
      for (let i = 0; i < n; i++) {
        data[i * n + i] = random.normal() * Math.sqrt(2 / n);
        for (let j = i + 1; j < n; j++) data[i * n + j] = data[j * n + i] = random.normal() / Math.sqrt(n);
      }
      return { size: n, field: 'real', data };
    }
    const data = new Float64Array(2 * n * n);
    for (let i = 0; i < n; i++) {
      data[2 * (i * n + i)] = random.normal() / Math.sqrt(n);
      for (let j = i + 1; j < n; j++) {
        const re = random.normal() / Math.sqrt(2 * n);
        const im = random.normal() / Math.sqrt(2 * n);
        data[2 * (i * n + j)] = re;
        data[2 * (i * n + j) + 1] = im;
        data[2 * (j * n + i)] = re;
        data[2 * (j * n + i) + 1] = -im;
      }
    }
    return { size: n, field: 'complex', data };
  });
}

serve({ name: 'kernel-process (ml-matrix)', version: '1.0.0', eigenvalues: hermitianEigenvalues, resolventTrace, chainTrace, sample });
