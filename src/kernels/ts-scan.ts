/** TypeScript twin of the value split scan (assembly/kernels.ts `scanValue`): same operations, same order. */
import { viewsOf } from './views.js';

function varImp(w: number, s: number): number {
  return w > 0 ? -(s * s) / w : 0;
}

/** Best threshold of one value histogram block; writes [score, bin, leftRows, leftW, leftS, knownRows, knownW, knownS]. */
export function scanValueTs(buf: ArrayBufferLike, blockPtr: number, nBins: number, mean: number, leafRows: number,
  leafWeight: number, tol: number, outPtr: number): void {
  const { f64 } = viewsOf(buf);
  const h = blockPtr >> 3, o = outPtr >> 3;
  let tn = 0, tw = 0, ts = 0, nonEmpty = 0;
  for (let b = 0; b < nBins; b++) {
    const n = f64[h + b * 3];
    if (n > 0) nonEmpty++;
    tn += n; tw += f64[h + b * 3 + 1]; ts += f64[h + b * 3 + 2];
  }
  const tsc = ts - mean * tw;
  f64[o] = -Infinity; f64[o + 1] = -1;
  f64[o + 5] = tn; f64[o + 6] = tw; f64[o + 7] = tsc;
  if (nonEmpty < 2 || tn < 2 || tn < 2 * leafRows) return;
  const parent = varImp(tw, tsc);
  let ln = 0, lw = 0, ls = 0;
  let best = -Infinity, bestBin = -1, bn = 0, bw = 0, bs = 0;
  for (let b = 0; b < nBins - 1; b++) {
    const n = f64[h + b * 3];
    if (n === 0) continue;
    ln += n; lw += f64[h + b * 3 + 1]; ls += f64[h + b * 3 + 2];
    if (ln >= tn) break;
    if (ln < leafRows || tn - ln < leafRows) continue;
    if (lw < leafWeight || tw - lw < leafWeight) continue;
    const lsc = ls - mean * lw;
    const score = parent - varImp(lw, lsc) - varImp(tw - lw, tsc - lsc);
    if (score > best + tol) { best = score; bestBin = b; bn = ln; bw = lw; bs = lsc; }
  }
  f64[o] = best; f64[o + 1] = bestBin;
  f64[o + 2] = bn; f64[o + 3] = bw; f64[o + 4] = bs;
}

/**
 * `scanValueTs` over a list of bins instead of 0..nBins-1 (twin of `scanValueList`): the i32 list at
 * `binsPtr` holds `nList` bins ascending, every non-empty bin below `nBins` (other bins of the block are
 * zero). Empty bins only ever add +0 to the dense scan's sums and are skipped by its threshold loop, so the
 * result is bit-for-bit the dense scan's. Used for small nodes (src/learn/hist/hist-sparse.ts).
 */
export function scanValueListTs(buf: ArrayBufferLike, blockPtr: number, binsPtr: number, nList: number, nBins: number,
  mean: number, leafRows: number, leafWeight: number, tol: number, outPtr: number): void {
  const { f64, i32 } = viewsOf(buf);
  const h = blockPtr >> 3, o = outPtr >> 3, from = binsPtr >> 2, end = from + nList;
  let tn = 0, tw = 0, ts = 0, nonEmpty = 0;
  for (let j = from; j < end; j++) {
    const b = i32[j];
    const n = f64[h + b * 3];
    if (n > 0) nonEmpty++;
    tn += n; tw += f64[h + b * 3 + 1]; ts += f64[h + b * 3 + 2];
  }
  const tsc = ts - mean * tw;
  f64[o] = -Infinity; f64[o + 1] = -1;
  f64[o + 5] = tn; f64[o + 6] = tw; f64[o + 7] = tsc;
  if (nonEmpty < 2 || tn < 2 || tn < 2 * leafRows) return;
  const parent = varImp(tw, tsc);
  let ln = 0, lw = 0, ls = 0;
  let best = -Infinity, bestBin = -1, bn = 0, bw = 0, bs = 0;
  for (let j = from; j < end; j++) {
    const b = i32[j];
    if (b >= nBins - 1) break;
    const n = f64[h + b * 3];
    if (n === 0) continue;
    ln += n; lw += f64[h + b * 3 + 1]; ls += f64[h + b * 3 + 2];
    if (ln >= tn) break;
    if (ln < leafRows || tn - ln < leafRows) continue;
    if (lw < leafWeight || tw - lw < leafWeight) continue;
    const lsc = ls - mean * lw;
    const score = parent - varImp(lw, lsc) - varImp(tw - lw, tsc - lsc);
    if (score > best + tol) { best = score; bestBin = b; bn = ln; bw = lw; bs = lsc; }
  }
  f64[o] = best; f64[o + 1] = bestBin;
  f64[o + 2] = bn; f64[o + 3] = bw; f64[o + 4] = bs;
}
