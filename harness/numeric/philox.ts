/**
 * Philox4x32-10, the counter-based random bijection of Salmon, Moraes, Dror and Shaw: a 128-bit
 * counter and a 64-bit key map to 128 pseudo-random bits, with no state carried between calls.
 * Any block of any stream can therefore be computed on its own, which is what makes the harness's
 * samples independent of the number of workers.
 *
 * Method: ten rounds of the Philox S-box. Each round multiplies counter words 0 and 2 by the
 * constants M0 = 0xD2511F53 and M1 = 0xCD9E8D57, keeps both halves of the 64-bit products and
 * mixes them with words 1 and 3 and the round key:
 *   (c0, c1, c2, c3) ← (hi(M1·c2) ⊕ c1 ⊕ k0, lo(M1·c2), hi(M0·c0) ⊕ c3 ⊕ k1, lo(M0·c0)),
 * and the key is bumped by the Weyl constants W0 = 0x9E3779B9, W1 = 0xBB67AE85 (mod 2³²) between
 * rounds. The output matches Random123's known-answer vectors bit for bit (see the test).
 *
 * 32×32 → 64-bit products: the low word is Math.imul; the high word is assembled from exact
 * double-precision partial products (see `mulhi32`), so no BigInt is needed on the hot path.
 *
 * References:
 * - J. K. Salmon, M. A. Moraes, R. O. Dror and D. E. Shaw, "Parallel random numbers: as easy as
 *   1, 2, 3", Proc. SC'11 (2011), doi:10.1145/2063384.2063405, sec. 3.2 and table 2.
 * - D. E. Shaw Research, Random123 library, include/Random123/philox.h (round function, key
 *   schedule and constants) and tests/kat_vectors (known answers).
 */

const M0 = 0xd2511f53;
const M1 = 0xcd9e8d57;
const W0 = 0x9e3779b9;
const W1 = 0xbb67ae85;
const ROUNDS = 10;

const TWO_16 = 65536;
const TWO_32 = 4294967296;

/**
 * High 32 bits of the 64-bit product a·b of two unsigned 32-bit integers.
 * With a = ah·2¹⁶ + al: q = ah·b and p = al·b are below 2⁴⁸, hence exact doubles; writing
 * q = qh·2¹⁶ + ql, a·b = qh·2³² + (ql·2¹⁶ + p), and the bracket is below 2⁴⁹, also exact, so
 * hi = qh + ⌊(ql·2¹⁶ + p)/2³²⌋ exactly (common practice for 64-bit products in JavaScript).
 */
function mulhi32(a: number, b: number): number {
  const q = (a >>> 16) * b;
  const p = (a & 0xffff) * b;
  const qh = Math.floor(q / TWO_16);
  const ql = q - qh * TWO_16;
  return (qh + Math.floor((ql * TWO_16 + p) / TWO_32)) >>> 0;
}

/**
 * Philox4x32 with 10 rounds: writes the four output words for (counter, key) into `out`.
 * `out` may alias `counter`. Words are unsigned 32-bit; counter[0] is Random123's ctr.v[0].
 */
export function philox4x32(counter: Uint32Array, key: Uint32Array, out: Uint32Array): void {
  let c0 = counter[0];
  let c1 = counter[1];
  let c2 = counter[2];
  let c3 = counter[3];
  let k0 = key[0];
  let k1 = key[1];
  for (let round = 0; round < ROUNDS; round++) {
    if (round > 0) {
      k0 = (k0 + W0) >>> 0;
      k1 = (k1 + W1) >>> 0;
    }
    const hi0 = mulhi32(M0, c0);
    const lo0 = Math.imul(M0, c0) >>> 0;
    const hi1 = mulhi32(M1, c2);
    const lo1 = Math.imul(M1, c2) >>> 0;
    c0 = (hi1 ^ c1 ^ k0) >>> 0;
    c1 = lo1;
    c2 = (hi0 ^ c3 ^ k1) >>> 0;
    c3 = lo0;
  }
  out[0] = c0;
  out[1] = c1;
  out[2] = c2;
  out[3] = c3;
}
