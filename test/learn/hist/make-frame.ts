/** Tiny frames for tests: numeric arrays (null = missing) and categorical string arrays (null = missing). */
import type { Column, Frame } from '../../../src/table/frame.js';
import { schemaFingerprint } from '../../../src/table/fingerprint.js';

export type ColumnSpec = readonly (number | null)[] | { readonly cat: readonly (string | null)[]; readonly categories?: readonly string[] };

export function makeFrame(cols: Record<string, ColumnSpec>): Frame {
  const columns: Column[] = Object.entries(cols).map(([name, spec]) => {
    if ('cat' in spec) {
      const categories = spec.categories ?? [...new Set(spec.cat.filter((v): v is string => v !== null))].sort();
      const codes = Int32Array.from(spec.cat, (v) => (v === null ? -1 : categories.indexOf(v)));
      return { name, kind: 'categorical', codes, categories };
    }
    return { name, kind: 'numeric', values: Float64Array.from(spec as (number | null)[], (v) => (v === null ? NaN : v)) };
  });
  const schemaCols = columns.map((c) => (c.kind === 'categorical' ? { name: c.name, kind: c.kind, categories: c.categories } : { name: c.name, kind: c.kind }));
  const nRows = columns.length ? (columns[0].kind === 'categorical' ? columns[0].codes.length : columns[0].values.length) : 0;
  return { nRows, columns, schema: { columns: schemaCols, fingerprint: schemaFingerprint(schemaCols) } };
}
