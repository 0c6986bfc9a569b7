/** Slots of a histogram worker's control block (Int32Array over shared memory; pointers are byte offsets). */
export const C = {
  seq: 0, done: 1, stop: 2, codes: 3, nRows: 4, rows: 5, count: 6, gw: 7, gx: 8, nClasses: 9, feats: 10, nFeats: 11, hist: 12,
} as const;
export const CONTROL_SLOTS = 16;
