/**
 * A bibliographic reference for a closed form, a table or a numerical method, and its one-line
 * text. Every reference value in this folder carries one or more of these, so a verdict can say
 * where the number it was held against comes from.
 */
export interface Citation {
  /** Authors as printed, e.g. "Z. D. Bai and J. Yao". */
  readonly authors: string;
  readonly year: number;
  readonly title: string;
  /** Journal with volume (and pages), or publisher for a book, or the database for a web source. */
  readonly venue: string;
  /** Where in the source: equation, theorem, table, section. */
  readonly locator?: string;
  readonly doi?: string;
  /** Anything a reader must know, e.g. "details from memory: page range not checked". */
  readonly note?: string;
}

/**
 * One line: `Authors (year). Title. Venue, locator. doi:… [note]`. Optional parts are left out
 * when absent; the note is kept in brackets so a caveat such as "from memory" is never lost.
 */
export function formatCitation(c: Citation): string {
  let text = `${c.authors} (${c.year}). ${c.title}. ${c.venue}`;
  if (c.locator !== undefined && c.locator !== '') text += `, ${c.locator}`;
  text += '.';
  if (c.doi !== undefined && c.doi !== '') text += ` doi:${c.doi}`;
  if (c.note !== undefined && c.note !== '') text += ` [${c.note}]`;
  return text;
}
