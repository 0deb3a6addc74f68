import { gammaVariate } from './gamma-variate.js';
import type { RandomStream } from './random-stream.js';

/**
 * One draw from the chi law with ν > 0 degrees of freedom (ν need not be an integer): the law of
 * √(z₁² + … + z_ν²) for integer ν, density 2^{1−ν/2} x^{ν−1} e^{−x²/2}/Γ(ν/2) on x > 0 in general.
 *
 * Method: χ_ν² is Gamma(ν/2, 2), so χ_ν = √(2 G) with G ~ Gamma(ν/2, 1) (gamma-variate.ts,
 * Marsaglia and Tsang 2000); one gamma draw whatever ν, so the cost does not grow with ν.
 * Moments for checking: E χ_ν² = ν, E χ_ν⁴ = ν(ν + 2) (N. L. Johnson, S. Kotz and
 * N. Balakrishnan, Continuous Univariate Distributions, vol. 1, 2nd ed., Wiley, 1994, ch. 18).
 */
export function chiVariate(stream: RandomStream, degreesOfFreedom: number): number {
  if (!(degreesOfFreedom > 0) || !Number.isFinite(degreesOfFreedom)) {
    throw new RangeError(`chiVariate: degrees of freedom must be a finite number > 0, got ${degreesOfFreedom}`);
  }
  return Math.sqrt(2 * gammaVariate(stream, degreesOfFreedom / 2));
}
