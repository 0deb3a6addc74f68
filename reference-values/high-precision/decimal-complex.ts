import type { Decimal } from 'decimal.js';

/**
 * Complex numbers over decimal.js, for the generators of the high-precision tables. Every operation
 * takes the Decimal constructor (a clone with its own precision), so one computation can be run at
 * two precisions and compared.
 */
export interface DecimalComplex {
  readonly re: Decimal;
  readonly im: Decimal;
}

export type DecimalConstructor = typeof Decimal;

export const decimalComplex = {
  of(D: DecimalConstructor, re: Decimal.Value, im: Decimal.Value = 0): DecimalComplex {
    return { re: new D(re), im: new D(im) };
  },
  add(a: DecimalComplex, b: DecimalComplex): DecimalComplex {
    return { re: a.re.plus(b.re), im: a.im.plus(b.im) };
  },
  sub(a: DecimalComplex, b: DecimalComplex): DecimalComplex {
    return { re: a.re.minus(b.re), im: a.im.minus(b.im) };
  },
  mul(a: DecimalComplex, b: DecimalComplex): DecimalComplex {
    return { re: a.re.times(b.re).minus(a.im.times(b.im)), im: a.re.times(b.im).plus(a.im.times(b.re)) };
  },
  scale(a: DecimalComplex, s: Decimal.Value): DecimalComplex {
    return { re: a.re.times(s), im: a.im.times(s) };
  },
  /** a/b = a·conj(b)/|b|²; at 50 digits the textbook formula loses nothing that matters (no overflow). */
  div(a: DecimalComplex, b: DecimalComplex): DecimalComplex {
    const norm = b.re.times(b.re).plus(b.im.times(b.im));
    return {
      re: a.re.times(b.re).plus(a.im.times(b.im)).div(norm),
      im: a.im.times(b.re).minus(a.re.times(b.im)).div(norm),
    };
  },
  /**
   * The principal square root (Re ≥ 0; on the negative real axis +i√|a|), by
   * √((|z| + |a|)/2) for the larger part and b/(2·that) for the other, which avoids cancellation.
   */
  sqrt(z: DecimalComplex): DecimalComplex {
    const r = z.re.times(z.re).plus(z.im.times(z.im)).sqrt();
    if (r.isZero()) return { re: r, im: r };
    if (z.re.gte(0)) {
      const re = r.plus(z.re).div(2).sqrt();
      return { re, im: z.im.div(re.times(2)) };
    }
    const magnitude = r.minus(z.re).div(2).sqrt();
    const im = z.im.isNegative() && !z.im.isZero() ? magnitude.neg() : magnitude;
    return { re: z.im.div(im.times(2)), im };
  },
};
