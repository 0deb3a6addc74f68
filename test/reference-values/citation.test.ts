import { describe, expect, it } from 'vitest';
import { type Citation, formatCitation } from '../../reference-values/citation.js';
import * as sources from '../../reference-values/sources.js';

describe('formatCitation', () => {
  it('writes authors, year, title, venue, locator, DOI and note in that order', () => {
    const c: Citation = {
      authors: 'A. Author and B. Author',
      year: 2001,
      title: 'A title',
      venue: 'A Journal 1(2), 3–4',
      locator: 'eq. (5)',
      doi: '10.0000/example',
      note: 'from memory',
    };
    expect(formatCitation(c)).toBe('A. Author and B. Author (2001). A title. A Journal 1(2), 3–4, eq. (5). doi:10.0000/example [from memory]');
  });

  it('leaves out absent optional parts', () => {
    expect(formatCitation({ authors: 'C. Author', year: 1999, title: 'T', venue: 'V' })).toBe('C. Author (1999). T. V.');
  });

  it('formats every named source, keeping its caveat', () => {
    const all = Object.values(sources) as Citation[];
    expect(all.length).toBeGreaterThanOrEqual(15);
    for (const c of all) {
      expect(c.authors.length).toBeGreaterThan(0);
      expect(Number.isInteger(c.year) && c.year > 1900 && c.year < 2100).toBe(true);
      const text = formatCitation(c);
      if (c.note !== undefined) expect(text).toContain(c.note);
    }
    expect(formatCitation(sources.HARER_ZAGIER_1986)).toContain('Inventiones Mathematicae 85');
  });
});
