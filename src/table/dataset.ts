/**
 * Row subsets of frames and datasets (pure typed-array copies, no arquero).
 */
import type { Column, Dataset, Frame, Target } from './frame.js';

/**
 * A new frame holding rows `rows` (indices may repeat) of `frame`, with the same schema.
 * @example
 * const firstTwo = takeRows(frame, [0, 1]); // firstTwo.nRows === 2
 */
export function takeRows(frame: Frame, rows: ArrayLike<number>): Frame {
  const n = rows.length;
  const columns: Column[] = frame.columns.map((c) => {
    if (c.kind === 'categorical') {
      const codes = new Int32Array(n);
      for (let i = 0; i < n; i++) codes[i] = c.codes[rows[i]];
      return { ...c, codes };
    }
    const values = new Float64Array(n);
    for (let i = 0; i < n; i++) values[i] = c.values[rows[i]];
    return { ...c, values };
  });
  return { nRows: n, columns, schema: frame.schema };
}

function takeTarget(t: Target, rows: ArrayLike<number>): Target {
  const n = rows.length;
  if (t.kind === 'class') {
    const codes = new Int32Array(n);
    for (let i = 0; i < n; i++) codes[i] = t.codes[rows[i]];
    return { ...t, codes };
  }
  const values = new Float64Array(n);
  for (let i = 0; i < n; i++) values[i] = t.values[rows[i]];
  return { ...t, values };
}

/**
 * A new dataset holding rows `rows` of `data` (features, target and weights).
 * @example
 * const [fold] = splitHoldout(data, { seed: 1 });
 * const train = takeDataset(data, fold.train);
 */
export function takeDataset(data: Dataset, rows: ArrayLike<number>): Dataset {
  let weights: Float64Array | null = null;
  if (data.weights) {
    weights = new Float64Array(rows.length);
    for (let i = 0; i < rows.length; i++) weights[i] = data.weights[rows[i]];
  }
  return { features: takeRows(data.features, rows), target: takeTarget(data.target, rows), weights };
}

/** Number of rows in a dataset. */
export function rowCount(data: Dataset): number {
  return data.features.nRows;
}
