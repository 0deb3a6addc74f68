import { NotAvailable, type Adapter } from '../../adapters/adapter.js';
import { RATIO_THRESHOLD } from '../../properties/identities/error-scales.js';
import { DEFAULT_PROBE_INPUTS, probeMatrix, type ProbeInputs } from '../compare/probe-inputs.js';
import { PROBE_ROUTINES, probeOutputs, type ProbeOutput } from '../compare/probe-routines.js';
import { sampleTraceStatistics } from '../compare/sampled-trace-statistics.js';
import type { Complex } from '../numeric/complex.js';
import { ensembleLabel, type EnsembleSpec } from '../numeric/ensemble.js';
import { resolveRunSettings } from '../resolve-run-settings.js';
import { TOOL_NAME, TOOL_VERSION } from '../tool-identity.js';
import { BASELINE_FORMAT, BASELINE_FORMAT_VERSION, type BaselineFile, type ComplexPair, type RecordedOutput, type RecordedSample } from './baseline-file.js';
import { baselineSampleKey, baselineSeeded } from './baseline-seeds.js';
import { inputFingerprint } from './input-fingerprint.js';
import { traceMoments } from './trace-moments.js';

export interface BaselineRecordOptions {
  readonly seed: number;
  readonly sizes: readonly number[];
  readonly ensembles: readonly EnsembleSpec[];
  /** Samples per ensemble and size for the statistics. */
  readonly samples: number;
  /** Ratio threshold for the deterministic comparisons later (default: the identities suite's). */
  readonly threshold?: number;
  /** The CLI words that select the implementation, kept in the file for people. */
  readonly adapterArguments?: string;
  readonly inputs?: ProbeInputs;
}

const pair = (z: Complex): ComplexPair => [z.re, z.im];

function recordedValues(output: ProbeOutput): RecordedOutput['values'] {
  return output instanceof Float64Array ? Array.from(output) : output.map(pair);
}

/** null when the implementation cannot answer (NotAvailable): nothing is recorded for that case. */
async function unlessNotAvailable<T>(call: () => Promise<T>): Promise<T | null> {
  try {
    return await call();
  } catch (error) {
    if (error instanceof NotAvailable) return null;
    throw error;
  }
}

/**
 * Runs an implementation on the fixed, seeded probe set and records what it returns: each
 * per-matrix routine it offers on every probe matrix (with the matrix's fingerprint), and, where it
 * draws its own matrices, the moments of Re and Im Tr G(z) over `samples` draws. An adapter fault
 * propagates: a baseline is only written whole.
 */
export async function recordBaseline(adapter: Adapter, options: BaselineRecordOptions): Promise<BaselineFile> {
  const inputs = options.inputs ?? DEFAULT_PROBE_INPUTS;
  const description = await adapter.describe();
  const capabilities = new Set(description.capabilities);
  const context = baselineSeeded({ adapter, capabilities, settings: resolveRunSettings({ seed: options.seed }) }, options.seed);
  const outputs: RecordedOutput[] = [];
  const statistics: RecordedSample[] = [];
  for (const ensemble of options.ensembles) {
    for (const size of options.sizes) {
      for (const routine of PROBE_ROUTINES.filter((r) => capabilities.has(r))) {
        for (let matrix = 0; matrix < inputs.matricesPerCase; matrix++) {
          const h = probeMatrix(options.seed, ensemble, size, matrix);
          const output = await unlessNotAvailable(() => probeOutputs(adapter, routine, h, inputs));
          if (output === null) break;
          outputs.push({ routine, ensemble: ensembleLabel(ensemble), size, matrix, inputFingerprint: inputFingerprint(h), values: recordedValues(output) });
        }
      }
      if (!capabilities.has('sample') && !capabilities.has('sample_statistics')) continue;
      const sample = await unlessNotAvailable(() =>
        sampleTraceStatistics(context, baselineSampleKey(ensemble, size), ensemble, size, options.samples, inputs.statisticPoints),
      );
      if (sample === null) continue;
      statistics.push({ ensemble: ensembleLabel(ensemble), size, count: sample.count, path: sample.path, moments: traceMoments(sample, inputs.statisticPoints) });
    }
  }
  return {
    format: BASELINE_FORMAT,
    formatVersion: BASELINE_FORMAT_VERSION,
    tool: { name: TOOL_NAME, version: TOOL_VERSION },
    adapter: { name: description.name, version: description.version, kind: description.kind, capabilities: description.capabilities },
    adapterArguments: options.adapterArguments ?? '',
    seed: options.seed,
    sizes: options.sizes,
    ensembles: options.ensembles.map(ensembleLabel),
    samples: options.samples,
    threshold: options.threshold ?? RATIO_THRESHOLD,
    inputs: {
      matricesPerCase: inputs.matricesPerCase,
      points: inputs.points.map(pair),
      weights: inputs.weights,
      chains: inputs.chains.map((c) => ({ points: c.points.map(pair), weights: c.weights })),
      statisticPoints: inputs.statisticPoints.map(pair),
    },
    outputs,
    statistics,
  };
}
