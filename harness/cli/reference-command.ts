import { formatComplex } from '../numeric/complex.js';
import { ensembleConstants, parseEnsemble } from '../numeric/ensemble.js';
import { certifiedEvenMoment } from '../../reference-values/certified-even-moment.js';
import { evenMomentCorrection, resolventMeanCorrection } from '../../reference-values/finite-n-corrections.js';
import {
  catalanNumber,
  semicircleCdf,
  semicircleDensity,
  stieltjesSemicircle,
  stieltjesSemicircleDerivative,
} from '../../reference-values/semicircle-law.js';
import { parseComplex, parseWholeNumber } from './parse-values.js';
import { UsageError } from './usage-error.js';

export type ReferenceQuantity = 'stieltjes' | 'density' | 'cdf' | 'moment';
export const REFERENCE_QUANTITIES: readonly ReferenceQuantity[] = ['stieltjes', 'density', 'cdf', 'moment'];

/** `rmt-assay reference value QUANTITY AT [--size N] [--ensemble E]` (or without "value"). */
export interface ReferenceArguments {
  readonly quantity?: string;
  readonly at?: string;
  readonly size?: number;
  readonly ensemble?: string;
}

function parseReal(text: string): number {
  const x = Number(text);
  if (text.trim() === '' || !Number.isFinite(x)) throw new UsageError(`'${text}' is not a real number`);
  return x;
}

function ensembleOption(text: string, size: number) {
  try {
    return ensembleConstants(parseEnsemble(text), size);
  } catch (error) {
    throw new UsageError(`--ensemble: ${(error as Error).message}`);
  }
}

function momentLines(args: ReferenceArguments, at: string): string[] {
  const k = parseWholeNumber('k', at, 0, 60);
  const lines = [`lim E⟨H^${2 * k}⟩ = Catalan(${k}) = ${catalanNumber(k)} (OEIS A000108)`];
  if (args.size === undefined) return lines;
  const n = parseWholeNumber('size', args.size, 1);
  for (const ensemble of ['goe', 'gue'] as const) {
    const exact = certifiedEvenMoment(ensemble, n, k);
    const label = ensemble.toUpperCase();
    if (exact === undefined) lines.push(`${label}, N = ${n}: not tabulated beyond k = 12`);
    else lines.push(`${label}, N = ${n}: E⟨H^${2 * k}⟩ = ${exact.normalised}; ${exact.source}`);
  }
  if (args.ensemble !== undefined) {
    lines.push(`${args.ensemble}: 1/N coefficient ${evenMomentCorrection(k, ensembleOption(args.ensemble, n))} (Bai and Yao 2005)`);
  }
  return lines;
}

/** Lines describing a reference value, each with its formula and source. */
export function referenceLines(args: ReferenceArguments): string[] {
  if (args.quantity === undefined) {
    throw new UsageError('name a reference command: list, show NAME, export NAME --format json|csv, or value QUANTITY AT');
  }
  if (!(REFERENCE_QUANTITIES as readonly string[]).includes(args.quantity)) {
    throw new UsageError(
      `unknown reference command or quantity '${args.quantity}' (commands: list, show, export, value; quantities: ${REFERENCE_QUANTITIES.join(', ')})`,
    );
  }
  const at = args.at;
  if (at === undefined) throw new UsageError(`give the point: rmt-assay reference value ${args.quantity} AT (z, x or k)`);
  switch (args.quantity) {
    case 'stieltjes': {
      const z = parseComplex(at);
      const lines = [
        `m(${formatComplex(z)}) = ${formatComplex(stieltjesSemicircle(z))}`,
        `m'(${formatComplex(z)}) = ${formatComplex(stieltjesSemicircleDerivative(z))}`,
        'm(z) = (−z + √(z² − 4))/2 with Im m·Im z > 0; m′ = m²/(1 − m²) (Wigner 1955; Anderson, Guionnet and Zeitouni 2010, §2.4)',
        'certified to 15 digits on a grid: rmt-assay reference show semicircle-stieltjes',
      ];
      if (args.ensemble !== undefined) {
        const c = ensembleOption(args.ensemble, args.size ?? 200);
        lines.push(
          `δ(z) = lim N(E⟨G(z)⟩ − m(z)) for ${args.ensemble} = ${formatComplex(resolventMeanCorrection(z, c))} (mean correction, Bai and Yao 2005)`,
        );
      }
      return lines;
    }
    case 'density': {
      const x = parseReal(at);
      return [`ρ(${x}) = ${semicircleDensity(x)}`, 'ρ(x) = √(4 − x²)/(2π) on [−2, 2] (Wigner 1958)'];
    }
    case 'cdf': {
      const x = parseReal(at);
      return [`F(${x}) = ${semicircleCdf(x)}`, 'F(x) = 1/2 + x√(4 − x²)/(4π) + arcsin(x/2)/π on [−2, 2]'];
    }
    case 'moment':
      return momentLines(args, at);
    default:
      throw new UsageError(`unknown reference quantity '${args.quantity}' (choose from ${REFERENCE_QUANTITIES.join(', ')})`);
  }
}
