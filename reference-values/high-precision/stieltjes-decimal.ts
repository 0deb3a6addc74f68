import { type DecimalComplex, type DecimalConstructor, decimalComplex as C } from './decimal-complex.js';

/**
 * The semicircle Stieltjes transform and its derivative in decimal arithmetic, for z off the real
 * axis: m(z) = −2/(z + √(z − 2)·√(z + 2)) with principal roots (the branch with Im m·Im z > 0,
 * m ~ −1/z at infinity; see stieltjesSemicircle in ../semicircle-law.ts for why this product of
 * roots is the right branch everywhere), and m′ = m²/(1 − m²) (from m² + zm + 1 = 0).
 * References: THEORY.md, "Conventions"; Anderson, Guionnet and Zeitouni 2010, Section 2.4.
 */
export function stieltjesDecimal(D: DecimalConstructor, z: DecimalComplex): { m: DecimalComplex; derivative: DecimalComplex } {
  if (z.im.isZero()) throw new RangeError('stieltjesDecimal: z must be off the real axis');
  const two = C.of(D, 2);
  const s = C.mul(C.sqrt(C.sub(z, two)), C.sqrt(C.add(z, two)));
  const m = C.div(C.of(D, -2), C.add(z, s));
  const m2 = C.mul(m, m);
  return { m, derivative: C.div(m2, C.sub(C.of(D, 1), m2)) };
}
