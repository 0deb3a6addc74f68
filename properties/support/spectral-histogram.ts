/**
 * A histogram of eigenvalues pooled over samples, on fixed bins over [−limit, limit]; values
 * outside fall into `outside`. Plain data: a block's histogram crosses to a worker thread or into
 * a shard file unchanged, and histograms of disjoint samples add (exactly: the counts are integers).
 */
export interface SpectralHistogram {
  readonly limit: number;
  readonly counts: Float64Array;
  readonly total: number;
  readonly outside: number;
}

export function emptySpectralHistogram(limit = 2.5, bins = 50): SpectralHistogram {
  return { limit, counts: new Float64Array(bins), total: 0, outside: 0 };
}

/** The histogram with one more spectrum; counts are updated in place. */
export function addSpectrum(histogram: SpectralHistogram, eigenvalues: ArrayLike<number>): SpectralHistogram {
  const { limit, counts } = histogram;
  const width = (2 * limit) / counts.length;
  let outside = histogram.outside;
  for (let i = 0; i < eigenvalues.length; i++) {
    const k = Math.floor((eigenvalues[i] + limit) / width);
    if (k >= 0 && k < counts.length) counts[k]++;
    else outside++;
  }
  return { limit, counts, total: histogram.total + eigenvalues.length, outside };
}

export function combineSpectralHistograms(left: SpectralHistogram, right: SpectralHistogram): SpectralHistogram {
  return {
    limit: left.limit,
    counts: left.counts.map((c, k) => c + right.counts[k]),
    total: left.total + right.total,
    outside: left.outside + right.outside,
  };
}

export function histogramBinEdges(histogram: SpectralHistogram): number[] {
  const { limit, counts } = histogram;
  return Array.from({ length: counts.length + 1 }, (_, k) => -limit + (2 * limit * k) / counts.length);
}

/** Counts per bin over (total · bin width): comparable with a density. */
export function histogramDensity(histogram: SpectralHistogram): number[] {
  const width = (2 * histogram.limit) / histogram.counts.length;
  return Array.from(histogram.counts, (c) => (histogram.total > 0 ? c / (histogram.total * width) : 0));
}
