import { fnv1a32, fnv1a32Word } from './fnv1a.js';
import { philox4x32 } from './philox.js';

/**
 * A keyed, splittable source of random numbers. Sample `index` of check `key` under run `seed`
 * gets its own stream, so what it draws does not depend on how many workers or shards run, nor
 * on the order in which samples are taken.
 */
export interface RandomStream {
  /** Uniform on the unsigned 32-bit integers [0, 2³²). */
  nextUint32(): number;
  /** Uniform on the open interval (0, 1): k·2⁻⁵³ with k uniform on 1 … 2⁵³ − 1 (53 random bits, never 0 or 1). */
  nextUniform(): number;
  /** Standard normal N(0, 1). */
  nextNormal(): number;
}

const TWO_32 = 4294967296;
const TWO_26 = 67108864;
const TWO_MINUS_53 = 1.1102230246251565e-16; // 2⁻⁵³, exact
const TWO_PI = 2 * Math.PI;

/**
 * MurmurHash3's 32-bit finaliser fmix32, a bijection with full avalanche, applied after FNV-1a so
 * that names differing only in their last byte give unrelated key words.
 * Reference: A. Appleby, MurmurHash3 (2011), src/MurmurHash3.cpp in the SMHasher repository.
 */
function fmix32(h: number): number {
  h ^= h >>> 16;
  h = Math.imul(h, 0x85ebca6b);
  h ^= h >>> 13;
  h = Math.imul(h, 0xc2b2ae35);
  h ^= h >>> 16;
  return h >>> 0;
}

/**
 * Method. Philox4x32-10 (philox.ts) in counter mode. For run seed s (integer, 0 ≤ s < 2⁵³), check
 * name `key` and sample index i (integer, 0 ≤ i < 2⁵³):
 *   Philox key     = (s mod 2³², fmix32(FNV-1a₃₂(UTF-8(key) ‖ le32(⌊s / 2³²⌋))))
 *   Philox counter = (b mod 2³², ⌊b / 2³²⌋, i mod 2³², ⌊i / 2³²⌋) for block b = 0, 1, 2, …
 * Each block yields four 32-bit words, consumed in order (word 0 first). Streams for different
 * (key, s) differ in the Philox key; samples of one check differ in the counter, so their blocks
 * never overlap. Two check names collide only if their 32-bit hashes do (probability about
 * n²/2³³ among n names).
 *
 * Uniforms take 27 + 26 bits from two words ((w₀ ≫ 5)·2²⁶ + (w₁ ≫ 6), as in the genrand_res53
 * construction of Matsumoto and Nishimura's MT19937 reference code, ACM TOMACS 8, 1998;
 * citation from memory) and redraw the
 * single value 0, so they lie in (0, 1) exactly.
 *
 * Normals: Box–Muller, both outputs used: with u₁, u₂ uniform on (0, 1), r = √(−2 ln u₁),
 * z₁ = r cos 2πu₂, z₂ = r sin 2πu₂ are independent N(0, 1) (G. E. P. Box and M. E. Muller, "A note
 * on the generation of random normal deviates", Ann. Math. Statist. 29 (1958) 610–611). The method
 * is exact; the floating-point values depend on the JavaScript engine's Math.log, Math.cos and
 * Math.sin, which ECMAScript does not pin to the last bit, so normal draws are reproducible on one
 * platform and engine version but may differ in the last bits across engines. Integer and
 * uniform draws are bit-exact everywhere.
 */
export function randomStream(seed: number, key: string, index: number): RandomStream {
  if (!Number.isSafeInteger(seed) || seed < 0) throw new RangeError(`seed must be an integer in [0, 2^53), got ${seed}`);
  if (!Number.isSafeInteger(index) || index < 0) throw new RangeError(`index must be an integer in [0, 2^53), got ${index}`);
  const seedHigh = Math.floor(seed / TWO_32);
  const keyWord = fmix32(fnv1a32Word(fnv1a32(key), seedHigh));
  return new PhiloxStream(seed - seedHigh * TWO_32, keyWord, index % TWO_32, Math.floor(index / TWO_32));
}

class PhiloxStream implements RandomStream {
  private readonly key = new Uint32Array(2);
  private readonly counter = new Uint32Array(4);
  private readonly words = new Uint32Array(4);
  /** Next unread word of `words`; 4 means the block is used up. */
  private position = 4;
  /** Blocks already generated, as a 64-bit count (low, high). */
  private blockLow = 0;
  private blockHigh = 0;
  private spareNormal = 0;
  private hasSpareNormal = false;

  constructor(key0: number, key1: number, indexLow: number, indexHigh: number) {
    this.key[0] = key0;
    this.key[1] = key1;
    this.counter[2] = indexLow;
    this.counter[3] = indexHigh;
  }

  nextUint32(): number {
    if (this.position === 4) this.refill();
    return this.words[this.position++];
  }

  nextUniform(): number {
    let k = 0;
    while (k === 0) k = (this.nextUint32() >>> 5) * TWO_26 + (this.nextUint32() >>> 6);
    return k * TWO_MINUS_53;
  }

  nextNormal(): number {
    if (this.hasSpareNormal) {
      this.hasSpareNormal = false;
      return this.spareNormal;
    }
    const r = Math.sqrt(-2 * Math.log(this.nextUniform()));
    const theta = TWO_PI * this.nextUniform();
    this.spareNormal = r * Math.sin(theta);
    this.hasSpareNormal = true;
    return r * Math.cos(theta);
  }

  private refill(): void {
    if (this.blockHigh >= TWO_32) throw new RangeError('random stream exhausted (2^64 blocks)');
    this.counter[0] = this.blockLow;
    this.counter[1] = this.blockHigh;
    philox4x32(this.counter, this.key, this.words);
    this.position = 0;
    if (++this.blockLow === TWO_32) {
      this.blockLow = 0;
      this.blockHigh++;
    }
  }
}

/** Fills `out` with standard normals from `stream`, in order (one `nextNormal` per element). */
export function normalsInto(stream: RandomStream, out: Float64Array): Float64Array {
  for (let k = 0; k < out.length; k++) out[k] = stream.nextNormal();
  return out;
}
