import { formatComplex } from '../numeric/complex.js';
import { ensembleConstants, parseEnsemble } from '../numeric/ensemble.js';
import {
  catalanNumber,
  semicircleCdf,
  semicircleDensity,
  stieltjesSemicircle,
  stieltjesSemicircleDerivative,
} from '../../reference-values/semicircle-law.js';
import { evenMomentCorrection, exactEvenMomentGOE, exactEvenMomentGUE, resolventMeanCorrection } from '../../reference-values/finite-n-corrections.js';
import { parseComplex, parseWholeNumber } from './parse-values.js';
import { UsageError } from './usage-error.js';

export type ReferenceQuantity = 'stieltjes' | 'density' | 'cdf' | 'moment';
export const REFERENCE_QUANTITIES: readonly ReferenceQuantity[] = ['stieltjes', 'density', 'cdf', 'moment'];

export interface ReferenceArguments {
  readonly quantity: string;
  readonly at: string;
  readonly size?: number;
  readonly ensemble?: string;
}

function parseReal(text: string): number {
  const x = Number(text);
  if (text.trim() === '' || !Number.isFinite(x)) throw new UsageError(`'${text}' is not a real number`);
  return x;
}

/** Lines describing a reference value, each with its formula and source. */
export function referenceLines(args: ReferenceArguments): string[] {
  switch (args.quantity) {
    case 'stieltjes': {
      const z = parseComplex(args.at);
      const lines = [
        `m(${formatComplex(z)}) = ${formatComplex(stieltjesSemicircle(z))}`,
        `m'(${formatComplex(z)}) = ${formatComplex(stieltjesSemicircleDerivative(z))}`,
        'm(z) = (−z + √(z² − 4))/2 with Im m·Im z > 0; m′ = m²/(1 − m²) (Wigner 1955; Anderson, Guionnet and Zeitouni 2010, §2.4)',
      ];
      if (args.ensemble !== undefined) {
        const c = ensembleConstants(parseEnsemble(args.ensemble), args.size ?? 200);
        lines.push(
          `δ(z) = lim N(E⟨G(z)⟩ − m(z)) for ${args.ensemble} = ${formatComplex(resolventMeanCorrection(z, c))} (mean correction, Bai and Yao 2005)`,
        );
      }
      return lines;
    }
    case 'density': {
      const x = parseReal(args.at);
      return [`ρ(${x}) = ${semicircleDensity(x)}`, 'ρ(x) = √(4 − x²)/(2π) on [−2, 2] (Wigner 1958)'];
    }
    case 'cdf': {
      const x = parseReal(args.at);
      return [`F(${x}) = ${semicircleCdf(x)}`, 'F(x) = 1/2 + x√(4 − x²)/(4π) + arcsin(x/2)/π on [−2, 2]'];
    }
    case 'moment': {
      const k = parseWholeNumber('k', args.at, 0, 60);
      const lines = [`lim E⟨H^${2 * k}⟩ = Catalan(${k}) = ${catalanNumber(k)} (OEIS A000108)`];
      if (args.size !== undefined) {
        const n = parseWholeNumber('size', args.size, 1);
        const goe = exactEvenMomentGOE(n, k);
        const gue = exactEvenMomentGUE(n, k);
        if (goe !== undefined) lines.push(`GOE, N = ${n}: E⟨H^${2 * k}⟩ = ${goe} (exact; Wick enumeration)`);
        if (gue !== undefined) lines.push(`GUE, N = ${n}: E⟨H^${2 * k}⟩ = ${gue} (exact; Harer and Zagier 1986)`);
        if (args.ensemble !== undefined) {
          const c = ensembleConstants(parseEnsemble(args.ensemble), n);
          lines.push(`${args.ensemble}: 1/N coefficient ${evenMomentCorrection(k, c)} (Bai and Yao 2005)`);
        }
      }
      return lines;
    }
    default:
      throw new UsageError(`unknown reference quantity '${args.quantity}' (choose from ${REFERENCE_QUANTITIES.join(', ')})`);
  }
}
