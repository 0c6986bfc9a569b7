/** TypeScript twin of the row partition kernel (assembly/kernels.ts). */
import { viewsOf } from './views.js';

/** Stable partition of `count` rows by lut[bin] (1 = left); returns the left count. */
export function partitionRowsTs(buf: ArrayBufferLike, colPtr: number, rowsPtr: number, count: number, lutPtr: number, scratchPtr: number): number {
  const { i32, u8 } = viewsOf(buf);
  const rows = rowsPtr >> 2, scratch = scratchPtr >> 2;
  let nl = 0, nr = 0;
  for (let i = 0; i < count; i++) {
    const r = i32[rows + i];
    if (u8[lutPtr + u8[colPtr + r]]) i32[rows + nl++] = r;
    else i32[scratch + nr++] = r;
  }
  i32.copyWithin(rows + nl, scratch, scratch + nr);
  return nl;
}
