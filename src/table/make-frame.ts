/**
 * Assemble a Frame from columns: the schema and its fingerprint are derived, names must be unique.
 */
import { errors } from '../errors.js';
import type { Column, ColumnSchema, Frame } from './frame.js';
import { schemaFingerprint } from './fingerprint.js';

/**
 * The schema entry describing a column (name, kind, dictionary, origin).
 *
 * @example columnSchemaOf({ name: 'c', kind: 'categorical', codes: Int32Array.of(0), categories: ['a'] }) // { name: 'c', kind: 'categorical', categories: ['a'] }
 */
export function columnSchemaOf(c: Column): ColumnSchema {
  if (c.kind === 'categorical') return { name: c.name, kind: c.kind, categories: c.categories };
  return c.origin ? { name: c.name, kind: c.kind, origin: c.origin } : { name: c.name, kind: c.kind };
}

/**
 * A Frame over `columns` with `nRows` rows. A repeated name is an error (a date part named like an
 * existing column is reported as a clash with its date column).
 *
 * @example makeFrame(1, [{ name: 'x', kind: 'numeric', values: new Float64Array([2]) }]).schema.columns
 */
export function makeFrame(nRows: number, columns: readonly Column[]): Frame {
  const seen = new Set<string>();
  for (const c of columns) {
    const len = c.kind === 'categorical' ? c.codes.length : c.values.length;
    if (len !== nRows) throw errors.badOption(`column ${c.name}`, len, `${nRows} values`);
    if (seen.has(c.name)) {
      const dated = columns.find((d) => d.kind !== 'categorical' && d.name === c.name && d.origin);
      if (dated && dated.kind !== 'categorical' && dated.origin) throw errors.columnClash(c.name, dated.origin.source);
      throw errors.badOption('columns', c.name, 'unique column names');
    }
    seen.add(c.name);
  }
  const schemaColumns = columns.map(columnSchemaOf);
  return { nRows, columns, schema: { columns: schemaColumns, fingerprint: schemaFingerprint(schemaColumns) } };
}
