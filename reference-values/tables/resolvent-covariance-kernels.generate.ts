import type { Decimal } from 'decimal.js';
import type { ReferenceTableContent } from '../reference-table.js';
import { type DecimalComplex, type DecimalConstructor, decimalComplex as C } from '../high-precision/decimal-complex.js';
import { decimalCell } from '../high-precision/decimal-cell.js';
import { rowsAtTwoPrecisions } from '../high-precision/rows-at-two-precisions.js';
import { stieltjesDecimal } from '../high-precision/stieltjes-decimal.js';
import { BAI_SILVERSTEIN_2010, KHORUNZHY_KHORUZHENKO_PASTUR_1996 } from '../sources.js';
import { DECIMAL_DIGITS, decimalProvenance } from './decimal-provenance.js';
import { runGeneratorIfMain } from './run-generator.js';
import { tableColumns } from './table-columns.js';

/**
 * The spectral parameters of the covariance tables: bulk, near the edge, outside the spectrum, and
 * a small Im z, in both half-planes (Cov(Tr G(z), Tr G(z̄)) is what a variance needs). Every
 * unordered pair, a point with itself included, is a row (the kernels are symmetric).
 */
export const COVARIANCE_POINTS: readonly (readonly [number, number])[] = [
  [0.5, 1],
  [-1, 0.5],
  [1.5, 0.2],
  [0, 0.05],
  [2, 0.1],
  [2.5, 0.5],
  [0.5, -1],
  [1.5, -0.2],
];

type KernelTerms = (m1: DecimalComplex, m2: DecimalComplex, d1: DecimalComplex, d2: DecimalComplex, D: DecimalConstructor) => DecimalComplex[];

/** pairing, diagonal, cumulant terms of Cov(Tr G(z1), Tr G(z2)) (THEORY.md, "Fluctuations: one resolvent"). */
const tracialTerms: KernelTerms = (m1, m2, d1, d2, D) => {
  const product = C.mul(m1, m2);
  const derivatives = C.mul(d1, d2);
  const gap = C.sub(C.of(D, 1), product);
  return [C.div(derivatives, C.mul(gap, gap)), derivatives, C.scale(C.mul(derivatives, product), 2)];
};

/** pairing, diagonal, cumulant terms of Cov(Tr G(z1)Å1, Tr G(z2)Å2) (THEORY.md, "Traceless part"). */
const tracelessTerms: KernelTerms = (m1, m2, _d1, _d2, D) => {
  const product = C.mul(m1, m2);
  const squared = C.mul(product, product);
  return [C.div(squared, C.sub(C.of(D, 1), product)), squared, C.mul(squared, product)];
};

function kernelRows(terms: KernelTerms) {
  return (D: DecimalConstructor) => {
    const rows: (number | string)[][] = [];
    COVARIANCE_POINTS.forEach(([x1, y1], i) => {
      const first = stieltjesDecimal(D, C.of(D, x1, y1));
      for (const [x2, y2] of COVARIANCE_POINTS.slice(i)) {
        const second = stieltjesDecimal(D, C.of(D, x2, y2));
        const values = terms(first.m, second.m, first.derivative, second.derivative, D);
        rows.push([x1, y1, x2, y2, ...values.flatMap((v) => [v.re, v.im]).map((v: Decimal) => decimalCell(v, DECIMAL_DIGITS.printed))]);
      }
    });
    return rows;
  };
}

function kernelTable(kind: 'tracial' | 'traceless'): ReferenceTableContent {
  const tracial = kind === 'tracial';
  const parts = (name: string, what: string) => ({ [`re_${name}`]: ['decimal', `Re ${what}`], [`im_${name}`]: ['decimal', `Im ${what}`] }) as const;
  return {
    name: `resolvent-covariance-${kind}`,
    title: tracial
      ? 'Limiting covariance kernel of Tr G(z1), Tr G(z2) for Wigner matrices, by term'
      : 'Limiting covariance kernel of Tr G(z1)Å1, Tr G(z2)Å2 (traceless weights) for Wigner matrices, by term',
    quantity: {
      symbol: tracial ? 'lim Cov(Tr G(z1), Tr G(z2))' : 'lim Cov(Tr G(z1)Å1, Tr G(z2)Å2)',
      definition: tracial
        ? 'the N → ∞ covariance (bilinear, no conjugation) of the traces of the resolvents G(z) = (H − z)⁻¹ of a Wigner matrix'
        : 'the N → ∞ covariance (bilinear) of Tr G(z1)Å1 and Tr G(z2)Å2 for deterministic traceless weights Å1, Å2 of bounded norm',
      conventions: {
        normalisation: 'Wigner matrix with off-diagonal E|h_ij|² = 1/N, diagonal variance σ_d²/N, normalised fourth cumulant κ4 (THEORY.md, "Conventions")',
        beta: [1, 2],
        branch: 'm_j = m(z_j) with Im m·Im z > 0, m′_j its derivative (table semicircle-stieltjes)',
        notes: tracial
          ? 'Cov → (2/β)·pairing + (σ_d² − 2/β)·diagonal + κ4·cumulant, with pairing = m1′m2′/(1 − m1m2)², diagonal = m1′m2′, cumulant = 2 m1′m2′ m1m2. GOE (β = 1, σ_d² = 2) and GUE (β = 2, σ_d² = 1) have κ4 = 0 and σ_d² − 2/β = 0: Cov = (2/β)·pairing.'
          : 'Cov → S·pairing + [(σ_d² − 2/β)·diagonal + κ4·cumulant]·⟨d(Å1)d(Å2)⟩, with pairing = m1²m2²/(1 − m1m2), diagonal = m1²m2², cumulant = m1³m2³; S = ⟨Å1Å2⟩ for β = 2, ⟨Å1Å2⟩ + ⟨Å1Å2ᵀ⟩ for β = 1; ⟨d(Å1)d(Å2)⟩ = (1/N) Σ_i (Å1)_ii (Å2)_ii.',
      },
    },
    sources: tracial ? [KHORUNZHY_KHORUZHENKO_PASTUR_1996, BAI_SILVERSTEIN_2010] : [KHORUNZHY_KHORUZHENKO_PASTUR_1996],
    ...decimalProvenance(
      'resolvent-covariance-kernels.generate.ts',
      tracial
        ? 'm1′m2′[(2/β)/(1 − m1m2)² + (σ_d² − 2/β) + 2κ4 m1m2] = ∂z1∂z2[−(2/β) log(1 − m1m2) + (σ_d² − 2/β) m1m2 + (κ4/2) m1²m2²] (THEORY.md), term by term, in decimal arithmetic'
        : 'S m1²m2²/(1 − m1m2) + [(σ_d² − 2/β) m1²m2² + κ4 m1³m2³]⟨d(Å1)d(Å2)⟩ (THEORY.md, derived by cumulant expansion and verified by simulation there), term by term, in decimal arithmetic',
      `the values of the formula against a double-precision evaluation, numpy and mpmath where present${tracial ? ', and the pairing term against finite differences of −log(1 − m1m2)' : ''}. The formula is a limit: at finite N the covariance differs by O(1/N)`,
    ),
    columns: tableColumns(
      { re_z1: ['number', 'Re z1'], im_z1: ['number', 'Im z1'], re_z2: ['number', 'Re z2'], im_z2: ['number', 'Im z2'] },
      {
        ...parts('pairing', tracial ? 'm1′m2′/(1 − m1m2)²' : 'm1²m2²/(1 − m1m2)'),
        ...parts('diagonal', tracial ? 'm1′m2′' : 'm1²m2²'),
        ...parts('cumulant', tracial ? '2 m1′m2′ m1m2' : 'm1³m2³'),
      },
    ),
    rows: rowsAtTwoPrecisions(DECIMAL_DIGITS.working, kernelRows(tracial ? tracialTerms : tracelessTerms)),
  };
}

/** Generator of resolvent-covariance-tracial.json and resolvent-covariance-traceless.json. */
export const resolventCovarianceTracialTable = (): ReferenceTableContent => kernelTable('tracial');
export const resolventCovarianceTracelessTable = (): ReferenceTableContent => kernelTable('traceless');

runGeneratorIfMain(import.meta.url, [resolventCovarianceTracialTable, resolventCovarianceTracelessTable]);
