// Seeded standard normal draws for the example kernel, independent of rmt-assay's own generators.
//
// Uniforms: xoshiro128** (D. Blackman and S. Vigna, 2021, "Scrambled linear pseudorandom number
// generators", ACM Trans. Math. Softw. 47(4), article 36; the update written from memory), its
// 128-bit state filled by SplitMix64 (G. L. Steele, D. Lea and C. H. Flood, 2014, "Fast splittable
// pseudorandom number generators", OOPSLA '14), as its authors recommend for seeding.
// 53-bit doubles from two 32-bit words as in Matsumoto and Nishimura's genrand_res53 (mt19937ar.c).
// Normals: Box and Muller, 1958, Ann. Math. Stat. 29(2), 610–611.

const MASK64 = (1n << 64n) - 1n;

/** SplitMix64: the sequence of 64-bit outputs (BigInt) from `seed`. */
export function* splitMix64(seed) {
  let state = BigInt(seed) & MASK64;
  for (;;) {
    state = (state + 0x9e3779b97f4a7c15n) & MASK64;
    let z = state;
    z = ((z ^ (z >> 30n)) * 0xbf58476d1ce4e5b9n) & MASK64;
    z = ((z ^ (z >> 27n)) * 0x94d049bb133111ebn) & MASK64;
    yield z ^ (z >> 31n);
  }
}

const rotl = (x, k) => (x << k) | (x >>> (32 - k));

export function seededNormals(seed) {
  const seeder = splitMix64(seed);
  const words = [];
  for (let k = 0; k < 2; k++) {
    const z = seeder.next().value;
    words.push(Number(z & 0xffffffffn) | 0, Number(z >> 32n) | 0);
  }
  const s = Int32Array.from(words);
  const nextWord = () => {
    const result = Math.imul(rotl(Math.imul(s[1], 5), 7), 9) >>> 0;
    const t = s[1] << 9;
    s[2] ^= s[0];
    s[3] ^= s[1];
    s[1] ^= s[2];
    s[0] ^= s[3];
    s[2] ^= t;
    s[3] = rotl(s[3], 11);
    return result;
  };
  /** Uniform on [0, 1) with 53 random bits. */
  const uniform = () => ((nextWord() >>> 5) * 67108864 + (nextWord() >>> 6)) / 9007199254740992;
  let spare;
  return {
    uniform,
    normal() {
      if (spare !== undefined) {
        const value = spare;
        spare = undefined;
        return value;
      }
      const radius = Math.sqrt(-2 * Math.log(1 - uniform()));
      const angle = 2 * Math.PI * uniform();
      spare = radius * Math.sin(angle);
      return radius * Math.cos(angle);
    },
  };
}
