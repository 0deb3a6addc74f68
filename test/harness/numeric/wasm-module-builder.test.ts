import { describe, expect, it } from 'vitest';
import { op, wasmModule, type ValueType } from '../../../harness/numeric/wasm-module-builder.js';

/**
 * The module encoder on small functions whose results are known, run by the engine's own
 * WebAssembly implementation (the independent check: it validates the bytes against the
 * specification and executes them). Covers what the SIMD kernel does not exercise: LEB128
 * immediates above 127 and negative ones, more than 127 locals, several functions per module.
 */
interface Api {
  validate(bytes: Uint8Array): boolean;
  Memory: new (descriptor: { initial: number }) => { readonly buffer: ArrayBuffer };
  Module: new (bytes: Uint8Array) => object;
  Instance: new (module: object, imports: object) => { readonly exports: Record<string, (...args: number[]) => void> };
}
const wasm = (globalThis as unknown as { WebAssembly: Api }).WebAssembly;

function instantiate(functions: Parameters<typeof wasmModule>[0]): { run: Record<string, (...args: number[]) => void>; memory: Float64Array } {
  const bytes = wasmModule(functions);
  expect(wasm.validate(bytes)).toBe(true);
  const memory = new wasm.Memory({ initial: 1 });
  const instance = new wasm.Instance(new wasm.Module(bytes), { env: { memory } });
  return { run: instance.exports, memory: new Float64Array(memory.buffer) };
}

describe('wasmModule', () => {
  it('pairwise f64x2 arithmetic: out = a·b − c + a, lane sums, in place at byte addresses', () => {
    const params: ValueType[] = ['i32', 'i32', 'i32', 'i32'];
    const [A, B, C, OUT] = [0, 1, 2, 3];
    const load = (base: number) => [...op.localGet(base), ...op.v128Load()];
    const body = [
      ...op.localGet(OUT),
      ...load(A), ...load(B), ...op.f64x2Mul, ...load(C), ...op.f64x2Sub, ...load(A), ...op.f64x2Add,
      ...op.v128Store(),
      // out[2] = lane 0 + lane 1 of a (offset 16 bytes).
      ...op.localGet(OUT),
      ...load(A), ...op.f64x2ExtractLane(0), ...load(A), ...op.f64x2ExtractLane(1), ...op.f64Add,
      ...op.f64Store(16),
    ];
    const { run, memory } = instantiate([{ name: 'combine', params, locals: [], body }]);
    memory.set([1.5, -2, 4, 0.25, 3, 5], 0);
    run.combine(0, 16, 32, 48);
    expect(Array.from(memory.subarray(6, 9))).toEqual([1.5 * 4 - 3 + 1.5, -2 * 0.25 - 5 - 2, 1.5 - 2]);
  });

  it('large and negative constants, 130 locals, a counted loop, and a second function', () => {
    // SUM = Σ_{k=0}^{299} (k − 5) = 44 850 − 1500 = 43 350 in an i32 local with index 128 (a two-byte
    // LEB128 index); the pair of doubles at OUT, doubled through local 130, is stored at byte
    // address SUM, so reading it back there checks the loop, the constants and the indices at once.
    const locals: ValueType[] = [...Array.from<ValueType>({ length: 129 }, () => 'i32'), 'v128'];
    const [OUT, K, SUM, V] = [0, 1, 128, 130];
    const body = [
      ...op.i32Const(0), ...op.localSet(K),
      ...op.i32Const(0), ...op.localSet(SUM),
      ...op.block, ...op.loop,
      ...op.localGet(K), ...op.i32Const(300), ...op.i32GeS, ...op.brIf(1),
      ...op.localGet(SUM), ...op.localGet(K), ...op.i32Const(-5), ...op.i32Add, ...op.i32Add, ...op.localSet(SUM),
      ...op.localGet(K), ...op.i32Const(1), ...op.i32Add, ...op.localSet(K),
      ...op.br(0),
      ...op.end, ...op.end,
      ...op.localGet(SUM), ...op.localGet(OUT), ...op.v128Load(), ...op.localTee(V), ...op.localGet(V), ...op.f64x2Add, ...op.v128Store(),
    ];
    const twice = [...op.localGet(0), ...op.localGet(0), ...op.f64Load(), ...op.localGet(0), ...op.f64Load(), ...op.f64Add, ...op.f64Store(8)];
    const { run, memory } = instantiate([
      { name: 'count', params: ['i32'], locals, body },
      { name: 'twice', params: ['i32'], locals: [], body: twice },
    ]);
    memory.set([3, -7], 0);
    run.count(0);
    const bytes = new DataView(memory.buffer);
    expect([bytes.getFloat64(43_350, true), bytes.getFloat64(43_358, true)]).toEqual([6, -14]);
    run.twice(0);
    expect(memory[1]).toBe(6);
  });
});
