import type { CheckContext } from '../check-group.js';
import { ensembleLabel, type EnsembleSpec } from '../numeric/ensemble.js';
import { randomStream } from '../numeric/random-stream.js';

/**
 * The random streams of a baseline: the harness's streams and the seeds handed to an
 * implementation's sampler both derive from the baseline's own seed, not the run's, so a check
 * weeks later draws exactly what the recording drew (and an unchanged sampler reproduces it).
 */
export function baselineSeeded(context: Omit<CheckContext, 'stream' | 'derivedSeed'>, seed: number): CheckContext {
  return {
    ...context,
    stream: (key, index) => randomStream(seed, key, index),
    derivedSeed: (key, index) => randomStream(seed, `baseline-seed/${key}`, index).nextUint32(),
  };
}

/** The stream key of the sampled statistics of one ensemble and size. */
export function baselineSampleKey(ensemble: EnsembleSpec, size: number): string {
  return `baseline/${ensembleLabel(ensemble)}/N=${size}`;
}
