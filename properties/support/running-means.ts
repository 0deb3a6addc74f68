/**
 * Running means and variances of several real statistics observed together on each sample,
 * by Welford's update (B. P. Welford, 1962, Technometrics 4(3), 419–420). Memory does not grow
 * with the number of samples.
 */
export class RunningMeans {
  private n = 0;
  private readonly mean: Float64Array;
  private readonly m2: Float64Array;

  constructor(readonly width: number) {
    this.mean = new Float64Array(width);
    this.m2 = new Float64Array(width);
  }

  add(values: ArrayLike<number>): void {
    this.n++;
    for (let j = 0; j < this.width; j++) {
      const delta = values[j] - this.mean[j];
      this.mean[j] += delta / this.n;
      this.m2[j] += delta * (values[j] - this.mean[j]);
    }
  }

  get count(): number {
    return this.n;
  }

  meanOf(j: number): number {
    return this.mean[j];
  }

  /** Standard error of the mean, s/√n with the unbiased sample variance. */
  standardErrorOf(j: number): number {
    return this.n > 1 ? Math.sqrt(this.m2[j] / (this.n - 1) / this.n) : NaN;
  }
}
