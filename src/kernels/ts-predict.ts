/** TypeScript twin of the tree prediction kernel (assembly/kernels.ts `predictLeaves`). */
import { viewsOf } from './views.js';

/** Pointers of a FlatTree's arrays inside the arena. */
export interface TreePtrs {
  readonly kind: number; readonly feature: number; readonly threshold: number;
  readonly left: number; readonly right: number; readonly missing: number;
  readonly offset: number; readonly width: number; readonly branches: number; readonly catBits: number;
}

/** Leaf index of each of `nRows` rows of column-major f64 data. */
export function predictLeavesTs(buf: ArrayBufferLike, t: TreePtrs, dataPtr: number, nRows: number, outPtr: number): void {
  const { f64, i32, u32, u8 } = viewsOf(buf);
  const kind = t.kind, feat = t.feature >> 2, thr = t.threshold >> 3, left = t.left >> 2, right = t.right >> 2;
  const miss = t.missing >> 2, offs = t.offset >> 2, width = t.width >> 2, br = t.branches >> 2, bits = t.catBits >> 2;
  const data = dataPtr >> 3, out = outPtr >> 2;
  for (let row = 0; row < nRows; row++) {
    let n = 0;
    for (;;) {
      const k = u8[kind + n];
      if (k === 0) break;
      const x = f64[data + i32[feat + n] * nRows + row];
      if (k === 1) {
        n = x !== x ? i32[miss + n] : x <= f64[thr + n] ? i32[left + n] : i32[right + n];
        continue;
      }
      if (!(x >= 0)) { n = i32[miss + n]; continue; }
      const c = x | 0, wd = i32[width + n], off = i32[offs + n];
      if (k === 2) {
        n = c >= wd * 32 ? i32[miss + n] : (u32[bits + off + (c >>> 5)] >>> (c & 31)) & 1 ? i32[left + n] : i32[right + n];
      } else {
        const child = c >= wd ? -1 : i32[br + off + c];
        n = child < 0 ? i32[miss + n] : child;
      }
    }
    i32[out + row] = n;
  }
}
