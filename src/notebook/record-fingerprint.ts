/**
 * Fingerprint of an extract as read: the row count, then per column its name, kind and every value in row order
 * (numbers in their shortest round-trip decimal form, strings as UTF-8, dates as epoch milliseconds, missing as
 * a marker). FNV-1a 64 (see util/hash.ts): it detects change, it does not resist tampering.
 */
import type { ColumnTable } from 'arquero';
import { Fnv64 } from '../util/hash.js';

const SEP = '\u0001';
const MISSING = '\u0002';

/**
 * Fingerprint a table given its columns' profile kinds.
 * @example
 * extractFingerprint(aq.table({ a: [1, 2] }), [{ name: 'a', kind: 'numeric' }]); // 16 hex digits
 */
export function extractFingerprint(table: ColumnTable, columns: readonly { name: string; kind: string }[]): string {
  const h = new Fnv64().string(String(table.numRows()));
  for (const c of columns) {
    h.string(c.name).string(c.kind);
    const values = table.array(c.name) as ArrayLike<unknown>;
    const parts = new Array<string>(values.length);
    for (let i = 0; i < values.length; i++) {
      const v = values[i];
      if (v === null || v === undefined) parts[i] = MISSING;
      else if (v instanceof Date) parts[i] = `d${v.getTime()}`;
      else if (typeof v === 'string') parts[i] = `s${v}`;
      else parts[i] = `${typeof v === 'number' ? 'n' : 'o'}${String(v)}`;
    }
    h.string(parts.join(SEP));
  }
  return h.hex();
}
