import { writeFileSync } from 'node:fs';
import type { BenchmarkGroup, BenchmarkRow } from './benchmark-group.js';
import { eigenBench } from './eigen-bench.js';
import { fluctuationThroughputBench } from './fluctuation-throughput-bench.js';
import { inProcessRunner, workerThreadsRunner } from './throughput-runner.js';
import { tridiagonalModelBench } from './tridiagonal-model-bench.js';
import { checkRunBench } from './check-run-bench.js';

/**
 * `npm run bench [-- --sizes 200,500] [--json FILE] [--group NAME]`: runs each benchmark group,
 * prints a table (ours, the peer, ratios ours/peer) and optionally writes the rows as JSON.
 * --sizes applies to every group run (pair it with --group). A new group is a file under bench/
 * exporting a BenchmarkGroup, added to GROUPS. The fluctuation-throughput group times each runner
 * of throughput-runner.ts (in process, and two worker threads); check-run times whole runs of the
 * harness with its worker pool at 1 and 2 workers.
 */
const GROUPS: readonly BenchmarkGroup[] = [
  eigenBench,
  tridiagonalModelBench,
  fluctuationThroughputBench([inProcessRunner, workerThreadsRunner(2)]),
  checkRunBench,
];

interface Arguments {
  readonly sizes: number[] | null;
  readonly json: string | null;
  readonly group: string | null;
}

function parseArguments(argv: readonly string[]): Arguments {
  let sizes: number[] | null = null;
  let json: string | null = null;
  let group: string | null = null;
  for (let i = 0; i < argv.length; i++) {
    const flag = argv[i];
    const value = argv[i + 1];
    if (flag === '--sizes' && value !== undefined) {
      sizes = value.split(',').map((s) => Number(s.trim()));
      if (sizes.some((n) => !Number.isInteger(n) || n < 1)) throw new Error(`--sizes wants positive integers, got ${value}`);
      i++;
    } else if (flag === '--json' && value !== undefined) {
      json = value;
      i++;
    } else if (flag === '--group' && value !== undefined) {
      group = value;
      i++;
    } else {
      throw new Error(`unknown or incomplete option ${flag}; options: --sizes N,N,… --json FILE --group NAME`);
    }
  }
  return { sizes, json, group };
}

function seconds(x: number | null): string {
  if (x === null) return 'n/a';
  return x < 1 ? `${(x * 1000).toFixed(1)} ms` : `${x.toFixed(2)} s`;
}

/** Ours/peer in time (how many times slower ours is); two digits below 0.1 so a large speed-up still reads. */
function ratio(ours: number, peer: number | null): string {
  if (peer === null) return 'n/a';
  const r = ours / peer;
  return `${r < 0.1 ? r.toPrecision(2) : r.toFixed(1)}×`;
}

/** Seconds per call, or for a throughput row seconds per sample followed by samples per second. */
function timeCell(x: number | null, unit: BenchmarkRow['unit']): string {
  if (x === null || unit === 'call') return seconds(x);
  return `${seconds(x)} (${(1 / x).toFixed(x < 0.01 ? 0 : 1)}/s)`;
}

function table(rows: readonly BenchmarkRow[]): string {
  const header = ['routine', 'N', 'workers', 'ours', 'cores busy', 'numpy 1 thread', 'ours/numpy 1t', 'numpy', 'ours/numpy'];
  const body = rows.map((r) => [
    r.routine,
    String(r.n),
    String(r.workers),
    timeCell(r.ours_s, r.unit),
    r.cores_busy === null ? '' : r.cores_busy.toFixed(2),
    timeCell(r.numpy_1thread_s, r.unit),
    ratio(r.ours_s, r.numpy_1thread_s),
    timeCell(r.numpy_s, r.unit),
    ratio(r.ours_s, r.numpy_s),
  ]);
  const widths = header.map((h, c) => Math.max(h.length, ...body.map((row) => row[c].length)));
  const line = (cells: string[]): string => cells.map((cell, c) => (c < 1 ? cell.padEnd(widths[c]) : cell.padStart(widths[c]))).join('  ');
  return [line(header), widths.map((w) => '-'.repeat(w)).join('  '), ...body.map(line)].join('\n');
}

async function main(): Promise<void> {
  const args = parseArguments(process.argv.slice(2));
  const groups = args.group === null ? GROUPS : GROUPS.filter((g) => g.name === args.group);
  if (groups.length === 0) throw new Error(`no benchmark group named ${args.group}; groups: ${GROUPS.map((g) => g.name).join(', ')}`);
  const allRows: BenchmarkRow[] = [];
  for (const group of groups) {
    const result = await group.run({ sizes: args.sizes ?? [...group.defaultSizes], log: (line) => console.error(line) });
    const perSample = result.rows.some((r) => r.unit === 'sample') ? '; throughput rows: seconds per sample (samples per second)' : '';
    console.log(`\n${group.name} (best of several runs, wall clock; ours on Node ${process.versions.node}${perSample})\n`);
    console.log(table(result.rows));
    for (const note of result.notes) console.log(`\n${note}`);
    allRows.push(...result.rows);
  }
  if (args.json !== null) {
    writeFileSync(args.json, `${JSON.stringify(allRows, null, 2)}\n`);
    console.error(`wrote ${args.json}`);
  }
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exitCode = 1;
});
