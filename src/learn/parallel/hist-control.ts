/**
 * Slots of a histogram worker's control block (Int32Array over shared memory; pointers are byte offsets).
 * `kind` 0 = build histograms; 1 = partition rows: `codes` is the feature's column, `rows`/`count` the
 * segment, `lut` the partition table, `hist` the scratch area, and the left count comes back in `result`.
 */
export const C = {
  seq: 0, done: 1, stop: 2, codes: 3, nRows: 4, rows: 5, count: 6, gw: 7, gx: 8, nClasses: 9, feats: 10, nFeats: 11, hist: 12,
  kind: 13, lut: 14, result: 15,
} as const;
export const JOB_HIST = 0;
export const JOB_PARTITION = 1;
export const CONTROL_SLOTS = 16;
