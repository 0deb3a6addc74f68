/**
 * A minimal WebAssembly binary encoder: enough to build small numerical kernels (one imported
 * memory, functions over i32 and f64 values, 128-bit SIMD on pairs of doubles) from TypeScript,
 * without a toolchain. The kernels that use it say in their own files what they compute.
 *
 * Format: the WebAssembly Core Specification, release 2.0 (W3C, 2022), chapter 5 "Binary
 * Format": the module preamble, sections 1 (types), 2 (imports), 3 (functions), 7 (exports) and
 * 10 (code), unsigned and signed LEB128 integers, and the instruction encodings used by `op`
 * (SIMD instructions: prefix 0xFD followed by the LEB128 opcode, §5.4.8).
 */
export type ValueType = 'i32' | 'f64' | 'v128';

export interface WasmFunction {
  readonly name: string;
  readonly params: readonly ValueType[];
  /** Locals after the parameters, in order; local index = params.length + position. */
  readonly locals: readonly ValueType[];
  /** The instructions, without the final `end`. */
  readonly body: readonly number[];
}

const TYPE_CODE: Record<ValueType, number> = { i32: 0x7f, f64: 0x7c, v128: 0x7b };

function unsignedLeb(value: number): number[] {
  const out: number[] = [];
  let v = value >>> 0;
  do {
    let byte = v & 0x7f;
    v >>>= 7;
    if (v !== 0) byte |= 0x80;
    out.push(byte);
  } while (v !== 0);
  return out;
}

function signedLeb(value: number): number[] {
  const out: number[] = [];
  let v = value | 0;
  for (;;) {
    const byte = v & 0x7f;
    v >>= 7;
    if ((v === 0 && (byte & 0x40) === 0) || (v === -1 && (byte & 0x40) !== 0)) {
      out.push(byte);
      return out;
    }
    out.push(byte | 0x80);
  }
}

function vector(items: readonly (readonly number[])[]): number[] {
  return [...unsignedLeb(items.length), ...items.flat()];
}

function utf8Name(text: string): number[] {
  return vector([...new TextEncoder().encode(text)].map((b) => [b]));
}

function section(id: number, content: readonly number[]): number[] {
  return [id, ...unsignedLeb(content.length), ...content];
}

/** Memory argument for loads and stores: alignment exponent and byte offset. */
function memarg(alignLog2: number, offset: number): number[] {
  return [...unsignedLeb(alignLog2), ...unsignedLeb(offset)];
}

function simd(opcode: number, ...immediates: number[]): number[] {
  return [0xfd, ...unsignedLeb(opcode), ...immediates];
}

/** Instruction encodings (spec §5.4). Loads and stores of doubles assume 8-byte alignment as a hint only. */
export const op = {
  localGet: (i: number): number[] => [0x20, ...unsignedLeb(i)],
  localSet: (i: number): number[] => [0x21, ...unsignedLeb(i)],
  localTee: (i: number): number[] => [0x22, ...unsignedLeb(i)],
  i32Const: (c: number): number[] => [0x41, ...signedLeb(c)],
  i32Add: [0x6a],
  i32Sub: [0x6b],
  i32Mul: [0x6c],
  i32And: [0x71],
  i32Shl: [0x74],
  i32GtS: [0x4a],
  i32GeS: [0x4e],
  f64Load: (offset = 0): number[] => [0x2b, ...memarg(3, offset)],
  f64Store: (offset = 0): number[] => [0x39, ...memarg(3, offset)],
  f64Add: [0xa0],
  v128Load: (offset = 0): number[] => simd(0x00, ...memarg(3, offset)),
  v128Store: (offset = 0): number[] => simd(0x0b, ...memarg(3, offset)),
  v128Zero: simd(0x0c, ...new Array<number>(16).fill(0)),
  f64x2Splat: simd(0x14),
  f64x2ExtractLane: (lane: 0 | 1): number[] => simd(0x21, lane),
  f64x2Add: simd(0xf0),
  f64x2Sub: simd(0xf1),
  f64x2Mul: simd(0xf2),
  block: [0x02, 0x40],
  loop: [0x03, 0x40],
  br: (depth: number): number[] => [0x0c, ...unsignedLeb(depth)],
  brIf: (depth: number): number[] => [0x0d, ...unsignedLeb(depth)],
  end: [0x0b],
} as const;

/**
 * A module that imports one memory as env.memory and exports each function under its name; each
 * function has its own type and returns nothing.
 */
export function wasmModule(functions: readonly WasmFunction[]): Uint8Array {
  const types = section(1, vector(functions.map((f) => [0x60, ...vector(f.params.map((t) => [TYPE_CODE[t]])), ...vector([])])));
  const imports = section(2, vector([[...utf8Name('env'), ...utf8Name('memory'), 0x02, 0x00, ...unsignedLeb(1)]]));
  const declarations = section(3, vector(functions.map((_, i) => unsignedLeb(i))));
  const exports = section(7, vector(functions.map((f, i) => [...utf8Name(f.name), 0x00, ...unsignedLeb(i)])));
  const code = section(
    10,
    vector(
      functions.map((f) => {
        // Locals as runs of one type: (count, type) pairs.
        const runs: number[][] = [];
        for (const t of f.locals) {
          const last = runs[runs.length - 1];
          if (last !== undefined && last[1] === TYPE_CODE[t]) last[0]++;
          else runs.push([1, TYPE_CODE[t]]);
        }
        const content = [...vector(runs.map(([count, type]) => [...unsignedLeb(count), type])), ...f.body, ...op.end];
        return [...unsignedLeb(content.length), ...content];
      }),
    ),
  );
  return new Uint8Array([0x00, 0x61, 0x73, 0x6d, 0x01, 0x00, 0x00, 0x00, ...types, ...imports, ...declarations, ...exports, ...code]);
}
