/**
 * How the grower gets histograms built: in this thread by the kernels, or split by feature across
 * worker threads (src/learn/parallel/). Either way the result in memory is the same, bit for bit: each
 * feature's block is summed by one thread, in row order.
 */
import type { KernelSet } from '../../kernels/kernel-set.js';
import { binnedFrameFor } from '../../table/bin-cache.js';
import type { BinnedFrame } from '../../table/bin-frame.js';
import type { Frame } from '../../table/frame.js';

/** Arguments of one histogram build (pointers into the arena; see src/kernels/layout.ts). */
export interface HistJob {
  readonly codesPtr: number;
  readonly nRows: number;
  readonly rowsPtr: number;
  readonly count: number;
  readonly gwPtr: number;
  /** gs (value) or gc (class) pointer. */
  readonly gxPtr: number;
  /** 0 for a value histogram, else the number of classes. */
  readonly nClasses: number;
  readonly featsPtr: number;
  readonly nFeats: number;
  readonly histPtr: number;
}

export interface HistBuilder {
  build(job: HistJob): void;
  /**
   * Stable partition of a node's rows (the `partitionRows` kernel's contract: left rows first, both sides in
   * their original order); returns the left count. Absent: the caller runs the kernel itself.
   */
  partition?(colPtr: number, rowsPtr: number, count: number, lutPtr: number, scratchPtr: number): number;
}

/**
 * Build histograms in this thread.
 * @example
 * const builder = inThreadBuilder(engine().kernels);
 */
export function inThreadBuilder(k: KernelSet): HistBuilder {
  return {
    build(j: HistJob): void {
      if (j.nClasses === 0) k.histValue(j.codesPtr, j.nRows, j.rowsPtr, j.count, j.gwPtr, j.gxPtr, j.featsPtr, j.nFeats, j.histPtr);
      else k.histClass(j.codesPtr, j.nRows, j.rowsPtr, j.count, j.gwPtr, j.gxPtr, j.nClasses, j.featsPtr, j.nFeats, j.histPtr);
    },
  };
}

let current: ((k: KernelSet) => HistBuilder) | null = null;

/** Install a builder factory (the parallel module does this); null restores in-thread building. */
export function setHistBuilderFactory(factory: ((k: KernelSet) => HistBuilder) | null): void {
  current = factory;
}

/** The builder to use now. */
export function histBuilder(k: KernelSet): HistBuilder {
  return current ? current(k) : inThreadBuilder(k);
}

/** How the grower gets the binned form of a frame (the parallel module may install a multi-threaded binner). */
let binner: ((frame: Frame) => BinnedFrame) | null = null;

/** Install a frame binner; null restores `binnedFrameFor` (in-thread, cached). */
export function setFrameBinner(fn: ((frame: Frame) => BinnedFrame) | null): void {
  binner = fn;
}

/** The binned form of `frame` for the grower (cached either way). */
export function binnedForGrowth(frame: Frame): BinnedFrame {
  return binner ? binner(frame) : binnedFrameFor(frame);
}
