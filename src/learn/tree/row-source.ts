/**
 * Feature access for routing rows through trees, checked against the features a model was fitted on.
 */
import { errors } from '../../errors.js';
import type { ColumnSchema, Frame } from '../../table/frame.js';
import type { RowSource } from '../flat-tree.js';

/**
 * Accessors for every column of `frame`, without checks (tree `feature` indices = column indices).
 * @example
 * const leaf = leafOf(tree, rowSourceOf(frame), 0);
 */
export function rowSourceOf(frame: Frame): RowSource {
  return {
    numeric: frame.columns.map((c) => (c.kind === 'categorical' ? null : c.values)),
    codes: frame.columns.map((c) => (c.kind === 'categorical' ? c.codes : null)),
  };
}

/**
 * Accessors for `frame` after checking it matches `features`: same number of columns, same names in
 * the same order, same kinds, and each categorical dictionary starting with the model's dictionary
 * (categories appended after it were never seen in training: their codes are read as missing, so
 * rows with them follow each split's missing-value child).
 * @example
 * const src = rowSourceFor(model.features, frame);
 */
export function rowSourceFor(features: readonly ColumnSchema[], frame: Frame): RowSource {
  const cols = frame.columns;
  if (cols.length !== features.length) {
    throw errors.schemaMismatch(`the model has ${features.length} feature columns, the table ${cols.length}`);
  }
  const codes: (Int32Array | null)[] = [];
  const numeric: (Float64Array | null)[] = [];
  for (let f = 0; f < features.length; f++) {
    const want = features[f], col = cols[f];
    if (col.name !== want.name) throw errors.schemaMismatch(`column ${f + 1} is ${JSON.stringify(col.name)}, the model expects ${JSON.stringify(want.name)}`);
    const wantCat = want.kind === 'categorical', isCat = col.kind === 'categorical';
    if (wantCat !== isCat) throw errors.schemaMismatch(`column ${JSON.stringify(col.name)} is ${col.kind}, the model expects ${want.kind}`);
    if (col.kind === 'categorical') {
      const known = want.categories ?? [];
      for (let k = 0; k < known.length; k++) {
        if (col.categories[k] !== known[k]) {
          throw errors.schemaMismatch(`column ${JSON.stringify(col.name)} has a different category dictionary (align the table to the model first)`);
        }
      }
      let c = col.codes;
      if (col.categories.length > known.length) {
        c = c.map((v) => (v >= known.length ? -1 : v));
      }
      codes.push(c); numeric.push(null);
    } else {
      numeric.push(col.values); codes.push(null);
    }
  }
  return { numeric, codes };
}
