/**
 * A table that cannot be trusted: not JSON, not valid against the schema, inconsistent, or edited
 * since its digest was computed. The message names the file and the JSON path of the problem, e.g.
 * `tables/my-lab.json: at /rows/3/2: must be a decimal string such as "-1.25e-3", got 0.5`.
 */
export class ReferenceTableError extends Error {
  override readonly name = 'ReferenceTableError';

  constructor(
    readonly file: string,
    /** JSON Pointer of the offending value ('' for the whole file). */
    readonly jsonPath: string,
    readonly detail: string,
  ) {
    super(jsonPath === '' ? `${file}: ${detail}` : `${file}: at ${jsonPath}: ${detail}`);
  }
}
