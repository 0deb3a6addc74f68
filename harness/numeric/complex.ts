/**
 * Complex scalars for the harness's numerics. Matrices never hold these objects: they store
 * complex entries interleaved (re, im) in one Float64Array (see square-matrix.ts). A `Complex` is
 * for spectral parameters z, traces and other scalars.
 */
export interface Complex {
  readonly re: number;
  readonly im: number;
}

export function complex(re: number, im = 0): Complex {
  return { re, im };
}

export const ZERO: Complex = complex(0, 0);
export const ONE: Complex = complex(1, 0);
export const I: Complex = complex(0, 1);

export function add(a: Complex, b: Complex): Complex {
  return { re: a.re + b.re, im: a.im + b.im };
}

export function sub(a: Complex, b: Complex): Complex {
  return { re: a.re - b.re, im: a.im - b.im };
}

export function mul(a: Complex, b: Complex): Complex {
  return { re: a.re * b.re - a.im * b.im, im: a.re * b.im + a.im * b.re };
}

export function scale(a: Complex, s: number): Complex {
  return { re: a.re * s, im: a.im * s };
}

export function neg(a: Complex): Complex {
  return { re: -a.re, im: -a.im };
}

export function conj(a: Complex): Complex {
  return { re: a.re, im: -a.im };
}

/** |a|, without overflow or harmful underflow (Math.hypot). */
export function abs(a: Complex): number {
  return Math.hypot(a.re, a.im);
}

/**
 * a / b by Smith's algorithm, which avoids overflow in |b|².
 * Method: R. L. Smith, 1962, "Algorithm 116: Complex division", Comm. ACM 5(8), 435.
 */
export function div(a: Complex, b: Complex): Complex {
  if (Math.abs(b.re) >= Math.abs(b.im)) {
    const r = b.im / b.re;
    const d = b.re + b.im * r;
    return { re: (a.re + a.im * r) / d, im: (a.im - a.re * r) / d };
  }
  const r = b.re / b.im;
  const d = b.re * r + b.im;
  return { re: (a.re * r + a.im) / d, im: (a.im * r - a.re) / d };
}

export function inv(b: Complex): Complex {
  return div(ONE, b);
}

/**
 * Principal square root (branch cut on the negative real axis, Re √a ≥ 0), computed without
 * cancellation: the larger of |Re|, |Im| of the root comes from √((|a| + |Re a|)/2).
 * Method: W. Kahan, 1987, "Branch cuts for complex elementary functions", in The State of the Art
 * in Numerical Analysis (Iserles and Powell, eds.), Clarendon Press, 165–211.
 */
export function sqrt(a: Complex): Complex {
  if (a.re === 0 && a.im === 0) return { re: 0, im: a.im };
  const t = Math.sqrt((Math.abs(a.re) + abs(a)) / 2);
  if (a.re >= 0) return { re: t, im: a.im / (2 * t) };
  return { re: Math.abs(a.im) / (2 * t), im: a.im > 0 || Object.is(a.im, 0) ? t : -t };
}

export function log(a: Complex): Complex {
  return { re: Math.log(abs(a)), im: Math.atan2(a.im, a.re) };
}

export function exp(a: Complex): Complex {
  const r = Math.exp(a.re);
  return { re: r * Math.cos(a.im), im: r * Math.sin(a.im) };
}

export function isFiniteComplex(a: Complex): boolean {
  return Number.isFinite(a.re) && Number.isFinite(a.im);
}

/** Exact text for a number: keeps −0, NaN and ±Infinity visible, full precision otherwise. */
export function formatNumber(x: number): string {
  if (Object.is(x, -0)) return '-0';
  return String(x);
}

export function formatComplex(a: Complex): string {
  const sign = a.im < 0 || Object.is(a.im, -0) ? '-' : '+';
  return `${formatNumber(a.re)}${sign}${formatNumber(Math.abs(a.im))}i`;
}
