/** TypeScript twins of the gather kernels (assembly/kernels.ts): a node's rows into contiguous arrays. */
import { viewsOf } from './views.js';

/** gw[i] = w[rows[i]], gs[i] = w·y of that row; stats = [Σw, Σw·y, Σw·y²] in row order. */
export function gatherValueTs(buf: ArrayBufferLike, rowsPtr: number, count: number, wPtr: number, yPtr: number,
  gwPtr: number, gsPtr: number, statsPtr: number): void {
  const { f64, i32 } = viewsOf(buf);
  const rows = rowsPtr >> 2, w = wPtr >> 3, y = yPtr >> 3, gw = gwPtr >> 3, gs = gsPtr >> 3;
  let sw = 0, ss = 0, sq = 0;
  for (let i = 0; i < count; i++) {
    const r = i32[rows + i];
    const wi = f64[w + r], yi = f64[y + r];
    const wy = wi * yi;
    f64[gw + i] = wi;
    f64[gs + i] = wy;
    sw += wi; ss += wy; sq += wy * yi;
  }
  const st = statsPtr >> 3;
  f64[st] = sw; f64[st + 1] = ss; f64[st + 2] = sq;
}

/** gw[i] = w[rows[i]], gc[i] = cls[rows[i]]; stats = class weight sums (K doubles) in row order. */
export function gatherClassTs(buf: ArrayBufferLike, rowsPtr: number, count: number, wPtr: number, clsPtr: number,
  gwPtr: number, gcPtr: number, nClasses: number, statsPtr: number): void {
  const { f64, i32 } = viewsOf(buf);
  const rows = rowsPtr >> 2, w = wPtr >> 3, cls = clsPtr >> 2, gw = gwPtr >> 3, gc = gcPtr >> 2, st = statsPtr >> 3;
  f64.fill(0, st, st + nClasses);
  for (let i = 0; i < count; i++) {
    const r = i32[rows + i];
    const wi = f64[w + r], c = i32[cls + r];
    f64[gw + i] = wi;
    i32[gc + i] = c;
    f64[st + c] = f64[st + c] + wi;
  }
}
