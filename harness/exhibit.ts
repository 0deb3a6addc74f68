/**
 * Data a check attaches to its verdict for a picture (the HTML report draws them): what people
 * would rather look at than read. Plain numbers only; a reporter decides how to draw them.
 */
export type Exhibit =
  | {
      /** Histogram of pooled eigenvalues against the semicircle density. */
      readonly kind: 'spectral-histogram';
      readonly binEdges: readonly number[];
      /** Observed density per bin (counts / (total · width)). */
      readonly density: readonly number[];
      readonly label: string;
    }
  | {
      /** Standardised fluctuations (observed − mean)/sd, for a normal quantile plot. */
      readonly kind: 'normal-quantiles';
      readonly standardised: readonly number[];
      readonly label: string;
    }
  | {
      /** Observed against predicted values with error bars (e.g. covariances). */
      readonly kind: 'observed-vs-predicted';
      readonly points: ReadonlyArray<{ readonly label: string; readonly observed: number; readonly standardError: number; readonly predicted: number }>;
      readonly label: string;
    }
  | {
      /** A quantity over N on log–log axes with the fitted line. */
      readonly kind: 'log-log-decay';
      readonly points: ReadonlyArray<{ readonly n: number; readonly value: number; readonly standardError: number }>;
      readonly slope: number;
      readonly intercept: number;
      readonly label: string;
    };
