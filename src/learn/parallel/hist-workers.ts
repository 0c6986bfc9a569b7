/**
 * Histogram building split by feature across worker threads (for boosting, where trees are sequential
 * but each histogram covers many rows × features). Helper threads map the kernel arena's shared memory
 * and wait on a control block; the calling thread writes a job, wakes them, builds its own share of the
 * features, and waits (Atomics) until every helper is done. Each feature's block is summed by exactly
 * one thread in row order, so histograms are bit-for-bit those of in-thread building. Large row partitions
 * are split in two halves as well (the first helper takes the second half) and reassembled in stable
 * order, so the rows end exactly as after an in-thread partition. Frames not yet
 * binned are binned column by column on the same number of threads (bin-job.ts).
 */
import { Worker } from 'node:worker_threads';
import { engine } from '../../kernels/engine.js';
import type { KernelSet } from '../../kernels/kernel-set.js';
import { wasmModule } from '../../kernels/wasm-kernels.js';
import { errors } from '../../errors.js';
import { inThreadBuilder, setFrameBinner, setHistBuilderFactory, type HistBuilder, type HistJob } from '../hist/hist-build.js';
import { binFrameParallel } from './bin-job.js';
import { C, CONTROL_SLOTS, JOB_HIST, JOB_PARTITION } from './hist-control.js';
import { workerScriptUrl } from './package-root.js';

interface Helper {
  readonly worker: Worker;
  readonly control: Int32Array;
}

let helpers: Helper[] = [];

/** Below this many row × feature updates a build stays in the calling thread. */
const MIN_SPLIT_WORK = 200_000;
/** How long to wait for a helper (it may still be starting on a busy machine). */
const HELPER_TIMEOUT_MS = 60_000;

/** Below this many rows a partition stays in the calling thread. */
const MIN_SPLIT_ROWS = 20_000;

/** Wait until helper `h` has finished its latest job. */
function waitFor(h: Helper, deadline: number): void {
  const want = Atomics.load(h.control, C.seq);
  while (Atomics.load(h.control, C.done) !== want) {
    if (Date.now() > deadline) { stopHelpers(); setHistBuilderFactory(null); throw errors.workerFailed('histogram', 'a helper thread did not answer'); }
    Atomics.wait(h.control, C.done, Atomics.load(h.control, C.done), 100);
  }
}

/**
 * Stable partition with the first helper: this thread partitions the first half of the segment, the helper
 * the second (each with its own half of the scratch area), then the halves' sides are put in order —
 * [left1 right1 left2 right2] becomes [left1 left2 right1 right2] — so the rows end exactly as after one
 * in-thread partition.
 */
function partitionSplit(k: KernelSet, colPtr: number, rowsPtr: number, count: number, lutPtr: number, scratchPtr: number): number {
  if (helpers.length === 0 || count < MIN_SPLIT_ROWS) return k.partitionRows(colPtr, rowsPtr, count, lutPtr, scratchPtr);
  const h = helpers[0], c = h.control, half = count >> 1;
  c[C.kind] = JOB_PARTITION; c[C.codes] = colPtr; c[C.rows] = rowsPtr + half * 4; c[C.count] = count - half;
  c[C.lut] = lutPtr; c[C.hist] = scratchPtr + half * 4;
  Atomics.add(c, C.seq, 1);
  Atomics.notify(c, C.seq);
  const nl1 = k.partitionRows(colPtr, rowsPtr, half, lutPtr, scratchPtr);
  waitFor(h, Date.now() + HELPER_TIMEOUT_MS);
  const nl2 = c[C.result];
  const i32 = engine().arena.i32(rowsPtr, count), scratch = engine().arena.i32(scratchPtr, nl2);
  scratch.set(i32.subarray(half, half + nl2));
  i32.copyWithin(nl1 + nl2, nl1, half);
  i32.set(scratch, nl1);
  return nl1 + nl2;
}

function builder(k: KernelSet): HistBuilder {
  const local = inThreadBuilder(k);
  return {
    partition: (colPtr, rowsPtr, count, lutPtr, scratchPtr) => partitionSplit(k, colPtr, rowsPtr, count, lutPtr, scratchPtr),
    build(j: HistJob): void {
      const parts = helpers.length + 1;
      if (parts === 1 || j.count * j.nFeats < MIN_SPLIT_WORK || j.nFeats < 2) { local.build(j); return; }
      const per = Math.ceil(j.nFeats / parts);
      const busy: Helper[] = [];
      helpers.forEach((h, i) => {
        const from = (i + 1) * per, len = Math.min(per, j.nFeats - from);
        if (len <= 0) return;
        const c = h.control;
        c[C.codes] = j.codesPtr; c[C.nRows] = j.nRows; c[C.rows] = j.rowsPtr; c[C.count] = j.count;
        c[C.gw] = j.gwPtr; c[C.gx] = j.gxPtr; c[C.nClasses] = j.nClasses;
        c[C.feats] = j.featsPtr + from * 4; c[C.nFeats] = len; c[C.hist] = j.histPtr; c[C.kind] = JOB_HIST;
        Atomics.add(c, C.seq, 1);
        Atomics.notify(c, C.seq);
        busy.push(h);
      });
      local.build({ ...j, nFeats: Math.min(per, j.nFeats) });
      const deadline = Date.now() + HELPER_TIMEOUT_MS;
      for (const h of busy) waitFor(h, deadline);
    },
  };
}

/**
 * Build histograms with `threads` threads in total (the calling thread included) from now on; 1 stops
 * the helpers. Needs the kernel arena in shared memory and the worker built into dist/; otherwise
 * building stays in-thread. Returns the number of threads in use.
 * __Default:__ histogram building is in-thread until this is called.
 * @example
 * useHistogramWorkers(2); // boosting builds each histogram on two threads
 */
export function useHistogramWorkers(threads: number): number {
  if (!(Number.isInteger(threads) && threads >= 1)) throw errors.badOption('threads', threads, 'an integer >= 1');
  // already running with this many threads: keep the helpers (start-up is paid once per process)
  if (threads > 1 && helpers.length === threads - 1) return threads;
  stopHelpers();
  const eng = engine();
  const script = workerScriptUrl('hist-worker.js');
  if (threads === 1 || !script || !eng.arena.shared) { setHistBuilderFactory(null); setFrameBinner(null); return 1; }
  const module = eng.kernels.name === 'wasm' ? wasmModule() : null;
  for (let i = 1; i < threads; i++) {
    const control = new Int32Array(new SharedArrayBuffer(CONTROL_SLOTS * 4));
    const worker = new Worker(script, { workerData: { memory: eng.arena.memory, module, control, useWasm: module !== null } });
    worker.unref();
    helpers.push({ worker, control });
  }
  setHistBuilderFactory(builder);
  setFrameBinner((frame) => binFrameParallel(frame, threads));
  return threads;
}

function stopHelpers(): void {
  for (const h of helpers) {
    h.control[C.stop] = 1;
    Atomics.add(h.control, C.seq, 1);
    Atomics.notify(h.control, C.seq);
  }
  helpers = [];
}
