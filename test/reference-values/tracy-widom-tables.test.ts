import { Decimal } from 'decimal.js';
import { describe, expect, it } from 'vitest';
import { logRelativeError } from '../../reference-values/log-relative-error.js';
import { builtInTable } from '../../reference-values/reference-table-catalog.js';
import { TRACY_WIDOM_GRID } from '../../reference-values/tables/tracy-widom.generate.js';
import { pythonHas, runPython } from './python-reference.js';

const moments = builtInTable('tracy-widom-moments');
const distributions = builtInTable('tracy-widom-distributions');

/**
 * The published digits: mean and variance of TW1 and TW2 as in THEORY.md (Bornemann 2010, Markov
 * Process. Related Fields 16, arXiv:0904.1581); skewness, excess kurtosis and β = 4 as in Bornemann's
 * table as it is widely reproduced (values from memory, matching those copies).
 */
const PUBLISHED: Record<number, Record<string, string>> = {
  1: { mean: '-1.2065335745820', variance: '1.607781034581', skewness: '0.29346452408', excess_kurtosis: '0.1652429384' },
  2: { mean: '-1.771086807411', variance: '0.8131947928329', skewness: '0.224084203610', excess_kurtosis: '0.0934480876' },
  4: { mean: '-2.306884893241', variance: '0.5177237207726', skewness: '0.16550949435', excess_kurtosis: '0.0491951565' },
};

describe('tracy-widom-moments against the published digits', () => {
  it('matches every published digit: each published value is the certified value cut after its last digit', () => {
    // The table's digits are truncated, not rounded (e.g. TW2 mean −1.7710868074116…, published −1.771086807411):
    // so |certified| − |published| lies in [0, one unit of the last published digit).
    for (const [beta, published] of Object.entries(PUBLISHED)) {
      for (const [name, text] of Object.entries(published)) {
        const certified = new Decimal(moments.text({ beta: Number(beta) }, name) as string);
        const decimals = text.split('.')[1].length;
        const excess = certified.abs().minus(new Decimal(text).abs());
        expect(excess.gte(0) && excess.lt(new Decimal(10).pow(-decimals)), `β = ${beta} ${name}: ${certified.toString()} vs ${text}`).toBe(true);
      }
    }
  });

  it('scores the published values by LRE (NIST StRD convention) at 11 to 14 digits, their own precision', () => {
    for (const [beta, published] of Object.entries(PUBLISHED)) {
      for (const [name, text] of Object.entries(published)) {
        const lre = logRelativeError(Number(text), moments.text({ beta: Number(beta) }, name) as string, moments.digitsCap);
        expect(lre, `β = ${beta} ${name}`).toBeGreaterThanOrEqual(text.replace(/^-?0?\.?0*/, '').replace('.', '').length - 2);
      }
    }
  });

  it('describes the same laws as the distribution table: E X from the grid of F (trapezoid rule, step 1/4) to 1e-3', () => {
    const h = TRACY_WIDOM_GRID[1] - TRACY_WIDOM_GRID[0];
    for (const [beta, column] of [
      [1, 'F1'],
      [2, 'F2'],
      [4, 'F4'],
    ] as const) {
      // E X = ∫_0^∞ (1 − F) − ∫_{−∞}^0 F; the grid [−6, 6] leaves out less than 1e-5 of either tail.
      let mean = 0;
      TRACY_WIDOM_GRID.forEach((s, i) => {
        const F = distributions.number({ s }, column) as number;
        const weight = i === 0 || i === TRACY_WIDOM_GRID.length - 1 || s === 0 ? h / 2 : h;
        if (s >= 0) mean += weight * (1 - F);
        if (s <= 0) mean -= weight * F;
      });
      expect(Math.abs(mean - (moments.number({ beta }, 'mean') as number)), `β = ${beta}`).toBeLessThan(1e-3);
    }
  });

  it('has distribution functions that increase along the grid and reach 1 − 1e-5 by s = 6', () => {
    let previous = ['0', '0', '0'].map((v) => new Decimal(v));
    for (const s of TRACY_WIDOM_GRID) {
      const values = ['F1', 'F2', 'F4'].map((column) => new Decimal(distributions.text({ s }, column) as string));
      values.forEach((v, i) => expect(v.gt(previous[i]), `F${[1, 2, 4][i]} at s = ${s}`).toBe(true));
      previous = values;
    }
    expect(previous.every((v) => v.gt(1 - 1e-5))).toBe(true);
  });
});

describe.skipIf(!pythonHas('mpmath'))('tracy-widom-distributions against an independent 30-digit evaluation with mpmath (skipped without mpmath)', () => {
  it('F2(s) = det(I − K_Ai) on L²(s, ∞) (Tracy and Widom 1994; another kernel, Airy function, quadrature and determinant) in all 20 printed digits', () => {
    // Nyström on [s, 12] with n Gauss–Legendre nodes (Bornemann 2010, Math. Comp. 79), K_Ai(x, y) =
    // (Ai(x)Ai′(y) − Ai′(x)Ai(y))/(x − y), K_Ai(x, x) = Ai′(x)² − x Ai(x)²; the cut at 12 costs ~Ai(12)² ≈ 1e-24.
    const cases: [number, number][] = [
      [-2, 36],
      [1, 30],
    ];
    const theirs = runPython<string[]>([
      'import json, mpmath as mp',
      'mp.mp.dps = 30',
      'def gauss_legendre(n):',
      '    xs, ws = [], []',
      '    for i in range(1, n + 1):',
      '        x = mp.cos(mp.pi * (i - mp.mpf(1) / 4) / (n + mp.mpf(1) / 2))',
      '        for _ in range(100):',
      '            p0, p1 = mp.mpf(1), x',
      '            for k in range(1, n):',
      '                p0, p1 = p1, ((2 * k + 1) * x * p1 - k * p0) / (k + 1)',
      '            dp = n * (x * p1 - p0) / (x * x - 1)',
      '            dx = p1 / dp',
      '            x -= dx',
      '            if abs(dx) < mp.mpf(10) ** -32: break',
      '        xs.append(x); ws.append(2 / ((1 - x * x) * dp * dp))',
      '    return xs, ws',
      'def F2(s, n):',
      '    L = 12 - s',
      '    xs, ws = gauss_legendre(n)',
      '    u = [s + (x + 1) * L / 2 for x in xs]; w = [mp.sqrt(v * L / 2) for v in ws]',
      '    a = [mp.airyai(x) for x in u]; b = [mp.airyai(x, 1) for x in u]',
      '    M = mp.matrix(n, n)',
      '    for i in range(n):',
      '        for j in range(n):',
      '            k = b[i] ** 2 - u[i] * a[i] ** 2 if i == j else (a[i] * b[j] - b[i] * a[j]) / (u[i] - u[j])',
      '            M[i, j] = (1 if i == j else 0) - w[i] * k * w[j]',
      '    return mp.det(M)',
      `print(json.dumps([mp.nstr(F2(s, n), 28) for s, n in ${JSON.stringify(cases)}]))`,
    ]);
    cases.forEach(([s], i) => {
      const ours = new Decimal(distributions.text({ s }, 'F2') as string);
      expect(ours.minus(theirs[i]).abs().toNumber(), `F2(${s})`).toBeLessThan(1e-20);
    });
  });
});
