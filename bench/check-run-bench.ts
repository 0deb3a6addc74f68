import { isDeepStrictEqual } from 'node:util';
import { ReferenceAdapter } from '../adapters/reference-adapter.js';
import { parseEnsemble } from '../harness/numeric/ensemble.js';
import { workerPoolRunner } from '../harness/parallel/worker-pool.js';
import { resolveRunSettings } from '../harness/resolve-run-settings.js';
import { planGroups, runChecks, type ExecutionOptions } from '../harness/run-checks.js';
import type { RunRecipe } from '../harness/run-recipe.js';
import type { RunResult } from '../harness/run-result.js';
import { sampleCounts } from '../properties/fluctuations/fluctuation-design.js';
import { fluctuationsSuite } from '../properties/fluctuations.js';
import type { BenchmarkGroup, BenchmarkOptions, BenchmarkResult, BenchmarkRow } from './benchmark-group.js';

/** Fluctuation budget of the timed runs: the default, about fifteen seconds of work at N = 200 on one core (a short run would mostly time the workers starting). */
const BUDGET = 1;
const WORKER_COUNTS = [1, 2] as const;

/**
 * Whole runs of the harness: `check --suite fluctuations --ensemble goe` at each N on the reference
 * adapter, in this thread (1 worker) and on the harness's worker pool (2 workers, each with its
 * own adapter), as the CLI runs them. Rows are wall seconds per fluctuation sample (the main
 * group's count), with the cores kept busy (CPU time of every thread over wall time). The two
 * runs' results must be identical, or the benchmark stops: speed never at the price of the
 * figures. No numpy row: numpy has no such suite (the fluctuation-throughput group compares the
 * per-sample work with numpy).
 */
export const checkRunBench: BenchmarkGroup = {
  name: 'check-run',
  defaultSizes: [200],
  run: runCheckBench,
};

async function runCheckBench(options: BenchmarkOptions): Promise<BenchmarkResult> {
  const rows: BenchmarkRow[] = [];
  const notes: string[] = [];
  for (const n of options.sizes) {
    const settings = resolveRunSettings({ suites: ['fluctuations'], sizes: [n], ensembles: [parseEnsemble('goe')], budget: BUDGET });
    const recipe: RunRecipe = { settings, adapter: { timeoutSeconds: 60 } };
    const samples = sampleCounts('real', BUDGET).spectral;
    const results: RunResult[] = [];
    for (const workers of WORKER_COUNTS) {
      options.log(`check-run: N = ${n}, ${workers} worker(s)`);
      const execution: ExecutionOptions = workers === 1 ? {} : { runner: (groups) => workerPoolRunner(recipe, groups.map((g) => g.id), workers) };
      const adapter = new ReferenceAdapter();
      const cpu0 = process.cpuUsage();
      const t0 = performance.now();
      const result = await runChecks(adapter, settings, [fluctuationsSuite], {}, () => '', execution);
      const wall = (performance.now() - t0) / 1000;
      const cpu = process.cpuUsage(cpu0);
      await adapter.close();
      results.push(result);
      rows.push({
        routine: 'check --suite fluctuations (GOE)',
        n,
        unit: 'sample',
        workers,
        ours_s: wall / samples,
        cores_busy: (cpu.user + cpu.system) / 1e6 / wall,
        numpy_1thread_s: null,
        numpy_s: null,
      });
    }
    if (!isDeepStrictEqual(results[0], results[1])) throw new Error(`check-run: the results with 1 and 2 workers differ at N = ${n}`);
    const groups = planGroups(settings, [fluctuationsSuite]).length;
    notes.push(`N = ${n}: ${groups} groups, ${samples} samples in the main group, budget ${BUDGET}; the results with 1 and 2 workers are identical`);
  }
  const [one, two] = rows;
  if (one !== undefined && two !== undefined) notes.push(`speed-up with 2 workers at N = ${one.n}: ${(one.ours_s / two.ours_s).toFixed(2)}× (${WORKER_COUNTS.length} worker counts, one run each)`);
  return { rows, notes };
}
