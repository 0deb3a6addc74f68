import { existsSync } from 'node:fs';
import { resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import type { Complex } from '../harness/numeric/complex.js';
import type { EnsembleSpec } from '../harness/numeric/ensemble.js';
import { expectedDataLength, type SquareMatrix } from '../harness/numeric/square-matrix.js';
import {
  AdapterFault,
  EnsembleNotOffered,
  NotAvailable,
  type Adapter,
  type AdapterDescription,
  type Capability,
  type ChainSpec,
} from './adapter.js';
import { checkedComplex, checkedComplexList, checkedComplexRows, checkedRealList, describeValue } from './result-checks.js';
import { ensembleLabel } from '../harness/numeric/ensemble.js';

/** A pair [re, im], as the module interface and the process protocol carry complex numbers. */
export type ComplexPair = [number, number];

/**
 * What a user's JavaScript module exports (all optional; what it exports is what it offers):
 * - `name`, `version`: strings for the report;
 * - `eigenvalues(matrix)` → ascending eigenvalues (array or Float64Array);
 * - `resolventTrace(matrix, points, weight?)` → ⟨G(z)A⟩ per point, as [re, im] pairs;
 * - `chainTrace(matrix, points, weights)` → ⟨G(z1)A1 ⋯ G(zk)Ak⟩ as [re, im];
 * - `sample(ensemble, size, seed, count)` → matrices, or null for an ensemble it does not offer;
 * - `covariance(ensemble, left, right)` → the limiting covariance it claims for the Tr statistics of
 *   two chains `{ points: [re, im][], weights: matrices }`, as [re, im], or null for a case it does
 *   not offer;
 * - `sampleStatistics(ensemble, size, seed, count, statistics)` → per sample, per chain, the
 *   normalised trace ⟨G(z1)A1 ⋯ G(zk)Ak⟩ as [re, im] (1 for a chain with no points), from `count`
 *   matrices it draws itself; null for an ensemble it does not offer.
 * A matrix is `{ size, field: 'real' | 'complex', data: Float64Array }`, row-major, complex entries
 * interleaved (re, im). Functions may be async.
 */
export interface KernelModule {
  name?: string;
  version?: string;
  eigenvalues?(matrix: SquareMatrix): unknown;
  resolventTrace?(matrix: SquareMatrix, points: ComplexPair[], weight?: SquareMatrix): unknown;
  chainTrace?(matrix: SquareMatrix, points: ComplexPair[], weights: SquareMatrix[]): unknown;
  sample?(ensemble: EnsembleSpec, size: number, seed: number, count: number): unknown;
  covariance?(ensemble: EnsembleSpec, left: ModuleChain, right: ModuleChain): unknown;
  sampleStatistics?(ensemble: EnsembleSpec, size: number, seed: number, count: number, statistics: ModuleChain[]): unknown;
}

/** A chain as the module interface carries it: points as [re, im] pairs. */
export interface ModuleChain {
  points: ComplexPair[];
  weights: SquareMatrix[];
}

const ROUTINES: ReadonlyArray<[keyof KernelModule, Capability]> = [
  ['eigenvalues', 'eigenvalues'],
  ['resolventTrace', 'resolvent_trace'],
  ['chainTrace', 'chain_trace'],
  ['sample', 'sample'],
  ['covariance', 'covariance'],
  ['sampleStatistics', 'sample_statistics'],
];

/** Thrown when the module cannot be used at all (missing file, syntax error, nothing exported). */
export class ModuleLoadError extends Error {
  override readonly name = 'ModuleLoadError';
}

function pairs(points: readonly Complex[]): ComplexPair[] {
  return points.map((z) => [z.re, z.im]);
}

/**
 * An implementation in the same process: a JavaScript module loaded by path. Its results go
 * through the same checks as any other adapter's (counts, finiteness, shapes); an exception it
 * throws becomes an adapter fault for the check that called it. Being in-process, it cannot be
 * protected against a routine that never returns: use the process adapter for code that may hang.
 */
export class ModuleAdapter implements Adapter {
  private constructor(
    private readonly kernel: KernelModule,
    private readonly path: string,
  ) {}

  static async load(file: string): Promise<ModuleAdapter> {
    const path = resolve(file);
    if (!existsSync(path)) throw new ModuleLoadError(`module not found: ${file}`);
    if (/\.(c|m)?tsx?$/.test(path)) {
      throw new ModuleLoadError(`${file} is TypeScript: compile it first (tsc) and pass the built .js file`);
    }
    let kernel: KernelModule;
    try {
      kernel = (await import(pathToFileURL(path).href)) as KernelModule;
    } catch (error) {
      throw new ModuleLoadError(`cannot load module ${file}: ${(error as Error).message.split('\n')[0]}`);
    }
    return ModuleAdapter.fromKernel(kernel, `module ${file}`, path);
  }

  /**
   * An implementation given as an object with a module's exports: a TypeScript lab's own tests can
   * pass its kernel without building a file first. `label` names it in errors; `name` in reports
   * where the kernel has no `name` of its own.
   */
  static fromKernel(kernel: KernelModule, label = 'the kernel', name = 'in-memory kernel'): ModuleAdapter {
    if (!ROUTINES.some(([key]) => typeof kernel[key] === 'function')) {
      throw new ModuleLoadError(`${label} exports none of ${ROUTINES.map(([key]) => key).join(', ')}`);
    }
    return new ModuleAdapter(kernel, name);
  }

  async describe(): Promise<AdapterDescription> {
    return {
      name: typeof this.kernel.name === 'string' ? this.kernel.name : this.path,
      version: typeof this.kernel.version === 'string' ? this.kernel.version : 'unversioned',
      kind: 'module',
      capabilities: ROUTINES.filter(([key]) => typeof this.kernel[key] === 'function').map(([, cap]) => cap),
    };
  }

  private async call(method: string, run: () => unknown): Promise<unknown> {
    try {
      return await run();
    } catch (error) {
      throw new AdapterFault(method, 'implementation-error', `threw: ${(error as Error)?.message ?? String(error)}`);
    }
  }

  async eigenvalues(matrix: SquareMatrix): Promise<Float64Array> {
    const result = await this.call('eigenvalues', () => this.kernel.eigenvalues!(copy(matrix)));
    return checkedRealList('eigenvalues', result, matrix.size);
  }

  async resolventTrace(matrix: SquareMatrix, points: readonly Complex[], weight?: SquareMatrix): Promise<Complex[]> {
    const result = await this.call('resolvent_trace', () =>
      this.kernel.resolventTrace!(copy(matrix), pairs(points), weight === undefined ? undefined : copy(weight)),
    );
    return checkedComplexList('resolvent_trace', result, points.length);
  }

  async chainTrace(matrix: SquareMatrix, points: readonly Complex[], weights: readonly SquareMatrix[]): Promise<Complex> {
    const result = await this.call('chain_trace', () => this.kernel.chainTrace!(copy(matrix), pairs(points), weights.map(copy)));
    return checkedComplex('chain_trace', result);
  }

  async sample(ensemble: EnsembleSpec, size: number, seed: number, count: number): Promise<SquareMatrix[]> {
    const result = await this.call('sample', () => this.kernel.sample!(ensemble, size, seed, count));
    if (result === null || result === undefined) throw new EnsembleNotOffered(ensembleLabel(ensemble));
    if (!Array.isArray(result) || result.length !== count) {
      throw new AdapterFault('sample', 'malformed-response', `expected ${count} matrices, got ${describeValue(result)}`);
    }
    return result.map((m, i) => checkedMatrix(m, size, i));
  }

  async covariance(ensemble: EnsembleSpec, left: ChainSpec, right: ChainSpec): Promise<Complex> {
    const result = await this.call('covariance', () => this.kernel.covariance!(ensemble, chainCopy(left), chainCopy(right)));
    if (result === null || result === undefined) throw new NotAvailable('the implementation does not offer this covariance');
    return checkedComplex('covariance', result);
  }

  async sampleStatistics(ensemble: EnsembleSpec, size: number, seed: number, count: number, statistics: readonly ChainSpec[]): Promise<Complex[][]> {
    const result = await this.call('sample_statistics', () => this.kernel.sampleStatistics!(ensemble, size, seed, count, statistics.map(chainCopy)));
    if (result === null || result === undefined) throw new EnsembleNotOffered(ensembleLabel(ensemble));
    return checkedComplexRows('sample_statistics', result, count, statistics.length);
  }

  async close(): Promise<void> {}
}

function chainCopy(chain: ChainSpec): ModuleChain {
  return { points: pairs(chain.points), weights: chain.weights.map(copy) };
}

/** The implementation gets its own copy, so a routine that writes into its input cannot corrupt the harness's. */
function copy(m: SquareMatrix): SquareMatrix {
  return { field: m.field, size: m.size, data: Float64Array.from(m.data) };
}

function checkedMatrix(value: unknown, size: number, index: number): SquareMatrix {
  const m = value as Partial<SquareMatrix> | null;
  const field = m?.field;
  if (m === null || typeof m !== 'object' || (field !== 'real' && field !== 'complex') || m.size !== size || !(m.data instanceof Float64Array)) {
    throw new AdapterFault('sample', 'malformed-response', `matrix ${index} is not {size: ${size}, field, data: Float64Array}`);
  }
  if (m.data.length !== expectedDataLength(field, size)) {
    throw new AdapterFault('sample', 'malformed-response', `matrix ${index} has ${m.data.length} numbers, expected ${expectedDataLength(field, size)}`);
  }
  for (let k = 0; k < m.data.length; k++) {
    if (!Number.isFinite(m.data[k])) throw new AdapterFault('sample', 'invalid-value', `matrix ${index} holds ${m.data[k]} at position ${k}`);
  }
  return { field, size, data: m.data };
}
