import { mkdirSync, writeFileSync } from 'node:fs';
import { dirname } from 'node:path';
import { ALL_CAPABILITIES, AdapterFault, type Capability } from '../../adapters/adapter.js';
import { baselineToJson } from '../baseline/baseline-json.js';
import { recordBaseline } from '../baseline/record-baseline.js';
import { shellQuote } from '../replay-command.js';
import type { TextSink } from '../reporters/reporter.js';
import { BASELINE_RECORD_OPTIONS } from './baseline-options.js';
import { resolveSettings, type CheckArguments } from './check-command.js';
import { withOptionDefaults } from './declare-options.js';
import { openAdapter } from './open-adapter.js';
import { CHECK_OPTIONS } from './option-table.js';
import { parseNameList } from './parse-values.js';
import { UsageError } from './usage-error.js';

/** `baseline record`'s arguments as yargs (and a config file) hand them over; undefined: not given. */
export interface BaselineRecordArguments {
  readonly out?: string;
  readonly threshold?: number;
  readonly module?: string;
  readonly exec?: string;
  readonly recorded?: string;
  readonly offer?: string;
  readonly timeout?: number;
  readonly size?: string | number;
  readonly samples?: number;
  readonly seed?: number;
  readonly ensemble?: string;
}

/**
 * `rmt-assay baseline record --out FILE`: runs the implementation on the fixed, seeded probe set
 * and writes the baseline. Exit 0 when written; a UsageError (exit 2) for bad usage or an
 * implementation that cannot run or faults while recording (no partial file is written).
 */
export async function runBaselineRecordCommand(given: BaselineRecordArguments, out: TextSink): Promise<number> {
  const args = withOptionDefaults(BASELINE_RECORD_OPTIONS, given);
  if (args.out === undefined || args.out.trim() === '') throw new UsageError('baseline record needs --out FILE');
  const threshold = Number(args.threshold);
  if (!(threshold > 0) || !Number.isFinite(threshold)) throw new UsageError(`--threshold must be a positive number, got '${args.threshold}'`);
  const timeout = Number(args.timeout);
  if (!(timeout > 0) || !Number.isFinite(timeout)) throw new UsageError(`--timeout must be a positive number of seconds, got '${args.timeout}'`);
  const settings = resolveSettings(withOptionDefaults(CHECK_OPTIONS, { ...args }) as unknown as CheckArguments, '');
  const offer = args.offer === undefined ? undefined : (parseNameList('offer', args.offer, ALL_CAPABILITIES) as Capability[]);
  const opened = await openAdapter({ module: args.module, exec: args.exec, recorded: args.recorded, offer, timeoutSeconds: timeout });
  try {
    const baseline = await recordBaseline(opened.adapter, {
      seed: settings.seed,
      sizes: settings.sizes,
      ensembles: settings.ensembles,
      samples: settings.samples,
      threshold,
      adapterArguments: opened.arguments,
    }).catch((error: unknown) => {
      if (error instanceof AdapterFault) throw new UsageError(`cannot record the baseline: the implementation faulted in ${error.method}: ${error.message}`);
      throw error;
    });
    mkdirSync(dirname(args.out), { recursive: true });
    writeFileSync(args.out, baselineToJson(baseline));
    const log = opened.log();
    out.write(
      `rmt-assay baseline · ${baseline.adapter.name} ${baseline.adapter.version} (${baseline.adapter.kind}) · ` +
        `${baseline.outputs.length} per-matrix outputs, ${baseline.statistics.length} sampled statistics sets ` +
        `(seed ${baseline.seed}, N = ${baseline.sizes.join(', ')}, ${baseline.ensembles.join(', ')}, ${baseline.samples} samples) → ${args.out}\n` +
        `check a later version with: ${['npx rmt-assay check', opened.arguments, `--baseline ${shellQuote(args.out)}`].filter((w) => w !== '').join(' ')}\n` +
        (log === '' ? '' : `implementation's log:\n${log}\n`),
    );
    return 0;
  } finally {
    await opened.adapter.close();
  }
}
