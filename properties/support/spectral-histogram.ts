/**
 * A histogram of eigenvalues pooled over samples, on fixed bins over [−limit, limit]; values
 * outside fall into the outermost bins' tally of `outside`. Streaming: add one spectrum at a time.
 */
export class SpectralHistogram {
  private readonly counts: Float64Array;
  private total = 0;
  private outside = 0;

  constructor(
    readonly limit = 2.5,
    readonly bins = 50,
  ) {
    this.counts = new Float64Array(bins);
  }

  add(eigenvalues: ArrayLike<number>): void {
    const width = (2 * this.limit) / this.bins;
    for (let i = 0; i < eigenvalues.length; i++) {
      const k = Math.floor((eigenvalues[i] + this.limit) / width);
      if (k >= 0 && k < this.bins) this.counts[k]++;
      else this.outside++;
      this.total++;
    }
  }

  binEdges(): number[] {
    return Array.from({ length: this.bins + 1 }, (_, k) => -this.limit + (2 * this.limit * k) / this.bins);
  }

  /** Counts per bin over (total · bin width): comparable with a density. */
  density(): number[] {
    const width = (2 * this.limit) / this.bins;
    return Array.from(this.counts, (c) => (this.total > 0 ? c / (this.total * width) : 0));
  }

  get fractionOutside(): number {
    return this.total > 0 ? this.outside / this.total : 0;
  }
}
