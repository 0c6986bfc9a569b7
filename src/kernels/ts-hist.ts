/** TypeScript twins of the histogram kernels (assembly/kernels.ts); layout in layout.ts. */
import { BINS } from './layout.js';
import { viewsOf } from './views.js';

/** Value histograms [rows, Σw, Σw·y] per bin for the listed features over a node's gathered rows. */
export function histValueTs(buf: ArrayBufferLike, codesPtr: number, nRows: number, rowsPtr: number, count: number,
  gwPtr: number, gsPtr: number, featsPtr: number, nFeats: number, histPtr: number): void {
  const { f64, i32, u8 } = viewsOf(buf);
  const rows = rowsPtr >> 2, gw = gwPtr >> 3, gs = gsPtr >> 3;
  for (let k = 0; k < nFeats; k++) {
    const f = i32[(featsPtr >> 2) + k];
    const col = codesPtr + f * nRows;
    const h = (histPtr >> 3) + f * BINS * 3;
    f64.fill(0, h, h + BINS * 3);
    for (let i = 0; i < count; i++) {
      const p = h + u8[col + i32[rows + i]] * 3;
      f64[p] = f64[p] + 1.0;
      f64[p + 1] = f64[p + 1] + f64[gw + i];
      f64[p + 2] = f64[p + 2] + f64[gs + i];
    }
  }
}

/** Class histograms [rows, Σw class 0..K-1] per bin for the listed features. */
export function histClassTs(buf: ArrayBufferLike, codesPtr: number, nRows: number, rowsPtr: number, count: number,
  gwPtr: number, gcPtr: number, nClasses: number, featsPtr: number, nFeats: number, histPtr: number): void {
  const { f64, i32, u8 } = viewsOf(buf);
  const rows = rowsPtr >> 2, gw = gwPtr >> 3, gc = gcPtr >> 2, stride = 1 + nClasses;
  for (let k = 0; k < nFeats; k++) {
    const f = i32[(featsPtr >> 2) + k];
    const col = codesPtr + f * nRows;
    const h = (histPtr >> 3) + f * BINS * stride;
    f64.fill(0, h, h + BINS * stride);
    for (let i = 0; i < count; i++) {
      const p = h + u8[col + i32[rows + i]] * stride;
      f64[p] = f64[p] + 1.0;
      const q = p + 1 + i32[gc + i];
      f64[q] = f64[q] + f64[gw + i];
    }
  }
}

/** out = parent - child over the blocks of the listed features. */
export function histSubtractTs(buf: ArrayBufferLike, parentPtr: number, childPtr: number, outPtr: number,
  featsPtr: number, nFeats: number, stride: number): void {
  const { f64, i32 } = viewsOf(buf);
  const block = BINS * stride;
  for (let k = 0; k < nFeats; k++) {
    const off = i32[(featsPtr >> 2) + k] * block;
    const p = (parentPtr >> 3) + off, c = (childPtr >> 3) + off, o = (outPtr >> 3) + off;
    for (let j = 0; j < block; j++) f64[o + j] = f64[p + j] - f64[c + j];
  }
}
