/**
 * Fingerprints: a schema fingerprint changes when a column's name, kind or dictionary changes; a data
 * fingerprint changes when any value changes. Both are FNV-1a 64-bit hex strings (see util/hash.ts).
 */
import { Fnv64 } from '../util/hash.js';
import type { ColumnSchema, Dataset, Frame } from './frame.js';

/**
 * Fingerprint of column names, kinds, dictionaries and date origins, in order.
 * @example
 * schemaFingerprint(frame.schema.columns) === frame.schema.fingerprint; // true
 */
export function schemaFingerprint(columns: readonly ColumnSchema[]): string {
  const h = new Fnv64();
  for (const c of columns) {
    h.string(c.name).string(c.kind);
    if (c.categories) { h.string(String(c.categories.length)); for (const k of c.categories) h.string(k); }
    if (c.origin) h.string(`${c.origin.source}:${c.origin.part}`);
  }
  return h.hex();
}

/**
 * Fingerprint of a frame's schema and every value.
 * @example
 * frameFingerprint(frame) === frameFingerprint(takeRows(frame, [...Array(frame.nRows).keys()])); // true
 */
export function frameFingerprint(frame: Frame): string {
  const h = new Fnv64().string(frame.schema.fingerprint).string(String(frame.nRows));
  for (const c of frame.columns) {
    if (c.kind === 'categorical') h.typed(c.codes);
    else h.typed(c.values);
  }
  return h.hex();
}

/**
 * Fingerprint of a dataset: features, target and weights.
 * @example
 * model.fingerprint.data === dataFingerprint(train); // true for a model fitted on `train`
 */
export function dataFingerprint(data: Dataset): string {
  const h = new Fnv64().string(frameFingerprint(data.features)).string(data.target.name);
  if (data.target.kind === 'class') { for (const k of data.target.classes) h.string(k); h.typed(data.target.codes); }
  else h.typed(data.target.values);
  if (data.weights) h.typed(data.weights);
  return h.hex();
}
