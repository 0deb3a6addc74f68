import { complex, exp, mul, type Complex } from '../../harness/numeric/complex.js';

/**
 * The test functions of the linear-statistic checks: entire functions, so that Tr f(H) follows
 * from resolvent traces on a contour (contour-quadrature.ts), given on real arguments for the
 * reference formulas and on complex ones for the quadrature. The list: polynomials (x³, x⁴,
 * whose GOE and GUE variances are known exactly at every N), the exponential, a smooth bump (the
 * Gaussian e^{−x²}, smooth and concentrated on the bulk like a bump, and entire), and e^{itx} at
 * t = 2 through its real and imaginary parts cos 2x and sin 2x.
 */
export interface TestFunction {
  readonly name: string;
  readonly real: (x: number) => number;
  readonly complex: (z: Complex) => Complex;
  /** The power p when f = x^p with an exact finite-N variance for GOE and GUE. */
  readonly power?: 3 | 4;
}

const cube = (z: Complex) => mul(mul(z, z), z);

export const TEST_FUNCTIONS: readonly TestFunction[] = [
  { name: 'x^3', real: (x) => x * x * x, complex: cube, power: 3 },
  { name: 'x^4', real: (x) => x * x * x * x, complex: (z) => mul(cube(z), z), power: 4 },
  { name: 'exp(x)', real: Math.exp, complex: exp },
  { name: 'exp(-x^2)', real: (x) => Math.exp(-x * x), complex: (z) => exp(mul(complex(-1), mul(z, z))) },
  { name: 'cos(2x)', real: (x) => Math.cos(2 * x), complex: (z) => cosine(z, 2) },
  { name: 'sin(2x)', real: (x) => Math.sin(2 * x), complex: (z) => sine(z, 2) },
];

/** cos(tz) = (e^{itz} + e^{−itz})/2. */
function cosine(z: Complex, t: number): Complex {
  const a = exp(complex(-t * z.im, t * z.re));
  const b = exp(complex(t * z.im, -t * z.re));
  return complex((a.re + b.re) / 2, (a.im + b.im) / 2);
}

/** sin(tz) = (e^{itz} − e^{−itz})/(2i). */
function sine(z: Complex, t: number): Complex {
  const a = exp(complex(-t * z.im, t * z.re));
  const b = exp(complex(t * z.im, -t * z.re));
  return complex((a.im - b.im) / 2, -(a.re - b.re) / 2);
}

export function testFunction(name: string): TestFunction {
  const f = TEST_FUNCTIONS.find((t) => t.name === name);
  if (f === undefined) throw new RangeError(`unknown test function ${name}`);
  return f;
}
