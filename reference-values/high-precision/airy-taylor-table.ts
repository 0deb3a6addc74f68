import { airyDoubleDouble } from './airy-double-double.js';
import { type DoubleDouble, dd, ddParts } from './double-double.js';

const START = -16;
const END = 48;
/** Grid step 1/8, so |x − x_j| ≤ 1/16 from the nearest grid point. */
const STEP = 0.125;
/** Taylor coefficients kept per grid point: c_n (1/16)^n ≤ 10⁻³⁴·|Ai| for n ≥ 26 on this range. */
const TERMS = 27;

let table: { hi: Float64Array; lo: Float64Array } | undefined;
const scratch = new Float64Array(2);

/**
 * Taylor coefficients c_n = Ai^{(n)}(x_j)/n! at x_j = −16 + j/8 (x_j ≤ 48), from Ai and Ai′ (airyDoubleDouble)
 * and the Airy equation y″ = x y differentiated n times: (n + 2)(n + 1) c_{n+2} = x_j c_n + c_{n−1}.
 */
function coefficients(): { hi: Float64Array; lo: Float64Array } {
  if (table !== undefined) return table;
  const points = Math.round((END - START) / STEP) + 1;
  const hi = new Float64Array(points * TERMS);
  const lo = new Float64Array(points * TERMS);
  for (let j = 0; j < points; j++) {
    const x0 = START + j * STEP;
    const { ai, derivative } = airyDoubleDouble(dd.of(x0));
    const c: DoubleDouble[] = [ai, derivative];
    for (let n = 0; n + 2 < TERMS; n++) {
      const previous = n >= 1 ? c[n - 1] : dd.of(0);
      c.push(dd.divNumber(dd.add(dd.mulNumber(c[n], x0), previous), (n + 2) * (n + 1)));
    }
    c.forEach((v, n) => {
      hi[j * TERMS + n] = v.hi;
      lo[j * TERMS + n] = v.lo;
    });
  }
  table = { hi, lo };
  return table;
}

/**
 * Ai(x) in double-double for −16 ≤ x ≤ 48, fast: Horner's rule on the Taylor polynomial about the
 * nearest grid point (27 terms, |x − x_j| ≤ 1/16), on a scratch pair (ddParts.mulTo, ddParts.addTo)
 * so that no objects are built. Accurate to the grid values' error (see airyDoubleDouble) plus about 10⁻³²
 * relative: the expansion is local, so nothing cancels. Built for the Fredholm determinants, which
 * need Ai at m(m + 1)/2 points for every argument t.
 */
export function airyAiTable(x: DoubleDouble): DoubleDouble {
  if (!(x.hi >= START && x.hi <= END)) throw new RangeError(`airyAiTable: x must lie in [${START}, ${END}], got ${x.hi}`);
  const { hi, lo } = coefficients();
  const j = Math.round((x.hi - START) / STEP);
  // δ = x − x_j, exact in its high part (x_j is a multiple of 1/8 near x.hi).
  const dHi0 = x.hi - (START + j * STEP);
  const dHi = dHi0 + x.lo;
  const dLo = x.lo - (dHi - dHi0);
  const base = j * TERMS;
  const p = scratch;
  p[0] = hi[base + TERMS - 1];
  p[1] = lo[base + TERMS - 1];
  for (let n = TERMS - 2; n >= 0; n--) {
    ddParts.mulTo(p, p[0], p[1], dHi, dLo);
    ddParts.addTo(p, p[0], p[1], hi[base + n], lo[base + n]);
  }
  return { hi: p[0], lo: p[1] };
}
