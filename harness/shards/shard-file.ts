import { accessSync, constants, existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname } from 'node:path';
import { isDeepStrictEqual } from 'node:util';
import type { AdapterDescription } from '../../adapters/adapter.js';
import type { RunRecipe } from '../run-recipe.js';
import { TOOL_NAME, TOOL_VERSION } from '../tool-identity.js';
import type { UnitOutcome } from '../unit-outcome.js';
import type { ShardChoice, WorkUnit } from '../work-unit.js';
import { ExactJsonError, fromExactJson, toExactJson, type ExactJson } from './exact-json.js';

export const SHARD_FORMAT = 'rmt-assay shard';
export const SHARD_FORMAT_VERSION = 1;

/**
 * What `check --shard i/n` writes: the outcomes of its units (sample blocks' parts, whole groups'
 * findings, faults), with everything `merge` needs to check that the n files belong to one run and
 * to conclude as that run would. Numbers are kept exactly (exact-json.ts).
 */
export interface ShardRecord {
  readonly format: typeof SHARD_FORMAT;
  readonly formatVersion: number;
  readonly tool: { readonly name: string; readonly version: string };
  readonly shard: ShardChoice;
  readonly recipe: RunRecipe;
  readonly adapter: AdapterDescription;
  readonly adapterLog: string;
  /** The run's group ids in plan order: the same for every shard of one run. */
  readonly plan: readonly string[];
  readonly units: ReadonlyArray<{ readonly unit: WorkUnit; readonly outcome: UnitOutcome }>;
}

/** A shard file that cannot be read, or shard files that do not belong together. */
export class ShardFileError extends Error {}

export function shardRecord(fields: Omit<ShardRecord, 'format' | 'formatVersion' | 'tool'>): ShardRecord {
  return { format: SHARD_FORMAT, formatVersion: SHARD_FORMAT_VERSION, tool: { name: TOOL_NAME, version: TOOL_VERSION }, ...fields };
}

/** Checks before a shard runs that its file can be written, so that no computed work is lost at the end. */
export function ensureShardFileWritable(file: string): void {
  try {
    mkdirSync(dirname(file), { recursive: true });
    accessSync(existsSync(file) ? file : dirname(file), constants.W_OK);
  } catch (error) {
    throw new ShardFileError(`cannot write the shard file '${file}': ${(error as NodeJS.ErrnoException).code ?? (error as Error).message}`);
  }
}

/** Writes the record (creating the file's folder if need be); a failure names the file and the reason. */
export function writeShardFile(file: string, record: ShardRecord): void {
  try {
    mkdirSync(dirname(file), { recursive: true });
    writeFileSync(file, JSON.stringify(toExactJson(record)) + '\n');
  } catch (error) {
    throw new ShardFileError(`cannot write the shard file '${file}': ${(error as NodeJS.ErrnoException).code ?? (error as Error).message}`);
  }
}

/** An object, not null: what a member of a shard file that holds members must be (null would fail as a TypeError). */
function isObject<T>(value: T | null | undefined): value is T {
  return typeof value === 'object' && value !== null;
}

export function readShardFile(file: string): ShardRecord {
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch (error) {
    throw new ShardFileError(`cannot read the shard file '${file}': ${(error as NodeJS.ErrnoException).code ?? (error as Error).message}`);
  }
  let value: unknown;
  try {
    value = fromExactJson(JSON.parse(text) as ExactJson);
  } catch (error) {
    const why = error instanceof ExactJsonError || error instanceof SyntaxError ? error.message : String(error);
    throw new ShardFileError(`'${file}' is not a shard file: ${why}`);
  }
  const record = value as Partial<ShardRecord>;
  if (record === null || typeof record !== 'object' || record.format !== SHARD_FORMAT) {
    throw new ShardFileError(`'${file}' is not a shard file (written by check --shard I/N)`);
  }
  if (record.formatVersion !== SHARD_FORMAT_VERSION) {
    throw new ShardFileError(`'${file}' has shard format version ${String(record.formatVersion)}; this rmt-assay reads version ${SHARD_FORMAT_VERSION}`);
  }
  const { shard, recipe, adapter } = record;
  if (
    !isObject(shard) ||
    !Number.isInteger(shard.count) ||
    !Number.isInteger(shard.index) ||
    shard.index < 1 ||
    shard.index > shard.count ||
    !Array.isArray(record.units) ||
    !Array.isArray(record.plan) ||
    !isObject(recipe) ||
    !isObject(recipe.settings) ||
    !isObject(adapter) ||
    !Array.isArray(adapter.capabilities)
  ) {
    throw new ShardFileError(`'${file}' is damaged: its shard, plan, recipe, adapter or units are missing or malformed`);
  }
  return record as ShardRecord;
}

/**
 * Checks that the records are the n shards of one run: the same tool version, settings, adapter,
 * plan and shard count, each shard index exactly once. Returns them in shard order.
 */
export function shardsOfOneRun(records: ReadonlyArray<{ readonly file: string; readonly record: ShardRecord }>): ShardRecord[] {
  if (records.length === 0) throw new ShardFileError('merge needs at least one shard file');
  const [first] = records;
  const same: Array<[string, (r: ShardRecord) => unknown]> = [
    ['tool version', (r) => r.tool],
    ['settings (suites, sizes, samples, seed, ensembles, adapter options)', (r) => r.recipe.settings],
    ['baseline', (r) => r.recipe.baselineFile ?? null],
    ['implementation (name, version, capabilities)', (r) => r.adapter],
    ['number of shards', (r) => r.shard.count],
    ['plan', (r) => r.plan],
  ];
  for (const { file, record } of records.slice(1)) {
    for (const [what, of] of same) {
      if (!isDeepStrictEqual(of(record), of(first.record))) {
        throw new ShardFileError(`'${file}' and '${first.file}' are not shards of one run: they differ in ${what}`);
      }
    }
  }
  const count = first.record.shard.count;
  const byIndex = new Map<number, string>();
  for (const { file, record } of records) {
    const earlier = byIndex.get(record.shard.index);
    if (earlier !== undefined) throw new ShardFileError(`'${file}' and '${earlier}' are both shard ${record.shard.index}/${count}`);
    byIndex.set(record.shard.index, file);
  }
  const missing = Array.from({ length: count }, (_, i) => i + 1).filter((i) => !byIndex.has(i));
  if (missing.length > 0) throw new ShardFileError(`shard${missing.length > 1 ? 's' : ''} ${missing.map((i) => `${i}/${count}`).join(', ')} missing: merge needs all ${count}`);
  return [...records].sort((a, b) => a.record.shard.index - b.record.shard.index).map((r) => r.record);
}
