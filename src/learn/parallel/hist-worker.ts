/**
 * Worker thread body for histogram building by feature: maps the main thread's shared kernel memory,
 * then waits on its control block for jobs (see hist-workers.ts for the block layout).
 */
import { workerData } from 'node:worker_threads';
import { Arena } from '../../kernels/arena.js';
import { tsKernels } from '../../kernels/ts-kernels.js';
import type { WasmMemory, WasmModule } from '../../kernels/wasm-api.js';
import { wasmKernels } from '../../kernels/wasm-kernels.js';
import { C, JOB_PARTITION } from './hist-control.js';

const { memory, module, control, useWasm } = workerData as { memory: WasmMemory; module: WasmModule | null; control: Int32Array; useWasm: boolean };
const arena = new Arena(memory);
const k = (useWasm ? wasmKernels(arena, module) : null) ?? tsKernels(arena);
let seen = 0;
for (;;) {
  Atomics.wait(control, C.seq, seen);
  seen = Atomics.load(control, C.seq);
  if (control[C.stop]) break;
  const c = (i: number): number => control[i];
  if (c(C.kind) === JOB_PARTITION) control[C.result] = k.partitionRows(c(C.codes), c(C.rows), c(C.count), c(C.lut), c(C.hist));
  else if (c(C.nClasses) === 0) k.histValue(c(C.codes), c(C.nRows), c(C.rows), c(C.count), c(C.gw), c(C.gx), c(C.feats), c(C.nFeats), c(C.hist));
  else k.histClass(c(C.codes), c(C.nRows), c(C.rows), c(C.count), c(C.gw), c(C.gx), c(C.nClasses), c(C.feats), c(C.nFeats), c(C.hist));
  Atomics.store(control, C.done, seen);
  Atomics.notify(control, C.done);
}
