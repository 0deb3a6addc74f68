/**
 * rmt-assay's programmatic API: run the suites on an implementation from a program or a test
 * suite and get the result model; compare two implementations; record and check baselines; write
 * reports. The CLI is built on the same functions.
 */

// Running checks
export { runChecks, type ExecutionOptions, type RunProgress } from './run-checks.js';
export { resolveRunSettings, type RunOptions } from './resolve-run-settings.js';
export { DEFAULT_ALPHA, DEFAULT_BUDGET, DEFAULT_LADDER, DEFAULT_SAMPLES, DEFAULT_SEED, DEFAULT_SIZES, type RunSettings } from './run-settings.js';
export { SUITES, suiteNames } from '../properties/suite-registry.js';
export type { CheckContext, CheckFinding, CheckGroup, ConcludeContext, PlannedCheck, PropertySuite, SampledGroup, WholeGroup } from './check-group.js';
export { SAMPLE_BLOCK, type SampledWork } from './sampled-work.js';

// Worker threads and shards
export { workerPoolRunner, workerThreadsAvailable, WorkerPoolError } from './parallel/worker-pool.js';
export type { RunRecipe } from './run-recipe.js';
export type { ShardChoice } from './work-unit.js';
export { runShard } from './shards/run-shard.js';
export { mergeShards } from './shards/merge-shards.js';
export { readShardFile, shardsOfOneRun, ShardFileError, writeShardFile, type ShardRecord } from './shards/shard-file.js';

// Implementations
export {
  ALL_CAPABILITIES,
  AdapterFault,
  EnsembleNotOffered,
  NotAvailable,
  type Adapter,
  type AdapterDescription,
  type AdapterFaultKind,
  type Capability,
  type ChainSpec,
} from '../adapters/adapter.js';
export { ReferenceAdapter } from '../adapters/reference-adapter.js';
export { ModuleAdapter, ModuleLoadError, type KernelModule, type ModuleChain } from '../adapters/module-adapter.js';
export { ProcessAdapter } from '../adapters/process/process-adapter.js';
export type { ProcessAdapterOptions } from '../adapters/process/process-adapter-options.js';
export { RecordedAdapter, RecordingError } from '../adapters/recorded/recorded-adapter.js';
export { offeringOnly } from '../adapters/capability-filter.js';

// What the adapters pass around
export type { Complex } from './numeric/complex.js';
export type { SquareMatrix, Field } from './numeric/square-matrix.js';
export { ensembleLabel, parseEnsemble, type EnsembleSpec } from './numeric/ensemble.js';

// The result model
export { RESULT_FORMAT_VERSION, type RunResult, type SuiteResult } from './run-result.js';
export type { CheckVerdict, VerdictState } from './verdict.js';
export type { DeterministicEvidence, Evidence, Quantity, StatisticalEvidence } from './evidence.js';
export type { Exhibit } from './exhibit.js';

// Reporters
export type { Reporter, TextSink } from './reporters/reporter.js';
export { formatTerminalSummary, terminalReporter, type TerminalStyle } from './reporters/terminal-reporter.js';
export { jsonReporter, resultToJson } from './reporters/json-reporter.js';
export { formatJunitXml, junitReporter } from './reporters/junit-reporter.js';
export { formatHtmlReport, htmlReporter } from './reporters/html-reporter.js';
export { fileReporter, REPORT_FORMATS, type ReportFormat } from './reporters/reporter-registry.js';
export { fileSink } from './reporters/file-sink.js';

// Two implementations side by side
export { runComparison, type ComparisonOptions } from './compare/run-comparison.js';
export type { ComparedSide, ComparisonResult, RoutineAgreement } from './compare/comparison-result.js';
export { formatComparisonSummary } from './reporters/comparison-summary.js';

// Regression baselines
export { recordBaseline, type BaselineRecordOptions } from './baseline/record-baseline.js';
export { BaselineError, loadBaseline, validateBaseline } from './baseline/load-baseline.js';
export { baselineToJson } from './baseline/baseline-json.js';
export { BASELINE_SUITE_NAME, baselineSuite } from './baseline/baseline-suite.js';
export type { BaselineFile } from './baseline/baseline-file.js';

// Inside a test suite
export { assertConforms, expectConformance, type ConformanceOptions } from './vitest/expect-conformance.js';
export { conformanceFailureMessage } from './vitest/conformance-failure-message.js';
