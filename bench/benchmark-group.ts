/**
 * One group of benchmarks: our routine side by side with a peer, timed in the same run. The
 * runner (run-bench.ts) only lists the groups; a new group is a new file exporting one of these.
 */
export interface BenchmarkOptions {
  /** Matrix orders to time. */
  readonly sizes: readonly number[];
  /** Progress lines go here (stderr), never to the table or the JSON. */
  readonly log: (line: string) => void;
}

/**
 * One timed row. Seconds are the best of several repetitions (wall clock); null where the peer is
 * absent. `unit` says what the seconds are for: one call of the routine ('call'), or one sample of
 * a throughput loop ('sample'; samples per second = 1/seconds). `workers` is how many workers ran
 * our side (1: in this process, single-threaded).
 */
export interface BenchmarkRow {
  readonly routine: string;
  readonly n: number;
  readonly unit: 'call' | 'sample';
  readonly workers: number;
  readonly ours_s: number;
  /** CPU seconds of every thread over wall seconds on our side: the cores it kept busy (null if not measured). */
  readonly cores_busy: number | null;
  readonly numpy_1thread_s: number | null;
  readonly numpy_s: number | null;
}

export interface BenchmarkResult {
  readonly rows: readonly BenchmarkRow[];
  /** Free-form notes printed under the table: the peer's BLAS configuration, or why it is absent. */
  readonly notes: readonly string[];
}

export interface BenchmarkGroup {
  readonly name: string;
  readonly defaultSizes: readonly number[];
  run(options: BenchmarkOptions): Promise<BenchmarkResult>;
}
