import type { Citation } from './citation.js';

/**
 * A certified reference table as it is stored in reference-values/tables/NAME.json (and in a
 * user's own folder of tables): what the quantity is and in which conventions, where it comes
 * from, how it was produced, how many digits are certified, and the values as rows of cells.
 * The JSON Schema is reference-table.schema.json; `parseReferenceTable` validates against it and
 * checks what a schema cannot (cell types per column, unique parameter rows, the digest).
 */

/**
 * How a column's cells are written:
 * - 'number': a JSON number (grid parameters such as N, k, s, Re z);
 * - 'integer': an exact integer as a decimal string, any length ("-12", "70368744177664");
 * - 'decimal': a real number as a decimal string, kept as text so no digit is lost to binary;
 * - 'label': a name (a test function, an ensemble).
 */
export type ColumnType = 'number' | 'integer' | 'decimal' | 'label';

export interface ReferenceColumn {
  readonly name: string;
  readonly type: ColumnType;
  /** 'parameter' columns together identify a row; 'value' columns hold the certified values. */
  readonly role: 'parameter' | 'value';
  readonly description: string;
}

export type Cell = number | string;

/** The conventions a value depends on (THEORY.md, "Conventions"); absent means "not applicable". */
export interface TableConventions {
  /** Entry normalisation, e.g. "unnormalised: off-diagonal E x_ij² = 1, diagonal variance 2". */
  readonly normalisation: string;
  readonly beta?: number | readonly number[];
  /** σ_d² = N·Var h_ii. */
  readonly diagonalVariance?: number;
  readonly kappa4?: number;
  /** The branch of a multivalued function, e.g. of √(z² − 4). */
  readonly branch?: string;
  /** How the columns combine into the quantity for given β, σ_d², κ4, and anything else. */
  readonly notes?: string;
}

export interface TableProduction {
  /** The generator script beside the JSON (NAME.generate.ts), or a description of an outside origin. */
  readonly generator: string;
  readonly method: string;
  /** e.g. "exact integer arithmetic (BigInt)", "decimal.js, 50 significant digits". */
  readonly arithmetic: string;
  /** The working precision and the accuracy reached, in words. */
  readonly precision: string;
  readonly tool: string;
}

export interface ReferenceTableContent {
  readonly name: string;
  readonly title: string;
  readonly quantity: {
    readonly symbol: string;
    readonly definition: string;
    readonly conventions: TableConventions;
  };
  readonly sources: readonly Citation[];
  readonly production: TableProduction;
  /** Significant digits every value is certified to, or 'exact' (exact integers). */
  readonly certifiedDigits: number | 'exact';
  /** The evidence behind certifiedDigits: a convergence study, exact arithmetic, a published table. */
  readonly certification: string;
  readonly columns: readonly ReferenceColumn[];
  readonly rows: readonly (readonly Cell[])[];
}

export interface ReferenceTable extends ReferenceTableContent {
  /** "sha256:" and the hex SHA-256 of the compact JSON of every other field, in file order. */
  readonly digest: string;
}
