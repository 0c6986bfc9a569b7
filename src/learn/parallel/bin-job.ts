/**
 * Binning a frame's columns on worker threads: one job per column (`binColumn`, src/table/bin-frame.ts)
 * writing into one shared code buffer. The result is the same as `binFrame` — each column's bins depend
 * only on that column — and is stored in the bin cache for the frame.
 */
import { cachedBinnedFrame, rememberBinnedFrame } from '../../table/bin-cache.js';
import { binColumn, resolveBinOptions, type BinnedFeature, type BinnedFrame, type ResolvedBinOptions } from '../../table/bin-frame.js';
import type { Column, Frame } from '../../table/frame.js';
import { toShared } from './share.js';
import { runTreeJobs } from './tree-jobs.js';

export interface BinJobInput {
  readonly columns: readonly Column[];
  readonly nRows: number;
  readonly codes: Uint8Array;
  readonly opts: ResolvedBinOptions;
}

/** Bin column t into its slice of the shared codes. */
export function binColumnJob(input: BinJobInput, t: number): BinnedFeature {
  const n = input.nRows;
  return binColumn(input.columns[t], input.opts, input.codes.subarray(t * n, (t + 1) * n));
}

/**
 * The binned form of `frame` (default bin options), computed with `threads` threads when not cached.
 * @example
 * const binned = binFrameParallel(frame, 2);
 */
export function binFrameParallel(frame: Frame, threads: number): BinnedFrame {
  const hit = cachedBinnedFrame(frame);
  if (hit) return hit;
  const n = frame.nRows, p = frame.columns.length;
  const codes = new Uint8Array(new SharedArrayBuffer(Math.max(1, n * p))).subarray(0, n * p);
  const input: BinJobInput = { columns: toShared(frame.columns), nRows: n, codes, opts: resolveBinOptions() };
  const features = runTreeJobs(p, { run: binColumnJob, module: import.meta.url, name: 'binColumnJob', input }, threads);
  const binned: BinnedFrame = { nRows: n, features, codes };
  rememberBinnedFrame(frame, binned);
  return binned;
}
