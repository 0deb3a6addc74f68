import fc from 'fast-check';
import type { Complex } from '../../harness/numeric/complex.js';

/**
 * Where a spectral parameter z = E + iη sits relative to the semicircle's support [−2, 2]:
 * - bulk: |E| ≤ 1.6, η from order one down to the mesoscopic scale N^(−1/2);
 * - edge: 1.7 ≤ |E| ≤ 2.3, η from order one down to N^(−1/3) (the edge's own scale is N^(−2/3);
 *   the 1/N expansion of E⟨G⟩ needs η ≫ N^(−2/3), common practice);
 * - outside: 2.5 ≤ |E| ≤ 4, η from order one down to N^(−1/2).
 * Both half-planes: the sign of η is drawn too, so a wrong branch below the real axis shows.
 * The mesoscopic floor stops at γ = 1/2 (../shared/THEORY.md: keep γ ≤ 0.5 for default checks).
 */
export type SpectralRegion = 'bulk' | 'edge' | 'outside';

const ENERGY_RANGE: Record<SpectralRegion, [number, number]> = {
  bulk: [0, 1.6],
  edge: [1.7, 2.3],
  outside: [2.5, 4],
};

const SMALLEST_ETA_EXPONENT: Record<SpectralRegion, number> = { bulk: 0.5, edge: 1 / 3, outside: 0.5 };

/** Points on a grid of 10⁻⁴, so a check's id names z exactly and a replay draws the same point. */
const GRID = 1e4;

/**
 * A number drawn uniformly from [min, max] on the grid. fast-check's double arbitrary spreads over
 * the bit patterns of doubles, favouring tiny magnitudes; an integer grid is uniform.
 */
function onGrid(min: number, max: number): fc.Arbitrary<number> {
  return fc.integer({ min: Math.ceil(min * GRID), max: Math.floor(max * GRID) }).map((k) => k / GRID);
}

export function spectralParameterArbitrary(region: SpectralRegion, size: number): fc.Arbitrary<Complex> {
  const [eMin, eMax] = ENERGY_RANGE[region];
  const logEtaMin = -SMALLEST_ETA_EXPONENT[region] * Math.log(size);
  return fc
    .record({
      energy: onGrid(eMin, eMax),
      negativeEnergy: fc.boolean(),
      logEta: onGrid(logEtaMin, 0),
      lowerHalfPlane: fc.boolean(),
    })
    .map(({ energy, negativeEnergy, logEta, lowerHalfPlane }) => {
      const eta = Math.max(Math.round(Math.exp(logEta) * GRID) / GRID, 1 / GRID);
      // 0 − 0 would be −0: keep the energy's sign only where it has one.
      return { re: negativeEnergy && energy !== 0 ? -energy : energy, im: lowerHalfPlane ? -eta : eta };
    });
}

export interface DrawnSpectralParameter {
  readonly z: Complex;
  readonly region: SpectralRegion;
}

/** `perRegion` points in each region, drawn by fast-check from `seed` (reproducible). */
export function drawSpectralParameters(seed: number, size: number, perRegion: number): DrawnSpectralParameter[] {
  const regions: SpectralRegion[] = ['bulk', 'edge', 'outside'];
  return regions.flatMap((region, r) =>
    fc.sample(spectralParameterArbitrary(region, size), { seed: (seed + 7919 * (r + 1)) | 0, numRuns: perRegion }).map((z) => ({ z, region })),
  );
}
