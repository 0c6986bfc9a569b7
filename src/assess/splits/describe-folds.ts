/** One row of the split report: which rows a stage of a fold sees and what it may use them for. */
export interface FoldStageRow {
  readonly fold: number;
  /** Inner fold number (nested splits), else 0. */
  readonly inner: number;
  readonly stage: 'train' | 'watch' | 'test';
  /** What the stage's rows may be used for. */
  readonly use: string;
  readonly rows: number;
  /** Share of all rows. */
  readonly share: number;
  /** Row indices as compact ranges ("0-9, 20-29"), cut after 60 characters. */
  readonly ranges: string;
  /** Rows shared with this fold's test rows (0 unless the split leaks; always 0 for the test stage itself). */
  readonly sharedWithTest: number;
}

const USE = {
  train: 'fit the model',
  watch: 'held out inside training: pruning, early stopping, choosing settings',
  test: 'final score only',
} as const;

/**
 * A tidy report of a split: one row per fold and stage (train, watch when nested, test) with the row
 * count, share, compact row ranges and any overlap with the fold's test rows — so a reader sees at a
 * glance that no setting was tuned on test rows.
 *
 * @param folds - folds from any splitter.
 * @param nRows - number of rows of the data.
 * @example
 * describeFolds(splitNested(100, { outer: { method: 'folds', k: 2 } }), 100);
 * // [{ fold: 0, inner: 0, stage: 'train', rows: 37, ... }, { ..., stage: 'watch', rows: 13 }, { ..., stage: 'test', rows: 50 }, ...]
 */
export function describeFolds(folds: readonly { fold: number; inner?: number; train: Int32Array; test: Int32Array; watch?: Int32Array }[], nRows: number): FoldStageRow[] {
  const out: FoldStageRow[] = [];
  const mark = new Uint8Array(nRows);
  for (const f of folds) {
    mark.fill(0);
    for (const r of f.test) mark[r] = 1;
    const stages: ['train' | 'watch' | 'test', Int32Array][] = [['train', f.train]];
    if (f.watch) stages.push(['watch', f.watch]);
    stages.push(['test', f.test]);
    for (const [stage, rows] of stages) {
      let shared = 0;
      if (stage !== 'test') for (const r of rows) shared += mark[r];
      out.push({
        fold: f.fold, inner: f.inner ?? 0, stage, use: USE[stage], rows: rows.length,
        share: nRows > 0 ? rows.length / nRows : 0, ranges: compactRanges(rows), sharedWithTest: shared,
      });
    }
  }
  return out;
}

/**
 * Row indices as compact ranges, cut after 60 characters.
 * @example
 * compactRanges(Int32Array.of(0, 1, 2, 3, 4, 7, 9, 10)); // "0-4, 7, 9-10"
 */
export function compactRanges(rows: Int32Array): string {
  const sorted = Int32Array.from(rows).sort();
  const parts: string[] = [];
  let length = 0;
  for (let i = 0; i < sorted.length; ) {
    let j = i;
    while (j + 1 < sorted.length && sorted[j + 1] === sorted[j] + 1) j++;
    const part = j > i ? `${sorted[i]}-${sorted[j]}` : `${sorted[i]}`;
    if (length + part.length > 60) { parts.push('...'); break; }
    parts.push(part);
    length += part.length + 2;
    i = j + 1;
  }
  return parts.join(', ');
}
