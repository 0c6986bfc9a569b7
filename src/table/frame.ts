/**
 * The Frame: the typed, arquero-free form of an extract that every learner reads.
 *
 * - numeric columns: Float64Array, missing as NaN (±Infinity is rejected when a frame is built);
 * - boolean columns: numeric 0/1 with NaN for missing, kind 'boolean' so the schema remembers it;
 * - categorical columns: Int32Array codes into `categories`, -1 for missing;
 * - dates are expanded into numeric part columns (`origin` says which date and which part).
 */

export type ColumnKind = 'numeric' | 'boolean' | 'categorical';

/** Where a derived column came from (date parts). */
export interface ColumnOrigin {
  readonly source: string;
  readonly part: 'year' | 'month' | 'day' | 'weekday' | 'dayOfYear' | 'hour' | 'epochDays';
}

export interface NumericColumn {
  readonly name: string;
  readonly kind: 'numeric' | 'boolean';
  /** One value per row; NaN means missing. */
  readonly values: Float64Array;
  readonly origin?: ColumnOrigin;
}

export interface CategoricalColumn {
  readonly name: string;
  readonly kind: 'categorical';
  /** One code per row indexing `categories`; -1 means missing. */
  readonly codes: Int32Array;
  /** The dictionary, in a stable order (sorted by string value when built from data). */
  readonly categories: readonly string[];
}

export type Column = NumericColumn | CategoricalColumn;

export interface ColumnSchema {
  readonly name: string;
  readonly kind: ColumnKind;
  /** Categorical dictionary (categorical columns only). */
  readonly categories?: readonly string[];
  readonly origin?: ColumnOrigin;
}

export interface Schema {
  readonly columns: readonly ColumnSchema[];
  /** Stable hash of names, kinds and dictionaries (see `schemaFingerprint`). */
  readonly fingerprint: string;
}

export interface Frame {
  readonly nRows: number;
  readonly columns: readonly Column[];
  readonly schema: Schema;
}

/** Class labels or numbers to learn. */
export type Target =
  | { readonly kind: 'class'; readonly name: string; readonly codes: Int32Array; readonly classes: readonly string[] }
  | { readonly kind: 'number'; readonly name: string; readonly values: Float64Array };

/** Features, target and optional sample weights: what a learner is fitted on. */
export interface Dataset {
  readonly features: Frame;
  readonly target: Target;
  /** Non-negative sample weights, or null for all ones. */
  readonly weights: Float64Array | null;
}

/**
 * True for a categorical column (codes into a dictionary), narrowing its type.
 * @example
 * frame.columns.filter(isCategorical).map((c) => c.categories.length);
 */
export function isCategorical(c: Column): c is CategoricalColumn {
  return c.kind === 'categorical';
}

/**
 * True for a column held as numbers (numeric, or boolean as 0/1), narrowing its type.
 * @example
 * frame.columns.filter(isNumeric).map((c) => c.values.length);
 */
export function isNumeric(c: Column): c is NumericColumn {
  return c.kind !== 'categorical';
}
