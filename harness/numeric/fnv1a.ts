/**
 * FNV-1a, the 32-bit Fowler–Noll–Vo hash: h ← (h ⊕ byte) · 16777619 (mod 2³²), starting from the
 * offset basis 2166136261. Non-cryptographic; used to turn a check's name into a Philox key word.
 *
 * Strings are hashed as their UTF-8 bytes (a lone surrogate as its 3-byte generalised UTF-8 form),
 * so the hash of an ASCII name is the standard FNV-1a value ("a" → 0xe40c292c).
 *
 * References: G. Fowler, L. C. Noll, K.-P. Vo and D. Eastlake, "The FNV Non-Cryptographic Hash
 * Algorithm", IETF Internet-Draft draft-eastlake-fnv (2011–); L. C. Noll, FNV hash web page
 * (isthe.com/chongo/tech/comp/fnv), parameters and test vectors.
 */

/** The 32-bit FNV offset basis. */
export const FNV1A32_OFFSET_BASIS = 0x811c9dc5;
const FNV32_PRIME = 0x01000193;

function step(hash: number, byte: number): number {
  return Math.imul(hash ^ byte, FNV32_PRIME) >>> 0;
}

/** FNV-1a (32-bit) of the UTF-8 bytes of `text`, continuing from `hash` (default: the offset basis). */
export function fnv1a32(text: string, hash: number = FNV1A32_OFFSET_BASIS): number {
  let h = hash >>> 0;
  for (let i = 0; i < text.length; i++) {
    let c = text.charCodeAt(i);
    if (c >= 0xd800 && c <= 0xdbff && i + 1 < text.length) {
      const d = text.charCodeAt(i + 1);
      if (d >= 0xdc00 && d <= 0xdfff) {
        c = 0x10000 + ((c - 0xd800) << 10) + (d - 0xdc00);
        i++;
      }
    }
    if (c < 0x80) {
      h = step(h, c);
    } else if (c < 0x800) {
      h = step(h, 0xc0 | (c >>> 6));
      h = step(h, 0x80 | (c & 0x3f));
    } else if (c < 0x10000) {
      h = step(h, 0xe0 | (c >>> 12));
      h = step(h, 0x80 | ((c >>> 6) & 0x3f));
      h = step(h, 0x80 | (c & 0x3f));
    } else {
      h = step(h, 0xf0 | (c >>> 18));
      h = step(h, 0x80 | ((c >>> 12) & 0x3f));
      h = step(h, 0x80 | ((c >>> 6) & 0x3f));
      h = step(h, 0x80 | (c & 0x3f));
    }
  }
  return h;
}

/** FNV-1a (32-bit) continued over the four bytes of an unsigned 32-bit word, least significant first. */
export function fnv1a32Word(hash: number, word: number): number {
  let h = hash >>> 0;
  for (let shift = 0; shift < 32; shift += 8) h = step(h, (word >>> shift) & 0xff);
  return h;
}
