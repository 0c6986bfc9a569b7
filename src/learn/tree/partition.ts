/**
 * Stable partition of a node's range `[start, end)` into child ranges, in `base` and in every presorted
 * feature array at once, by the child slot stored in `ctx.slot[row]`. Stability keeps each child's
 * range sorted by value (missing values still last), so no feature is ever sorted twice.
 */
import type { GrowContext } from './grow-context.js';

/** Partition and return the child boundaries: child j owns `[bounds[j], bounds[j + 1])`. */
export function partitionRange(ctx: GrowContext, start: number, end: number, nSlots: number): Int32Array {
  const counts = new Int32Array(nSlots + 1);
  for (let i = start; i < end; i++) counts[ctx.slot[ctx.base[i]] + 1]++;
  const bounds = new Int32Array(nSlots + 1);
  bounds[0] = start;
  for (let j = 0; j < nSlots; j++) bounds[j + 1] = bounds[j] + counts[j + 1];
  const cursor = new Int32Array(nSlots);
  const scratch = ctx.scratch;
  const apply = (arr: Int32Array): void => {
    for (let j = 0; j < nSlots; j++) cursor[j] = bounds[j] - start;
    for (let i = start; i < end; i++) {
      const r = arr[i];
      scratch[cursor[ctx.slot[r]]++] = r;
    }
    arr.set(scratch.subarray(0, end - start), start);
  };
  apply(ctx.base);
  for (const s of ctx.sorted) if (s !== null) apply(s);
  return bounds;
}
