import { describe, expect, it } from 'vitest';
import { FNV1A32_OFFSET_BASIS, fnv1a32, fnv1a32Word } from '../../../harness/numeric/fnv1a.js';
import { philox4x32 } from '../../../harness/numeric/philox.js';
import { normalsInto, randomStream, type RandomStream } from '../../../harness/numeric/random-stream.js';
import {
  chiSquareEqualCells,
  chiSquareSurvivalEven,
  expectWithinStandardErrors,
  pearsonCorrelation,
} from './hypothesis-checks.js';

/** False-alarm level of each chi-square test below (the z-tests use hypothesis-checks' Z_LIMIT). */
const CHI_SQUARE_ALPHA = 1e-5;
const TWO_32 = 2 ** 32;

function words(stream: RandomStream, count: number): number[] {
  return Array.from({ length: count }, () => stream.nextUint32());
}

/** MurmurHash3 fmix32, written again from A. Appleby's MurmurHash3.cpp (2011) to check the documented derivation. */
function fmix32Reference(h: number): number {
  let x = BigInt(h >>> 0);
  const m = 0xffffffffn;
  x ^= x >> 16n;
  x = (x * 0x85ebca6bn) & m;
  x ^= x >> 13n;
  x = (x * 0xc2b2ae35n) & m;
  x ^= x >> 16n;
  return Number(x);
}

/** FNV-1a over raw bytes, for cross-checking the UTF-8 walk against Node's encoder. */
function fnv1a32Bytes(bytes: Uint8Array): number {
  let h = FNV1A32_OFFSET_BASIS;
  for (const b of bytes) h = Math.imul(h ^ b, 0x01000193) >>> 0;
  return h;
}

describe('fnv1a32', () => {
  it('gives the published FNV-1a 32-bit test values (Noll, FNV test suite; read in several public test files)', () => {
    expect(fnv1a32('')).toBe(0x811c9dc5);
    expect(fnv1a32('a')).toBe(0xe40c292c);
    expect(fnv1a32('foobar')).toBe(0xbf9cf968);
  });

  it('hashes the UTF-8 bytes of non-ASCII text', () => {
    for (const text of ['é', 'λ-semicircle', '∂z₁∂z₂', 'emoji 🎲 ok', 'mixed ü€𝄞']) {
      expect(fnv1a32(text)).toBe(fnv1a32Bytes(new Uint8Array(Buffer.from(text, 'utf8'))));
    }
  });

  it('continues over a little-endian word', () => {
    const bytes = new Uint8Array([0x66, 0x6f, 0x6f, 0x04, 0x03, 0x02, 0x01]);
    expect(fnv1a32Word(fnv1a32('foo'), 0x01020304)).toBe(fnv1a32Bytes(bytes));
  });
});

describe('randomStream: derivation and determinism', () => {
  it('follows the documented key and counter layout', () => {
    const cases: Array<[number, string, number]> = [
      [0, 'semicircle', 0],
      [12345, 'fluctuations/tracial', 77],
      [2 ** 40 + 9, 'edge', 2 ** 35 + 3],
    ];
    for (const [seed, key, index] of cases) {
      const seedHigh = Math.floor(seed / TWO_32);
      const philoxKey = Uint32Array.from([seed % TWO_32, fmix32Reference(fnv1a32Word(fnv1a32(key), seedHigh))]);
      const stream = randomStream(seed, key, index);
      for (let block = 0; block < 3; block++) {
        const out = new Uint32Array(4);
        philox4x32(Uint32Array.from([block, 0, index % TWO_32, Math.floor(index / TWO_32)]), philoxKey, out);
        expect(words(stream, 4)).toEqual(Array.from(out));
      }
    }
  });

  it('repeats the same sequence for the same seed, key and index', () => {
    const a = randomStream(42, 'check', 7);
    const b = randomStream(42, 'check', 7);
    for (let k = 0; k < 2000; k++) {
      expect(a.nextUint32()).toBe(b.nextUint32());
      expect(Object.is(a.nextUniform(), b.nextUniform())).toBe(true);
      expect(Object.is(a.nextNormal(), b.nextNormal())).toBe(true);
    }
  });

  it('gives different sequences when the index, key or seed (low or high bits) changes', () => {
    const reference = words(randomStream(5, 'check', 3), 8);
    const variants: Array<[number, string, number]> = [
      [5, 'check', 4],
      [5, 'check', 3 + TWO_32],
      [5, 'checl', 3],
      [5, 'check ', 3],
      [6, 'check', 3],
      [5 + TWO_32, 'check', 3],
    ];
    for (const [seed, key, index] of variants) {
      expect(words(randomStream(seed, key, index), 8), `${seed} ${key} ${index}`).not.toEqual(reference);
    }
  });

  it('rejects seeds and indices that are not integers in [0, 2^53)', () => {
    expect(() => randomStream(-1, 'k', 0)).toThrow(RangeError);
    expect(() => randomStream(1.5, 'k', 0)).toThrow(RangeError);
    expect(() => randomStream(2 ** 53, 'k', 0)).toThrow(RangeError);
    expect(() => randomStream(0, 'k', -1)).toThrow(RangeError);
    expect(() => randomStream(0, 'k', Number.NaN)).toThrow(RangeError);
    expect(() => randomStream(2 ** 53 - 1, 'k', 2 ** 53 - 1)).not.toThrow();
  });

  it('fills arrays with the same normals as successive nextNormal calls', () => {
    const out = normalsInto(randomStream(3, 'fill', 0), new Float64Array(7));
    const s = randomStream(3, 'fill', 0);
    expect(Array.from(out)).toEqual(Array.from({ length: 7 }, () => s.nextNormal()));
  });
});

describe('randomStream: distribution (honest tests, false-alarm levels stated)', () => {
  it('draws uniforms strictly inside (0, 1) on the 2^-53 grid', () => {
    const s = randomStream(1, 'open-interval', 0);
    let bad = 0;
    for (let k = 0; k < 100_000; k++) {
      const u = s.nextUniform();
      if (!(u > 0 && u < 1) || !Number.isInteger(u * 2 ** 53)) bad++;
    }
    expect(bad).toBe(0);
  });

  it('has uniform 32-bit words: each bit is 1 half the time (binomial z-test per bit)', () => {
    const n = 100_000;
    const ones = new Float64Array(32);
    const s = randomStream(2, 'bits', 0);
    for (let k = 0; k < n; k++) {
      const w = s.nextUint32();
      for (let b = 0; b < 32; b++) ones[b] += (w >>> b) & 1;
    }
    for (let b = 0; b < 32; b++) expectWithinStandardErrors(`bit ${b}`, ones[b] / n, 0.5, Math.sqrt(0.25 / n));
  });

  it('passes a chi-square equidistribution test on 101 cells (ν = 100, α = 1e-5)', () => {
    const cells = 101;
    const counts = new Float64Array(cells);
    const s = randomStream(3, 'chi-square', 0);
    for (let k = 0; k < 1000 * cells; k++) counts[Math.floor(s.nextUniform() * cells)]++;
    const p = chiSquareSurvivalEven(chiSquareEqualCells(counts), cells - 1);
    expect(p).toBeGreaterThan(CHI_SQUARE_ALPHA);
  });

  it('passes the serial test on pairs of successive uniforms, 9 × 9 cells (ν = 80, α = 1e-5; Knuth, TAOCP vol. 2, 3.3.2)', () => {
    const side = 9;
    const counts = new Float64Array(side * side);
    const s = randomStream(4, 'serial', 0);
    for (let k = 0; k < 500 * side * side; k++) {
      counts[Math.floor(s.nextUniform() * side) * side + Math.floor(s.nextUniform() * side)]++;
    }
    expect(chiSquareSurvivalEven(chiSquareEqualCells(counts), side * side - 1)).toBeGreaterThan(CHI_SQUARE_ALPHA);
  });

  it('draws normals with the moments of N(0, 1): mean 0, E x² = 1, E x³ = 0, E x⁴ = 3', () => {
    // Standard errors from the exact N(0, 1) moments E x² = 1, E x⁴ = 3, E x⁶ = 15, E x⁸ = 105:
    // Var x = 1, Var x² = 2, Var x³ = 15, Var x⁴ = 96.
    const n = 200_000;
    const s = randomStream(5, 'normal-moments', 0);
    let m1 = 0;
    let m2 = 0;
    let m3 = 0;
    let m4 = 0;
    for (let k = 0; k < n; k++) {
      const x = s.nextNormal();
      const x2 = x * x;
      m1 += x;
      m2 += x2;
      m3 += x2 * x;
      m4 += x2 * x2;
    }
    expectWithinStandardErrors('E x', m1 / n, 0, Math.sqrt(1 / n));
    expectWithinStandardErrors('E x²', m2 / n, 1, Math.sqrt(2 / n));
    expectWithinStandardErrors('E x³', m3 / n, 0, Math.sqrt(15 / n));
    expectWithinStandardErrors('E x⁴', m4 / n, 3, Math.sqrt(96 / n));
  });

  it('puts the N(0, 1) mass 2Φ(1) − 1 inside [−1, 1] (binomial z-test)', () => {
    // P(|x| ≤ 1) = erf(1/√2) = 0.6826894921370859 (Python's math.erf(1/math.sqrt(2))).
    const n = 200_000;
    const p = 0.6826894921370859;
    const s = randomStream(6, 'normal-mass', 0);
    let inside = 0;
    for (let k = 0; k < n; k++) if (Math.abs(s.nextNormal()) <= 1) inside++;
    expectWithinStandardErrors('P(|x| ≤ 1)', inside / n, p, Math.sqrt((p * (1 - p)) / n));
  });
});

describe('randomStream: independence (Pearson correlation, √n·r ≈ N(0, 1) under independence)', () => {
  // Under independence with finite fourth moments, √n·r is asymptotically standard normal
  // (R. A. Fisher, Biometrika 10, 1915); n = 20 000 pairs keeps the normal approximation sharp.
  const n = 20_000;

  function firstDraws(seedOf: (i: number) => number, keyOf: (i: number) => string, indexOf: (i: number) => number) {
    const u = new Float64Array(n);
    const z = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      const s = randomStream(seedOf(i), keyOf(i), indexOf(i));
      u[i] = s.nextUniform();
      z[i] = s.nextNormal();
    }
    return { u, z };
  }

  function expectUncorrelated(label: string, x: Float64Array, y: Float64Array): void {
    expectWithinStandardErrors(label, pearsonCorrelation(x, y), 0, 1 / Math.sqrt(n));
  }

  it('between adjacent sample indices of one check', () => {
    const a = firstDraws(() => 9, () => 'adjacent', (i) => 2 * i);
    const b = firstDraws(() => 9, () => 'adjacent', (i) => 2 * i + 1);
    expectUncorrelated('uniforms, index i vs i + 1', a.u, b.u);
    expectUncorrelated('normals, index i vs i + 1', a.z, b.z);
  });

  it('between adjacent seeds and between two checks at the same index', () => {
    const a = firstDraws((i) => 2 * i, () => 'seeds', (i) => i);
    const b = firstDraws((i) => 2 * i + 1, () => 'seeds', (i) => i);
    expectUncorrelated('uniforms, seed s vs s + 1', a.u, b.u);
    expectUncorrelated('normals, seed s vs s + 1', a.z, b.z);
    const c = firstDraws(() => 11, () => 'check-a', (i) => i);
    const d = firstDraws(() => 11, () => 'check-b', (i) => i);
    expectUncorrelated('uniforms, key a vs key b', c.u, d.u);
    expectUncorrelated('normals, key a vs key b', c.z, d.z);
  });

  it('between successive draws of one stream (lag 1)', () => {
    const s = randomStream(12, 'lag', 0);
    const x = new Float64Array(n + 1);
    for (let k = 0; k <= n; k++) x[k] = s.nextNormal();
    expectUncorrelated('normals, lag 1', x.subarray(0, n), x.subarray(1));
    const u = new Float64Array(n + 1);
    for (let k = 0; k <= n; k++) u[k] = s.nextUniform();
    expectUncorrelated('uniforms, lag 1', u.subarray(0, n), u.subarray(1));
  });
});
