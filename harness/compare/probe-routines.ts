import type { Adapter, Capability } from '../../adapters/adapter.js';
import { chainErrorScale, referenceSpectrum, resolventErrorScale } from '../../properties/identities/error-scales.js';
import { formatComplex, type Complex } from '../numeric/complex.js';
import { eigenvalues } from '../numeric/eigen.js';
import type { SquareMatrix } from '../numeric/square-matrix.js';
import { spectrumAgreement, traceAgreement, type InputAgreement } from './input-agreement.js';
import { describeProbeChain, probeWeight, probeWeightNorm, type ProbeInputs } from './probe-inputs.js';

/** The per-matrix routines the probe set exercises, by their capability names. */
export type ProbeRoutine = Extract<Capability, 'eigenvalues' | 'resolvent_trace' | 'chain_trace'>;

export const PROBE_ROUTINES: readonly ProbeRoutine[] = ['eigenvalues', 'resolvent_trace', 'chain_trace'];

/**
 * One routine's outputs on one matrix: the spectrum, or the traces in a fixed order (resolvent:
 * weight by weight, point by point; chains: one trace each, in the order of the probe set).
 */
export type ProbeOutput = Float64Array | Complex[];

export async function probeOutputs(adapter: Adapter, routine: ProbeRoutine, matrix: SquareMatrix, inputs: ProbeInputs): Promise<ProbeOutput> {
  switch (routine) {
    case 'eigenvalues':
      return adapter.eigenvalues(matrix);
    case 'resolvent_trace': {
      const traces: Complex[] = [];
      for (const weight of inputs.weights) {
        traces.push(...(await adapter.resolventTrace(matrix, inputs.points, weight === 'identity' ? undefined : probeWeight(weight, matrix.size))));
      }
      return traces;
    }
    case 'chain_trace': {
      const traces: Complex[] = [];
      for (const chain of inputs.chains) {
        traces.push(await adapter.chainTrace(matrix, chain.points, chain.weights.map((w) => probeWeight(w, matrix.size))));
      }
      return traces;
    }
  }
}

/**
 * How two outputs of `routine` on `matrix` compare, against the rounding-error scales of
 * properties/identities/error-scales.ts summed over the two results (each may carry its own
 * error); the scales use the harness's own spectrum of the matrix, never either result.
 * The relative difference is normwise for a spectrum and per trace otherwise (the largest).
 */
export function probeAgreement(
  routine: ProbeRoutine,
  left: ProbeOutput,
  right: ProbeOutput,
  matrix: SquareMatrix,
  inputs: ProbeInputs,
  where: string,
): InputAgreement {
  const spectrum = referenceSpectrum(eigenvalues(matrix));
  if (routine === 'eigenvalues') return spectrumAgreement(left as Float64Array, right as Float64Array, spectrum.norm, where);
  const l = left as Complex[];
  const r = right as Complex[];
  const cases =
    routine === 'resolvent_trace'
      ? inputs.weights.flatMap((w) =>
          inputs.points.map((z) => ({
            scale: 2 * resolventErrorScale(spectrum, z, probeWeightNorm(w)),
            label: `⟨G(z)A⟩ at z = ${formatComplex(z)}, A = ${w === 'identity' ? 'I (no weight passed)' : 'D'}`,
          })),
        )
      : inputs.chains.map((c) => ({
          scale: 2 * chainErrorScale(spectrum, c.points, c.weights.map(probeWeightNorm)),
          label: `chain ${describeProbeChain(c)}`,
        }));
  let worst: InputAgreement | undefined;
  let largestRelative = 0;
  cases.forEach((c, k) => {
    const a = traceAgreement(l[k], r[k], c.scale, `${where}; ${c.label}`);
    if (worst === undefined || !(a.ratio <= worst.ratio)) worst = a;
    if (!(a.relativeDifference <= largestRelative)) largestRelative = a.relativeDifference;
  });
  return { ...worst!, relativeDifference: largestRelative };
}
