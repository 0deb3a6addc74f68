import { describe, expect, it } from 'vitest';
import { eigenvalues } from '../../../harness/numeric/eigen.js';
import { linearStatistic } from '../../../harness/numeric/linear-statistic.js';
import { randomStream } from '../../../harness/numeric/random-stream.js';
import { normalisedResolventTrace } from '../../../harness/numeric/resolvent-statistics.js';
import { sampleMatrix } from '../../../harness/numeric/sample-wigner.js';
import { contourCoefficients, contourNodes } from '../../../properties/fluctuations/contour-quadrature.js';
import { TEST_FUNCTIONS } from '../../../properties/fluctuations/test-functions.js';

describe('contour quadrature of linear statistics', () => {
  for (const kind of ['goe', 'gue'] as const) {
    it(`gives Tr f(H) from resolvent traces to 1e-12 relative for every test function (${kind}, N = 200)`, () => {
      const n = 200;
      const values = eigenvalues(sampleMatrix({ kind }, n, randomStream(9, 'contour-test', 0)));
      const nodes = contourNodes();
      const traces = nodes.map((node) => normalisedResolventTrace(values, node.z));
      for (const f of TEST_FUNCTIONS) {
        const a = contourCoefficients(f.complex, nodes);
        let re = 0;
        let im = 0;
        a.forEach((c, j) => {
          re += n * (c.re * traces[j].re - c.im * traces[j].im);
          im += n * (c.re * traces[j].im + c.im * traces[j].re);
        });
        const direct = linearStatistic(values, f.real);
        // Scale: N·max|f| on the contour bounds the terms (contour-quadrature.ts).
        const bound = n * Math.max(...nodes.map((node) => Math.hypot(f.complex(node.z).re, f.complex(node.z).im)));
        expect(Math.abs(re - direct) / bound, f.name).toBeLessThan(1e-12);
        expect(Math.abs(im) / bound, f.name).toBeLessThan(1e-12);
      }
    });
  }

  it('evaluates the test functions on complex arguments consistently with the real ones', () => {
    for (const f of TEST_FUNCTIONS) {
      for (const x of [-1.7, 0, 0.4, 2.3]) {
        const value = f.complex({ re: x, im: 0 });
        expect(value.re).toBeCloseTo(f.real(x), 13);
        expect(Math.abs(value.im)).toBeLessThan(1e-13);
      }
    }
  });
});
