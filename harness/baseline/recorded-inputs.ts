import type { ProbeInputs } from '../compare/probe-inputs.js';
import type { ProbeOutput } from '../compare/probe-routines.js';
import type { Complex } from '../numeric/complex.js';
import type { BaselineFile, ComplexPair, RecordedOutput } from './baseline-file.js';

const complexOf = (p: ComplexPair): Complex => ({ re: p[0], im: p[1] });

/** The probe set a baseline was recorded on, as the comparison code takes it. */
export function recordedProbeInputs(baseline: BaselineFile): ProbeInputs {
  const i = baseline.inputs;
  return {
    matricesPerCase: i.matricesPerCase,
    points: i.points.map(complexOf),
    weights: i.weights,
    chains: i.chains.map((c) => ({ points: c.points.map(complexOf), weights: c.weights })),
    statisticPoints: i.statisticPoints.map(complexOf),
  };
}

/** A recorded output as the comparison code takes it: a spectrum, or traces. */
export function recordedProbeOutput(output: RecordedOutput): ProbeOutput {
  return output.routine === 'eigenvalues'
    ? Float64Array.from(output.values as readonly number[])
    : (output.values as readonly ComplexPair[]).map(complexOf);
}
