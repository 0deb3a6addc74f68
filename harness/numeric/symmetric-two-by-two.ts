/**
 * Eigen-analysis of the real symmetric 2×2 matrix [[a, b], [b, c]].
 *
 * Method: LAPACK dlae2 and dlaev2 (Anderson et al., LAPACK Users' Guide, 3rd ed., SIAM, 1999):
 * rt1 is the eigenvalue of larger magnitude, computed without cancellation as (a + c ± rt)/2 with
 * the sign of a + c; rt2 = det/rt1 (written as (max/rt1)·min − (b/rt1)·b so it cannot
 * overflow); (cs, sn) is the unit eigenvector of rt1. rt1 is accurate to a few ulps, rt2 to a few
 * ulps of max(|rt1|, |rt2|) (dlaev2's documented bound).
 */
export interface SymmetricTwoByTwo {
  /** Eigenvalue of larger magnitude. */
  readonly rt1: number;
  /** Eigenvalue of smaller magnitude. */
  readonly rt2: number;
  /** (cs, sn) is the unit eigenvector of rt1: [[a, b], [b, c]] (cs, sn)ᵀ = rt1 (cs, sn)ᵀ. */
  readonly cs: number;
  readonly sn: number;
}

export function symmetricTwoByTwo(a: number, b: number, c: number): SymmetricTwoByTwo {
  const sm = a + c;
  const df = a - c;
  const adf = Math.abs(df);
  const tb = b + b;
  const ab = Math.abs(tb);
  const [acmx, acmn] = Math.abs(a) > Math.abs(c) ? [a, c] : [c, a];
  let rt: number;
  if (adf > ab) rt = adf * Math.sqrt(1 + (ab / adf) ** 2);
  else if (adf < ab) rt = ab * Math.sqrt(1 + (adf / ab) ** 2);
  else rt = ab * Math.SQRT2;
  let rt1: number;
  let rt2: number;
  let sgn1: number;
  if (sm < 0) {
    rt1 = 0.5 * (sm - rt);
    sgn1 = -1;
    rt2 = (acmx / rt1) * acmn - (b / rt1) * b;
  } else if (sm > 0) {
    rt1 = 0.5 * (sm + rt);
    sgn1 = 1;
    rt2 = (acmx / rt1) * acmn - (b / rt1) * b;
  } else {
    rt1 = 0.5 * rt;
    rt2 = -0.5 * rt;
    sgn1 = 1;
  }
  let cs: number;
  let sgn2: number;
  if (df >= 0) {
    cs = df + rt;
    sgn2 = 1;
  } else {
    cs = df - rt;
    sgn2 = -1;
  }
  let cs1: number;
  let sn1: number;
  if (Math.abs(cs) > ab) {
    const ct = -tb / cs;
    sn1 = 1 / Math.sqrt(1 + ct * ct);
    cs1 = ct * sn1;
  } else if (ab === 0) {
    cs1 = 1;
    sn1 = 0;
  } else {
    const tn = -cs / tb;
    cs1 = 1 / Math.sqrt(1 + tn * tn);
    sn1 = tn * cs1;
  }
  if (sgn1 === sgn2) {
    const tn = cs1;
    cs1 = -sn1;
    sn1 = tn;
  }
  return { rt1, rt2, cs: cs1, sn: sn1 };
}
