/**
 * Exact, independent enumerations of E Tr X^{2k} for the tests of finite-n-corrections.ts. They
 * share no code with the library: one enumerates Wick pairings (Isserlis 1918, Biometrika 12), the
 * other index patterns with the entries' moments (the moment method: Wigner 1955, Ann. of Math. 62;
 * Anderson, Guionnet and Zeitouni 2010, Section 2.1).
 *
 * Tr X^{2k} = Σ_{i_0..i_{2k−1}} x_{i_0 i_1} x_{i_1 i_2} ⋯ x_{i_{2k−1} i_0}; factor t is x_{i_t i_{t+1}}.
 */

/** All perfect matchings of {0, …, 2k − 1}, as lists of pairs. */
export function pairings(size: number): number[][][] {
  if (size === 0) return [[]];
  const out: number[][][] = [];
  const recurse = (items: number[], acc: number[][]): void => {
    if (items.length === 0) {
      out.push(acc.slice());
      return;
    }
    const [first, ...others] = items;
    for (let j = 0; j < others.length; j++) {
      acc.push([first, others[j]]);
      recurse([...others.slice(0, j), ...others.slice(j + 1)], acc);
      acc.pop();
    }
  };
  recurse(Array.from({ length: size }, (_, i) => i), []);
  return out;
}

function find(parent: number[], a: number): number {
  while (parent[a] !== a) a = parent[a] = parent[parent[a]];
  return a;
}

/**
 * E Tr X^{2k} as a polynomial in N (coefficient of N^r at index r) by Wick's rule with the
 * covariances GOE: E x_ab x_cd = δ_ac δ_bd + δ_ad δ_bc (off-diagonal variance 1, diagonal 2);
 * GUE: E x_ab x_cd = δ_ad δ_bc. Each pairing and choice of covariance term is a set of index
 * identifications; the free indices contribute N^{#classes}.
 */
export function wickTracePolynomial(k: number, ensemble: 'goe' | 'gue'): bigint[] {
  const size = 2 * k;
  const coefficients: bigint[] = new Array(size + 1).fill(0n);
  if (k === 0) return [0n, 1n];
  const choices = ensemble === 'goe' ? 1 << k : 1;
  for (const pairing of pairings(size)) {
    for (let choice = 0; choice < choices; choice++) {
      const parent = Array.from({ length: size }, (_, i) => i);
      const join = (a: number, b: number): void => {
        parent[find(parent, a)] = find(parent, b);
      };
      pairing.forEach(([s, t], p) => {
        const [a, b, c, d] = [s, (s + 1) % size, t, (t + 1) % size];
        if (ensemble === 'goe' && ((choice >> p) & 1) === 0) {
          join(a, c); // δ_ac δ_bd
          join(b, d);
        } else {
          join(a, d); // δ_ad δ_bc
          join(b, c);
        }
      });
      let classes = 0;
      for (let i = 0; i < size; i++) if (find(parent, i) === i) classes++;
      coefficients[classes] += 1n;
    }
  }
  return coefficients;
}

/** The same Wick sum with explicit indices 0..N−1 (no symbolic counting), for small N and k. */
export function wickTraceExplicit(N: number, k: number, ensemble: 'goe' | 'gue'): number {
  return wickExplicit(N, 2 * k, ensemble);
}

/**
 * Wick's rule over explicit indices 0..N−1 for `size` entries x_{i_t i_next[t]} (one cycle per
 * trace; a single trace when `next` is absent), GOE or GUE covariances (tiny N only).
 */
export function wickExplicit(N: number, size: number, ensemble: 'goe' | 'gue', next?: readonly number[]): number {
  if (size % 2 === 1) return 0;
  const after = (t: number) => (next === undefined ? (t + 1) % size : next[t]);
  const all = pairings(size);
  const index = new Array<number>(size).fill(0);
  const cov = (a: number, b: number, c: number, d: number): number =>
    (ensemble === 'goe' && a === c && b === d ? 1 : 0) + (a === d && b === c ? 1 : 0);
  let total = 0;
  for (let tuple = 0; tuple < N ** size; tuple++) {
    for (let t = 0, r = tuple; t < size; t++, r = Math.floor(r / N)) index[t] = r % N;
    for (const pairing of all) {
      let product = 1;
      for (const [s, t] of pairing) {
        product *= cov(index[s], index[after(s)], index[t], index[after(t)]);
        if (product === 0) break;
      }
      total += product;
    }
  }
  return total;
}

/** An entry law with integer moments: E x^p (real) or E|x|^{2q} (complex, phase-invariant), diagonal E d^p. */
export interface IntegerMomentLaw {
  readonly field: 'real' | 'complex';
  /** real: E x^p for p ≥ 0 (odd moments must be 0); complex: E|x|^{2q} given q. */
  readonly offDiagonal: (p: number) => bigint;
  /** E d^p of the real diagonal entry (odd moments 0). */
  readonly diagonal: (p: number) => bigint;
}

/**
 * E Tr X^{2k} as a polynomial in N for independent entries (up to symmetry) with the given
 * moments: sum over set partitions of the 2k index positions (the equality pattern, r blocks, so
 * N(N − 1)⋯(N − r + 1) index assignments) of the product over distinct edges of the entry moments.
 */
export function momentMethodPolynomial(k: number, law: IntegerMomentLaw): bigint[] {
  const size = 2 * k;
  const falling: bigint[] = new Array(size + 1).fill(0n); // coefficient of N^{falling r}
  const labels = new Array<number>(size).fill(0);
  const visit = (position: number, blocks: number): void => {
    if (position === size) {
      falling[blocks] += patternExpectation(labels, law);
      return;
    }
    for (let b = 0; b <= blocks; b++) {
      labels[position] = b;
      visit(position + 1, Math.max(blocks, b + 1));
    }
  };
  if (size === 0) return [0n, 1n];
  visit(0, 0);
  const monomial: bigint[] = new Array(size + 1).fill(0n);
  let factor: bigint[] = [1n]; // N(N − 1)⋯(N − r + 1), built up
  for (let r = 0; r <= size; r++) {
    factor.forEach((a, j) => (monomial[j] += falling[r] * a));
    const next: bigint[] = new Array(factor.length + 1).fill(0n);
    factor.forEach((a, j) => {
      next[j + 1] += a;
      next[j] -= BigInt(r) * a;
    });
    factor = next;
  }
  return monomial;
}

/**
 * The moments of the entries along the edges of one index pattern: labels[t] is the block of
 * position t, and position t is followed by next[t] (one cycle per trace). Shared by the single-trace
 * and the trace-product enumerations.
 */
export function patternExpectation(labels: readonly number[], law: IntegerMomentLaw, next?: readonly number[]): bigint {
  const size = labels.length;
  const forward = new Map<string, number>();
  const backward = new Map<string, number>();
  for (let t = 0; t < size; t++) {
    const u = labels[t];
    const v = labels[next === undefined ? (t + 1) % size : next[t]];
    const key = `${Math.min(u, v)},${Math.max(u, v)}`;
    const map = u <= v ? forward : backward;
    map.set(key, (map.get(key) ?? 0) + 1);
  }
  let product = 1n;
  for (const key of new Set([...forward.keys(), ...backward.keys()])) {
    const p = forward.get(key) ?? 0;
    const q = backward.get(key) ?? 0;
    const [u, v] = key.split(',');
    if (u === v) product *= law.diagonal(p);
    else if (law.field === 'real') product *= law.offDiagonal(p + q);
    else product *= p === q ? law.offDiagonal(p) : 0n; // E x^p x̄^q = 0 for p ≠ q (phase invariance)
    if (product === 0n) return 0n;
  }
  return product;
}

export function evaluatePolynomial(coefficients: readonly bigint[], N: number): bigint {
  let value = 0n;
  for (let j = coefficients.length - 1; j >= 0; j--) value = value * BigInt(N) + coefficients[j];
  return value;
}

/** (p − 1)!! for even p, 0 for odd p: the moments of a standard Gaussian. */
export function gaussianMoment(p: number): bigint {
  if (p % 2 === 1) return 0n;
  let m = 1n;
  for (let j = p - 1; j > 1; j -= 2) m *= BigInt(j);
  return m;
}
