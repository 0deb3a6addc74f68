import type { TraceSample } from '../compare/sampled-trace-statistics.js';
import { summariseMoments } from '../estimators/moment-summary.js';
import { formatComplex, type Complex } from '../numeric/complex.js';
import type { RecordedStatistic } from './baseline-file.js';

/** The moments of Re and Im of Tr G(z) at each point, from one implementation's samples. */
export function traceMoments(sample: TraceSample, points: readonly Complex[]): RecordedStatistic[] {
  return points.flatMap((z, j) =>
    (['re', 'im'] as const).map((part) => {
      const values = sample.values[j].filter((_, i) => i % 2 === (part === 're' ? 0 : 1));
      const m = summariseMoments(values);
      return {
        name: `${part === 're' ? 'Re' : 'Im'} Tr G(${formatComplex(z)})`,
        point: [z.re, z.im] as const,
        part,
        mean: m.mean,
        variance: m.variance,
        fourthCentralMoment: m.fourthCentralMoment,
      };
    }),
  );
}
