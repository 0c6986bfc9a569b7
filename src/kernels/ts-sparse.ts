/** TypeScript twin of the small-node histogram kernel (assembly/kernels.ts `histValueSparse`). */
import { BINS, MISSING } from './layout.js';
import { viewsOf } from './views.js';

/**
 * Value histograms over a node's occupied bins only: the listed features' blocks must be all zero on entry;
 * adds [1, w, w·y] per row in row order (as histValueTs); writes feature k's non-empty, non-missing bins
 * ascending at binsPtr + k·count·4 and their number at lensPtr + k·4. markPtr: 32 zero bytes, left zero.
 */
export function histValueSparseTs(buf: ArrayBufferLike, codesPtr: number, nRows: number, rowsPtr: number, count: number,
  gwPtr: number, gsPtr: number, featsPtr: number, nFeats: number, histPtr: number, binsPtr: number, lensPtr: number, markPtr: number): void {
  const { f64, i32, u32, u8 } = viewsOf(buf);
  const rows = rowsPtr >> 2, gw = gwPtr >> 3, gs = gsPtr >> 3, mark = markPtr >> 2;
  for (let k = 0; k < nFeats; k++) {
    const f = i32[(featsPtr >> 2) + k];
    const col = codesPtr + f * nRows;
    const h = (histPtr >> 3) + f * BINS * 3;
    for (let i = 0; i < count; i++) {
      const b = u8[col + i32[rows + i]];
      u32[mark + (b >>> 5)] |= 1 << (b & 31);
      const p = h + b * 3;
      f64[p] = f64[p] + 1.0;
      f64[p + 1] = f64[p + 1] + f64[gw + i];
      f64[p + 2] = f64[p + 2] + f64[gs + i];
    }
    i32[(lensPtr >> 2) + k] = drainOccupiedBins(u32, i32, mark, (binsPtr >> 2) + k * count);
  }
}

/**
 * Write the bins marked in the 256-bit set at u32 index `mark` to the i32 list at index `out`, ascending,
 * leaving out the missing bin, and clear the set; returns the list's length.
 * @example
 * const len = drainOccupiedBins(u32, i32, mark, out); // i32[out .. out + len) = occupied bins
 */
export function drainOccupiedBins(u32: Uint32Array, i32: Int32Array, mark: number, out: number): number {
  let len = 0;
  for (let w = 0; w < BINS / 32; w++) {
    let x = u32[mark + w];
    if (w === MISSING >>> 5) x &= ~(1 << (MISSING & 31));
    while (x !== 0) {
      const low = x & -x;
      i32[out + len++] = (w << 5) + 31 - Math.clz32(low);
      x ^= low;
    }
    u32[mark + w] = 0;
  }
  return len;
}
