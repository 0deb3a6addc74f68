import { op, wasmModule, type ValueType } from './wasm-module-builder.js';

/**
 * The inner loop of the fused Householder sweep of tridiagonalise-real.ts, compiled to WebAssembly
 * with 128-bit SIMD (two doubles per instruction), for the off-diagonal rectangles of the sweep.
 *
 * What it computes: on the packed lower triangle p (packed row i = column i of the lower triangle,
 * entry (i, j), j ≥ i, at rowOffset(i) + j), for blocks of ROWS rows i = first, first + ROWS, …
 * (while i + ROWS ≤ N) and, in each block, the columns j from i + ROWS (+1 when N − i − ROWS is
 * odd, so the columns come in pairs) to N − 1:
 *   p(r, j) ← p(r, j) − v_r w_j − w_r v_j,   q_r += p(r, j) u_j,   q_j += p(r, j) u_r
 * for each row r of the block — the rank-2 update of one Householder step fused with the next
 * step's matrix–vector product (see tridiagonalise-real.ts). The caller does the diagonal triangles,
 * the unpaired column and the rows left over; those touch other entries of p, and their
 * contributions to q add to the kernel's. The floating-point operations per entry are those of the
 * scalar loop, in the same order for p; q's sums are grouped differently (rounding-level changes).
 *
 * Why: V8 runs the scalar loop at one double per instruction with a bounds check on every array
 * access; the same loop on pairs of doubles, in linear memory without bounds checks, is about 3×
 * faster: the whole reduction at N = 1000 took 0.18–0.24 s of CPU time with the kernel against
 * 0.61–0.74 s with the scalar loop (best of 5, the two alternating in one process, on this
 * project's shared 2-core machine; blocks of 2, 6 or 8 rows were no faster than 4). The arrays live
 * in the kernel's memory (`workspace`), so nothing is copied between the JavaScript steps and the
 * kernel.
 *
 * Availability: WebAssembly with the fixed-width SIMD proposal (standard since the WebAssembly 2.0
 * specification, 2022; on by default in Node ≥ 16.4, from memory). Where the module does not validate,
 * `fusedSweepKernel()` returns null and the caller keeps its scalar loop.
 *
 * Reference: WebAssembly Core Specification 2.0 (W3C, 2022), §4.4.3 (vector instructions) and
 * §5.4.8 (their encoding).
 */
export const FUSED_SWEEP_ROWS = 4;

export interface FusedSweepWorkspace {
  /** Packed lower triangle, N(N + 1)/2 numbers. */
  readonly packed: Float64Array;
  /** Four vectors of length N (the reduction's v, u, w and q). */
  readonly vectors: readonly Float64Array[];
}

export interface FusedSweepKernel {
  /**
   * Arrays of order N in the kernel's memory (contents unspecified), or null when they do not fit
   * (32-bit WebAssembly memory ends at 4 GiB: N above about 32 000) or memory cannot grow. Views
   * from an earlier call become unusable when memory grows; take fresh ones for each reduction.
   * The memory keeps the size of the largest order reduced so far (16 MB for N = 2000).
   */
  workspace(n: number): FusedSweepWorkspace | null;
  /** The rectangles for blocks starting at `first` (see above); all arrays from the current workspace. */
  rectangles(n: number, first: number, firstOffset: number, p: Float64Array, v: Float64Array, w: Float64Array, u: Float64Array, q: Float64Array): void;
}

let cached: FusedSweepKernel | null | undefined;

/** The kernel, built once per thread; null where WebAssembly SIMD is not available. */
export function fusedSweepKernel(): FusedSweepKernel | null {
  if (cached === undefined) cached = buildKernel();
  return cached;
}

const PAGE = 65536;
/** 4 GiB in 64 KiB pages, the most a 32-bit WebAssembly memory can have (memory types, spec §3.2; section from memory). */
const MAX_PAGES = 65536;

/**
 * The part of the WebAssembly JavaScript API used here (W3C WebAssembly JavaScript Interface);
 * declared locally because the project's compiler settings (lib ES2022, Node types) do not
 * declare the global.
 */
interface WebAssemblyApi {
  validate(bytes: Uint8Array): boolean;
  Memory: new (descriptor: { initial: number; maximum: number }) => { readonly buffer: ArrayBuffer; grow(pages: number): number };
  Module: new (bytes: Uint8Array) => object;
  Instance: new (module: object, imports: object) => { readonly exports: Record<string, unknown> };
}

function buildKernel(): FusedSweepKernel | null {
  const wasm = (globalThis as { WebAssembly?: WebAssemblyApi }).WebAssembly;
  if (wasm === undefined) return null;
  const bytes = wasmModule([{ name: 'rectangles', ...rectanglesFunction(FUSED_SWEEP_ROWS) }]);
  if (!wasm.validate(bytes)) return null;
  const memory = new wasm.Memory({ initial: 1, maximum: MAX_PAGES });
  const instance = new wasm.Instance(new wasm.Module(bytes), { env: { memory } });
  const run = instance.exports.rectangles as (...args: number[]) => void;
  return {
    workspace(n) {
      const packedLength = (n * (n + 1)) / 2;
      // Each array starts on a 16-byte boundary.
      const stride = 2 * Math.ceil(n / 2);
      const doubles = 2 * Math.ceil(packedLength / 2) + 4 * stride;
      const needed = Math.ceil((8 * doubles) / PAGE);
      const pages = memory.buffer.byteLength / PAGE;
      if (needed > MAX_PAGES) return null;
      if (needed > pages) {
        try {
          memory.grow(needed - pages);
        } catch {
          // The engine could not reserve the memory (RangeError): the caller's scalar path allocates its own.
          return null;
        }
      }
      const buffer = memory.buffer;
      const packed = new Float64Array(buffer, 0, packedLength);
      const base = 2 * Math.ceil(packedLength / 2);
      const vectors = Array.from({ length: 4 }, (_, k) => new Float64Array(buffer, 8 * (base + k * stride), n));
      return { packed, vectors };
    },
    rectangles(n, first, firstOffset, p, v, w, u, q) {
      run(n, first, firstOffset, p.byteOffset, v.byteOffset, w.byteOffset, u.byteOffset, q.byteOffset);
    },
  };
}

/** The kernel's parameters, locals and instructions, for blocks of `rows` rows. */
function rectanglesFunction(rows: number): { params: ValueType[]; locals: ValueType[]; body: number[] } {
  const params: ValueType[] = ['i32', 'i32', 'i32', 'i32', 'i32', 'i32', 'i32', 'i32'];
  const [N, FIRST, FIRST_OFFSET, P, V, W, U, Q] = [0, 1, 2, 3, 4, 5, 6, 7];
  const locals: ValueType[] = [];
  const local = (type: ValueType): number => locals.push(type) + params.length - 1;
  const locals32 = (count: number): number[] => Array.from({ length: count }, () => local('i32'));
  const localsV = (count: number): number[] => Array.from({ length: count }, () => local('v128'));
  const [i, offset, j, jb, rowBase] = [local('i32'), local('i32'), local('i32'), local('i32'), local('i32')];
  const row = locals32(rows);
  const [va, wa, ua, s] = [localsV(rows), localsV(rows), localsV(rows), localsV(rows)];
  const [vj, wj, uj, x, qSum] = localsV(5);
  const get = op.localGet;
  const set = op.localSet;
  /** base + 8·index (byte address of element `index` of the array at `base`). */
  const address = (base: number, index: number): number[] => [...get(base), ...get(index), ...op.i32Const(3), ...op.i32Shl, ...op.i32Add];
  const splatOf = (base: number, a: number, target: number): number[] => [...address(base, i), ...op.f64Load(8 * a), ...op.f64x2Splat, ...set(target)];
  const perRow = (f: (a: number) => number[]): number[] => Array.from({ length: rows }, (_, a) => f(a)).flat();

  const pairLoop = [
    ...op.block,
    ...op.loop,
    ...get(j), ...get(N), ...op.i32GeS, ...op.brIf(1),
    ...get(j), ...op.i32Const(3), ...op.i32Shl, ...set(jb),
    ...get(V), ...get(jb), ...op.i32Add, ...op.v128Load(), ...set(vj),
    ...get(W), ...get(jb), ...op.i32Add, ...op.v128Load(), ...set(wj),
    ...get(U), ...get(jb), ...op.i32Add, ...op.v128Load(), ...set(uj),
    ...op.v128Zero, ...set(qSum),
    ...perRow((a) => [
      // x = p(r, j) − v_r w_j − w_r v_j, stored back.
      ...get(row[a]), ...get(jb), ...op.i32Add, ...op.v128Load(),
      ...get(va[a]), ...get(wj), ...op.f64x2Mul, ...op.f64x2Sub,
      ...get(wa[a]), ...get(vj), ...op.f64x2Mul, ...op.f64x2Sub,
      ...set(x),
      ...get(row[a]), ...get(jb), ...op.i32Add, ...get(x), ...op.v128Store(),
      ...get(s[a]), ...get(x), ...get(uj), ...op.f64x2Mul, ...op.f64x2Add, ...set(s[a]),
      ...get(qSum), ...get(x), ...get(ua[a]), ...op.f64x2Mul, ...op.f64x2Add, ...set(qSum),
    ]),
    ...get(Q), ...get(jb), ...op.i32Add,
    ...get(Q), ...get(jb), ...op.i32Add, ...op.v128Load(), ...get(qSum), ...op.f64x2Add,
    ...op.v128Store(),
    ...get(j), ...op.i32Const(2), ...op.i32Add, ...set(j),
    ...op.br(0),
    ...op.end,
    ...op.end,
  ];

  const body = [
    ...get(FIRST), ...set(i),
    ...get(FIRST_OFFSET), ...set(offset),
    ...op.block,
    ...op.loop,
    ...get(i), ...op.i32Const(rows), ...op.i32Add, ...get(N), ...op.i32GtS, ...op.brIf(1),
    // Byte address of packed entry (i + a, 0): row[0] = P + 8·offset, row[a + 1] = row[a] + 8(N − i − a − 1).
    ...address(P, offset), ...set(row[0]),
    ...Array.from({ length: rows - 1 }, (_, a) => [
      ...get(row[a]), ...get(N), ...get(i), ...op.i32Sub, ...op.i32Const(a + 1), ...op.i32Sub, ...op.i32Const(3), ...op.i32Shl, ...op.i32Add, ...set(row[a + 1]),
    ]).flat(),
    ...perRow((a) => [...splatOf(V, a, va[a]), ...splatOf(W, a, wa[a]), ...splatOf(U, a, ua[a]), ...op.v128Zero, ...set(s[a])]),
    // First column: i + rows, plus one when the count N − i − rows is odd.
    ...get(i), ...op.i32Const(rows), ...op.i32Add, ...set(j),
    ...get(j), ...get(N), ...get(j), ...op.i32Sub, ...op.i32Const(1), ...op.i32And, ...op.i32Add, ...set(j),
    ...pairLoop,
    // q_r += both lanes of s_r.
    ...perRow((a) => [
      ...address(Q, i), ...set(rowBase),
      ...get(rowBase),
      ...get(rowBase), ...op.f64Load(8 * a), ...get(s[a]), ...op.f64x2ExtractLane(0), ...op.f64Add, ...get(s[a]), ...op.f64x2ExtractLane(1), ...op.f64Add,
      ...op.f64Store(8 * a),
    ]),
    // offset += rows(N − i − 1) − rows(rows − 1)/2, the packed offset of row i + rows.
    ...get(offset), ...get(N), ...get(i), ...op.i32Sub, ...op.i32Const(1), ...op.i32Sub, ...op.i32Const(rows), ...op.i32Mul, ...op.i32Add,
    ...op.i32Const((rows * (rows - 1)) / 2), ...op.i32Sub, ...set(offset),
    ...get(i), ...op.i32Const(rows), ...op.i32Add, ...set(i),
    ...op.br(0),
    ...op.end,
    ...op.end,
  ];
  return { params, locals, body };
}
