import { Decimal } from 'decimal.js';
import { decimalDoubleDouble } from './decimal-double-double.js';
import type { DoubleDouble } from './double-double.js';
import { gammaDecimal } from './gamma-decimal.js';

/**
 * The constants the double-double special functions need, computed once in 50-digit decimal
 * arithmetic and rounded to double-double: ln 2, √π, and the Airy values
 * Ai(0) = 3^{−2/3}/Γ(2/3), −Ai′(0) = 3^{−1/3}/Γ(1/3) (DLMF 9.2.3, 9.2.4).
 */
export interface DoubleDoubleConstants {
  readonly ln2: DoubleDouble;
  readonly sqrtPi: DoubleDouble;
  readonly airyAtZero: DoubleDouble;
  readonly minusAiryDerivativeAtZero: DoubleDouble;
}

let constants: DoubleDoubleConstants | undefined;

export function doubleDoubleConstants(): DoubleDoubleConstants {
  if (constants !== undefined) return constants;
  const D = Decimal.clone({ precision: 50 });
  const three = new D(3);
  constants = {
    ln2: decimalDoubleDouble.fromDecimal(new D(2).ln()),
    sqrtPi: decimalDoubleDouble.fromDecimal(D.acos(-1).sqrt()),
    airyAtZero: decimalDoubleDouble.fromDecimal(three.pow(new D(-2).div(3)).div(gammaDecimal(D, new D(2).div(3)))),
    minusAiryDerivativeAtZero: decimalDoubleDouble.fromDecimal(three.pow(new D(-1).div(3)).div(gammaDecimal(D, new D(1).div(3)))),
  };
  return constants;
}
