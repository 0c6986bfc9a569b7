/**
 * A new table re-read with a trained model's feature schema, for scoring: never throws for a changed
 * extract; a report says what was done and how many rows each change touches.
 */
import { errors } from '../errors.js';
import type { Column, ColumnKind, ColumnSchema, Frame } from './frame.js';
import { alignColumn } from './align-column.js';
import { schemaFingerprint } from './fingerprint.js';
import { rawTable, type TableInput } from './raw-table.js';

/** What `alignFrame` did to fit a table to a model's features. Row counts are rows affected. */
export interface AlignReport {
  readonly nRows: number;
  /** True when nothing below happened (extra columns aside). */
  readonly clean: boolean;
  /** Features absent from the table: all missing. */
  readonly missingColumns: readonly { readonly column: string; readonly rows: number }[];
  /** Features whose values are now of another type: treated as missing. */
  readonly typeChanges: readonly { readonly column: string; readonly expected: ColumnKind; readonly found: string; readonly rows: number }[];
  /** Categories the model never saw: coded as missing (-1). */
  readonly unseen: readonly { readonly column: string; readonly rows: number; readonly distinct: number; readonly examples: readonly string[] }[];
  /** Values the feature's kind cannot take (±Infinity, a boolean other than 0/1, an object): missing. */
  readonly invalid: readonly { readonly column: string; readonly rows: number; readonly examples: readonly string[] }[];
  /** Table columns the model does not use (ignored). */
  readonly extraColumns: readonly string[];
}

/**
 * Re-read `input` (arquero table, row objects or Frame) with the model's feature schema `features`, for
 * scoring. The frame has exactly the model's columns, in order, with the model's dictionaries (so its
 * schema fingerprint equals the model's). Categories never seen in training become -1; an absent column
 * becomes all missing; a column whose type changed (e.g. texts where the model had numbers) is treated
 * as missing; a date part is recomputed from its date column; extra columns are ignored. Each is listed
 * in the report with the rows it affects. Only a malformed `input` or `features` throws.
 *
 * @example
 * const { frame, report } = alignFrame(refreshed, model.header.features);
 * report.unseen // [{ column: 'region', rows: 3, distinct: 1, examples: ['west'] }]
 */
export function alignFrame(input: TableInput, features: readonly ColumnSchema[]): { frame: Frame; report: AlignReport } {
  if (!Array.isArray(features)) throw errors.badOption('features', features, 'an array of column schemas');
  const raw = rawTable(input);
  const present = new Set(raw.names);
  const used = new Set<string>();
  const columns: Column[] = [];
  const missingColumns: { column: string; rows: number }[] = [];
  const typeChanges: { column: string; expected: ColumnKind; found: string; rows: number }[] = [];
  const unseen: { column: string; rows: number; distinct: number; examples: readonly string[] }[] = [];
  const invalid: { column: string; rows: number; examples: readonly string[] }[] = [];

  for (const f of features) {
    let values: ArrayLike<unknown> | null = null;
    let fromSource = false;
    if (present.has(f.name)) { values = raw.values(f.name); used.add(f.name); }
    else if (f.origin && present.has(f.origin.source)) { values = raw.values(f.origin.source); fromSource = true; used.add(f.origin.source); }
    const [column, issue] = alignColumn(f, values, fromSource, raw.nRows);
    columns.push(column);
    switch (issue.type) {
      case 'missing': missingColumns.push({ column: f.name, rows: issue.rows }); break;
      case 'typeChanged': typeChanges.push({ column: f.name, expected: f.kind, found: issue.found, rows: issue.rows }); break;
      case 'unseen': unseen.push({ column: f.name, rows: issue.rows, distinct: issue.distinct, examples: issue.examples }); break;
      case 'invalid': invalid.push({ column: f.name, rows: issue.rows, examples: issue.examples }); break;
      case 'ok': break;
    }
  }
  const extraColumns = raw.names.filter((n) => !used.has(n));
  const clean = missingColumns.length + typeChanges.length + unseen.length + invalid.length === 0;
  const frame: Frame = { nRows: raw.nRows, columns, schema: { columns: features, fingerprint: schemaFingerprint(features) } };
  return { frame, report: { nRows: raw.nRows, clean, missingColumns, typeChanges, unseen, invalid, extraColumns } };
}
