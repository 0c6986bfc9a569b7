/**
 * Histogram building split by feature across worker threads (for boosting, where trees are sequential
 * but each histogram covers many rows × features). Helper threads map the kernel arena's shared memory
 * and wait on a control block; the calling thread writes a job, wakes them, builds its own share of the
 * features, and waits (Atomics) until every helper is done. Each feature's block is summed by exactly
 * one thread in row order, so histograms are bit-for-bit those of in-thread building. Frames not yet
 * binned are binned column by column on the same number of threads (bin-job.ts).
 */
import { Worker } from 'node:worker_threads';
import { engine } from '../../kernels/engine.js';
import type { KernelSet } from '../../kernels/kernel-set.js';
import { wasmModule } from '../../kernels/wasm-kernels.js';
import { errors } from '../../errors.js';
import { inThreadBuilder, setFrameBinner, setHistBuilderFactory, type HistBuilder, type HistJob } from '../hist/hist-build.js';
import { binFrameParallel } from './bin-job.js';
import { C, CONTROL_SLOTS } from './hist-control.js';
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

function builder(k: KernelSet): HistBuilder {
  const local = inThreadBuilder(k);
  return {
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
        c[C.feats] = j.featsPtr + from * 4; c[C.nFeats] = len; c[C.hist] = j.histPtr;
        Atomics.add(c, C.seq, 1);
        Atomics.notify(c, C.seq);
        busy.push(h);
      });
      local.build({ ...j, nFeats: Math.min(per, j.nFeats) });
      const deadline = Date.now() + HELPER_TIMEOUT_MS;
      for (const h of busy) {
        const want = Atomics.load(h.control, C.seq);
        while (Atomics.load(h.control, C.done) !== want) {
          if (Date.now() > deadline) { stopHelpers(); setHistBuilderFactory(null); throw errors.workerFailed('histogram', 'a helper thread did not answer'); }
          Atomics.wait(h.control, C.done, Atomics.load(h.control, C.done), 100);
        }
      }
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
