/**
 * The memory one histogram-grower run works in (all inside the kernel arena; layout in
 * src/kernels/layout.ts): the binned codes (copied in once per binned frame and kept while the binned
 * frame lives), per-run row, weight and response arrays, gather buffers, and a pool of histogram slots.
 */
import type { Arena } from '../../kernels/arena.js';
import type { Engine } from '../../kernels/engine.js';
import { BINS, VALUE_STRIDE, classStride } from '../../kernels/layout.js';
import type { BinnedFrame } from '../../table/bin-frame.js';
import type { GrowTask } from '../grow-task.js';

const resident = new WeakMap<Arena, WeakMap<BinnedFrame, number>>();
const reclaim = new FinalizationRegistry<{ arena: Arena; ptr: number }>(({ arena, ptr }) => arena.release(ptr));

/** Offset of `binned.codes` inside `arena`, copying them in on first use. */
export function residentCodes(arena: Arena, binned: BinnedFrame): number {
  let perArena = resident.get(arena);
  if (!perArena) resident.set(arena, (perArena = new WeakMap()));
  let ptr = perArena.get(binned);
  if (ptr === undefined) {
    ptr = binned.codes.length ? arena.put(binned.codes) : arena.alloc(1);
    perArena.set(binned, ptr);
    reclaim.register(binned, { arena, ptr });
  }
  return ptr;
}

export interface HistWorkspace {
  readonly engine: Engine;
  readonly binned: BinnedFrame;
  readonly nRows: number;
  readonly nFeat: number;
  /** 0 for a value response, else the number of classes. */
  readonly nClasses: number;
  /** Doubles per histogram bin. */
  readonly stride: number;
  readonly codesPtr: number;
  readonly rowsPtr: number;
  readonly scratchPtr: number;
  readonly wPtr: number;
  /** y (value) or class codes (class). */
  readonly yPtr: number;
  readonly gwPtr: number;
  readonly gxPtr: number;
  readonly statsPtr: number;
  readonly allFeatsPtr: number;
  readonly featsPtr: number;
  readonly lutPtr: number;
  readonly scanPtr: number;
  takeSlot(): number;
  giveSlot(ptr: number): void;
  release(): void;
}

/** Allocate a workspace for `task` over `binned`, with rows `base` (positive weights, ascending). */
export function openWorkspace(engine: Engine, binned: BinnedFrame, task: GrowTask, base: Int32Array): HistWorkspace {
  const a = engine.arena;
  const n = task.frame.nRows, nFeat = binned.features.length, nPos = base.length;
  const r = task.response;
  const nClasses = r.kind === 'class' ? r.nClasses : 0;
  const stride = nClasses ? classStride(nClasses) : VALUE_STRIDE;
  const owned: number[] = [];
  const own = (p: number): number => { owned.push(p); return p; };
  const slots: number[] = [];
  const free: number[] = [];
  const slotBytes = Math.max(1, nFeat) * BINS * stride * 8;
  const ws: HistWorkspace = {
    engine, binned, nRows: n, nFeat, nClasses, stride,
    codesPtr: residentCodes(a, binned),
    rowsPtr: own(a.put(base)),
    scratchPtr: own(a.alloc(nPos * 4)),
    wPtr: own(a.put(task.weights)),
    yPtr: own(r.kind === 'class' ? a.put(r.codes) : a.put(r.values)),
    gwPtr: own(a.alloc(nPos * 8)),
    gxPtr: own(a.alloc(nPos * 8)),
    statsPtr: own(a.alloc(Math.max(3, nClasses) * 8)),
    allFeatsPtr: own(a.put(Int32Array.from({ length: nFeat }, (_, f) => f))),
    featsPtr: own(a.alloc(Math.max(1, nFeat) * 4)),
    lutPtr: own(a.alloc(BINS)),
    scanPtr: own(a.alloc(64)),
    takeSlot(): number {
      const p = free.pop();
      if (p !== undefined) return p;
      const q = a.alloc(slotBytes);
      slots.push(q);
      return q;
    },
    giveSlot(ptr: number): void {
      if (ptr >= 0) free.push(ptr);
    },
    release(): void {
      for (const p of slots) a.release(p);
      for (const p of owned.reverse()) a.release(p);
    },
  };
  return ws;
}
