import { complex, type Complex } from '../harness/numeric/complex.js';
import { eigenvalues } from '../harness/numeric/eigen.js';
import { randomStream } from '../harness/numeric/random-stream.js';
import { normalisedResolventTrace } from '../harness/numeric/resolvent-trace.js';
import { sampleMatrix } from '../harness/numeric/sample-wigner.js';
import { spectrumOfEnsemble } from '../harness/numeric/spectrum-of-ensemble.js';

/**
 * The unit of work of the fluctuation-throughput benchmark, as plain data so that a worker can
 * rebuild it from a message: which route draws the GOE spectrum, the spectral parameters, and the
 * stream (seed, key) whose sample `index` is drawn.
 * - 'dense': the dense sampler (sample-wigner.ts) and the dense eigen-solver (eigen.ts), the
 *   harness's path for any ensemble;
 * - 'tridiagonal': the Dumitriu–Edelman model and QL (spectrum-of-ensemble.ts), GOE/GUE only.
 */
export interface FluctuationWorkload {
  readonly route: 'dense' | 'tridiagonal';
  /** Spectral parameters as [re, im] pairs. */
  readonly z: readonly (readonly [number, number])[];
  readonly seed: number;
  readonly key: string;
}

export interface FluctuationStatistics {
  /** ⟨G(z)⟩ = Tr (H − z)⁻¹/N at each z of the workload. */
  readonly resolvent: readonly Complex[];
  /** Tr H⁴ = Σ λ⁴. */
  readonly fourthTrace: number;
}

/** The statistics of one sample: draw a GOE matrix (or spectrum), its eigenvalues, ⟨G(z)⟩ and Tr H⁴. */
export function fluctuationSample(workload: FluctuationWorkload, n: number, index: number): FluctuationStatistics {
  const stream = randomStream(workload.seed, workload.key, index);
  const values = workload.route === 'dense' ? eigenvalues(sampleMatrix({ kind: 'goe' }, n, stream)) : spectrumOfEnsemble({ kind: 'goe' }, n, stream);
  let fourthTrace = 0;
  for (const x of values) fourthTrace += x * x * (x * x);
  return { resolvent: workload.z.map(([re, im]) => normalisedResolventTrace(values, complex(re, im))), fourthTrace };
}
