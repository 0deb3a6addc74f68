import { describe, expect, it } from 'vitest';
import { parseAlpha, parseComplex, parseEnsembleList, parseSizeList, parseWholeNumber } from '../../../harness/cli/parse-values.js';
import { UsageError } from '../../../harness/cli/usage-error.js';

describe('parse-values', () => {
  it('reads complex numbers as people type them', () => {
    expect(parseComplex('0.5+0.1i')).toEqual({ re: 0.5, im: 0.1 });
    expect(parseComplex('-1e-3-2.5i')).toEqual({ re: -1e-3, im: -2.5 });
    expect(parseComplex('2i')).toEqual({ re: 0, im: 2 });
    expect(parseComplex('-i')).toEqual({ re: 0, im: -1 });
    expect(parseComplex('3')).toEqual({ re: 3, im: 0 });
    expect(() => parseComplex('1+')).toThrow(UsageError);
  });

  it('refuses impossible run settings with the option named', () => {
    expect(() => parseSizeList('1')).toThrow(/--size/);
    expect(() => parseSizeList('200,abc')).toThrow(/--size/);
    expect(parseSizeList('100, 200')).toEqual([100, 200]);
    expect(() => parseWholeNumber('samples', 0, 2)).toThrow(/--samples/);
    expect(() => parseWholeNumber('samples', '2.5', 2)).toThrow(/--samples/);
    expect(() => parseAlpha(0)).toThrow(/--alpha/);
    expect(() => parseAlpha(1)).toThrow(/--alpha/);
    expect(parseAlpha('0.01')).toBe(0.01);
  });

  it('reads ensemble lists, including general Wigner laws', () => {
    const [goe, w] = parseEnsembleList('goe,wigner:real:rademacher:diag=zero');
    expect(goe).toEqual({ kind: 'goe' });
    expect(w).toMatchObject({ kind: 'wigner', field: 'real', offDiagonal: 'rademacher', diagonal: 'zero' });
    expect(() => parseEnsembleList('goe,poisson')).toThrow(/--ensemble/);
  });
});
