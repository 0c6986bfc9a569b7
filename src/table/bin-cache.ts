/**
 * One BinnedFrame per frame and bin options, shared by every model fitted on the same data: looked up by
 * frame identity first, then (when the caller knows it) by data fingerprint, so a frame rebuilt from the
 * same extract reuses the bins. Entries live as long as their frame (WeakMap) or, by fingerprint, as long
 * as some model still holds the binned frame (WeakRef).
 */
import { errors } from '../errors.js';
import { binFrame, resolveBinOptions, type BinnedFrame, type BinOptions } from './bin-frame.js';
import type { Frame } from './frame.js';

const byFrame = new WeakMap<Frame, Map<string, BinnedFrame>>();
const byFingerprint = new Map<string, WeakRef<BinnedFrame>>();

function optionsKey(options: BinOptions): string {
  const o = resolveBinOptions(options);
  return `${o.binLimit}/${o.exactRows}/${o.sketchK}`;
}

/** Options of `binnedFrameFor`: bin options plus an optional data fingerprint. */
export interface BinCacheOptions extends BinOptions {
  /** Fingerprint of the frame's values (e.g. `frameFingerprint(frame)`), to share bins across equal frames. __Default:__ none. */
  readonly fingerprint?: string;
}

/**
 * The binned form of `frame`, computed once and cached.
 * @example
 * const a = binnedFrameFor(frame);
 * const b = binnedFrameFor(frame); // a === b
 */
export function binnedFrameFor(frame: Frame, options: BinCacheOptions = {}): BinnedFrame {
  const key = optionsKey(options);
  let perFrame = byFrame.get(frame);
  const hit = perFrame?.get(key);
  if (hit) return hit;
  const fpKey = options.fingerprint ? `${options.fingerprint}/${key}` : null;
  let binned = fpKey ? byFingerprint.get(fpKey)?.deref() : undefined;
  if (!binned || binned.nRows !== frame.nRows) binned = binFrame(frame, options);
  if (!perFrame) byFrame.set(frame, (perFrame = new Map()));
  perFrame.set(key, binned);
  if (fpKey) byFingerprint.set(fpKey, new WeakRef(binned));
  return binned;
}

/**
 * The cached binned form of `frame` for these options, or null (never computes).
 * @example
 * cachedBinnedFrame(frame) ?? binFrame(frame);
 */
export function cachedBinnedFrame(frame: Frame, options: BinOptions = {}): BinnedFrame | null {
  return byFrame.get(frame)?.get(optionsKey(options)) ?? null;
}

/**
 * Store a binned frame built elsewhere (e.g. on worker threads) as the binned form of `frame`.
 * @example
 * rememberBinnedFrame(frame, binFrame(frame));
 */
export function rememberBinnedFrame(frame: Frame, binned: BinnedFrame, options: BinOptions = {}): void {
  if (binned.nRows !== frame.nRows || binned.features.length !== frame.columns.length) {
    throw errors.binnedMismatch(`${binned.nRows} rows × ${binned.features.length} features for ${frame.nRows} × ${frame.columns.length}`);
  }
  const key = optionsKey(options);
  let perFrame = byFrame.get(frame);
  if (!perFrame) byFrame.set(frame, (perFrame = new Map()));
  perFrame.set(key, binned);
}
