import { describe, expect, it } from 'vitest';
import { evenMomentReference } from '../../properties/semicircle/moment-group.js';

describe('the semicircle suite\u2019s even-moment reference', () => {
  it('is exact for GOE and GUE at every N, from the certified tables, with no asymptotic allowance', () => {
    for (const size of [2, 40, 64, 65, 200, 800]) {
      for (let k = 1; k <= 4; k++) {
        const goe = evenMomentReference({ kind: 'goe' }, size, k);
        expect(goe.allowance).toBe(0);
        expect(goe.source).toMatch(/goe-even-moment/);
        const gue = evenMomentReference({ kind: 'gue' }, size, k);
        expect(gue.allowance).toBe(0);
        expect(gue.source).toMatch(/gue-even-moment/);
      }
    }
    // E Tr X⁶ = 5N⁴ + 22N³ + 52N² + 41N (GOE, THEORY.md) over N⁴ at N = 200.
    expect(evenMomentReference({ kind: 'goe' }, 200, 3).value).toBe((5 * 200 ** 4 + 22 * 200 ** 3 + 52 * 200 ** 2 + 41 * 200) / 200 ** 4);
  });

  it('keeps the limit plus 1/N correction, with its allowance, for other Wigner ensembles', () => {
    const r = evenMomentReference({ kind: 'wigner', field: 'real', offDiagonal: 'rademacher', diagonal: 'zero', diagonalVariance: 0 }, 200, 2);
    expect(r.allowance).toBeGreaterThan(0);
    expect(r.source).toMatch(/Bai and Yao 2005/);
  });
});
