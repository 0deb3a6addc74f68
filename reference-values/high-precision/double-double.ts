/**
 * Double-double arithmetic: a real number as the unevaluated sum hi + lo of two doubles with
 * |lo| ≤ ulp(hi)/2, about 106 bits (32 significant digits), built from IEEE operations only, so a
 * computation gives the same bits on every conforming platform.
 *
 * Method: Knuth's TwoSum and Dekker's TwoProduct (splitting at 2^27 + 1; no fused multiply-add is
 * assumed), and the "accurate" addition, multiplication and division of the QD library.
 * References: T. J. Dekker, 1971, "A floating-point technique for extending the available
 * precision", Numer. Math. 18, 224–242; D. E. Knuth, The Art of Computer Programming, vol. 2,
 * §4.2.2; Y. Hida, X. S. Li and D. H. Bailey, 2001, "Algorithms for quad-double precision floating
 * point arithmetic", Proc. 15th IEEE Symposium on Computer Arithmetic, 155–162 (details from memory).
 * Valid for |values| below about 1e300 (the split overflows beyond).
 *
 * `dd` works on {hi, lo} objects; `ddParts` is the same arithmetic on separate high and low parts,
 * with `addTo`/`mulTo` writing into a scratch array, for hot loops that should not build objects.
 */
export interface DoubleDouble {
  readonly hi: number;
  readonly lo: number;
}

const SPLITTER = 134217729; // 2^27 + 1
/** addTo and mulTo always write into a Float64Array, so that the engine compiles them for one type. */
const pairScratch = new Float64Array(2);

export const ddParts = {
  /** out = a + b, as [hi, lo] in out[0], out[1] (no allocation: for hot loops). */
  addTo(out: Float64Array, aHi: number, aLo: number, bHi: number, bLo: number): void {
    let s = aHi + bHi;
    let v = s - aHi;
    const e1 = aHi - (s - v) + (bHi - v);
    const t = aLo + bLo;
    v = t - aLo;
    const f = aLo - (t - v) + (bLo - v);
    let e = e1 + t;
    let h = s + e;
    e -= h - s;
    s = h;
    e += f;
    h = s + e;
    out[0] = h;
    out[1] = e - (h - s);
  },
  /** out = a·b, as [hi, lo] in out[0], out[1]. */
  mulTo(out: Float64Array, aHi: number, aLo: number, bHi: number, bLo: number): void {
    const p = aHi * bHi;
    const ta = SPLITTER * aHi;
    const ah = ta - (ta - aHi);
    const al = aHi - ah;
    const tb = SPLITTER * bHi;
    const bh = tb - (tb - bHi);
    const bl = bHi - bh;
    const e = ah * bh - p + ah * bl + al * bh + al * bl + (aHi * bLo + aLo * bHi);
    const h = p + e;
    out[0] = h;
    out[1] = e - (h - p);
  },
  /** (a + b) as [hi, lo]. */
  add(aHi: number, aLo: number, bHi: number, bLo: number): [number, number] {
    ddParts.addTo(pairScratch, aHi, aLo, bHi, bLo);
    return [pairScratch[0], pairScratch[1]];
  },
  /** (a·b) as [hi, lo]. */
  mul(aHi: number, aLo: number, bHi: number, bLo: number): [number, number] {
    ddParts.mulTo(pairScratch, aHi, aLo, bHi, bLo);
    return [pairScratch[0], pairScratch[1]];
  },
  /** (a/b) as [hi, lo]: three quotient digits. */
  div(aHi: number, aLo: number, bHi: number, bLo: number): [number, number] {
    const q1 = aHi / bHi;
    let [pHi, pLo] = ddParts.mul(q1, 0, bHi, bLo);
    let [rHi, rLo] = ddParts.add(aHi, aLo, -pHi, -pLo);
    const q2 = rHi / bHi;
    [pHi, pLo] = ddParts.mul(q2, 0, bHi, bLo);
    [rHi, rLo] = ddParts.add(rHi, rLo, -pHi, -pLo);
    const q3 = rHi / bHi;
    const h = q1 + q2;
    return ddParts.add(h, q2 - (h - q1), q3, 0);
  },
};

const pair = ([hi, lo]: [number, number]): DoubleDouble => ({ hi, lo });

export const dd = {
  of(hi: number, lo = 0): DoubleDouble {
    const s = hi + lo;
    return { hi: s, lo: lo - (s - hi) };
  },
  add(a: DoubleDouble, b: DoubleDouble): DoubleDouble {
    return pair(ddParts.add(a.hi, a.lo, b.hi, b.lo));
  },
  neg(a: DoubleDouble): DoubleDouble {
    return { hi: -a.hi, lo: -a.lo };
  },
  sub(a: DoubleDouble, b: DoubleDouble): DoubleDouble {
    return pair(ddParts.add(a.hi, a.lo, -b.hi, -b.lo));
  },
  mul(a: DoubleDouble, b: DoubleDouble): DoubleDouble {
    return pair(ddParts.mul(a.hi, a.lo, b.hi, b.lo));
  },
  /** a·b for a double b (exact scaling when b is a power of two). */
  mulNumber(a: DoubleDouble, b: number): DoubleDouble {
    return pair(ddParts.mul(a.hi, a.lo, b, 0));
  },
  div(a: DoubleDouble, b: DoubleDouble): DoubleDouble {
    return pair(ddParts.div(a.hi, a.lo, b.hi, b.lo));
  },
  /** a/b for a double b. */
  divNumber(a: DoubleDouble, b: number): DoubleDouble {
    return pair(ddParts.div(a.hi, a.lo, b, 0));
  },
  /** √a for a ≥ 0: one Newton step in double-double from the double square root. */
  sqrt(a: DoubleDouble): DoubleDouble {
    if (a.hi <= 0) {
      if (a.hi === 0) return { hi: 0, lo: 0 };
      throw new RangeError(`dd.sqrt of a negative number ${a.hi}`);
    }
    const x = Math.sqrt(a.hi);
    const [squareHi, squareLo] = ddParts.mul(x, 0, x, 0);
    const [restHi] = ddParts.add(a.hi, a.lo, -squareHi, -squareLo);
    return dd.of(x, restHi / (2 * x));
  },
  /** The double nearest to a. */
  toNumber(a: DoubleDouble): number {
    return a.hi + a.lo;
  },
};
