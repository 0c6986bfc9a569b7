// coppice hot loops, compiled to build/kernels.wasm by `npm run build:wasm`.
//
// Every argument named *Ptr is a byte offset into the one linear memory shared with JavaScript; the layout
// of each region is documented in src/kernels/layout.ts. Each function here has a TypeScript twin in
// src/kernels/ that performs the same floating-point operations in the same order, so results are
// bit-for-bit identical; the twins are the reference in tests and the fallback when this file is absent.

const BINS: i32 = 256;

/**
 * Copy weights and weighted responses of a node's rows into contiguous arrays, and write the node's sums
 * [Σw, Σw·y, Σw·y²] (in row order) to statsPtr.
 */
export function gatherValue(rowsPtr: usize, count: i32, wPtr: usize, yPtr: usize, gwPtr: usize, gsPtr: usize, statsPtr: usize): void {
  let sw = 0.0, ss = 0.0, sq = 0.0;
  for (let i = 0; i < count; i++) {
    const r = <usize>load<i32>(rowsPtr + (<usize>i << 2));
    const w = load<f64>(wPtr + (r << 3));
    const y = load<f64>(yPtr + (r << 3));
    const wy = w * y;
    store<f64>(gwPtr + (<usize>i << 3), w);
    store<f64>(gsPtr + (<usize>i << 3), wy);
    sw += w; ss += wy; sq += wy * y;
  }
  store<f64>(statsPtr, sw); store<f64>(statsPtr, ss, 8); store<f64>(statsPtr, sq, 16);
}

/** Copy weights and class codes of a node's rows into contiguous arrays; class weight sums to statsPtr (K doubles). */
export function gatherClass(rowsPtr: usize, count: i32, wPtr: usize, clsPtr: usize, gwPtr: usize, gcPtr: usize, nClasses: i32, statsPtr: usize): void {
  memory.fill(statsPtr, 0, <usize>nClasses << 3);
  for (let i = 0; i < count; i++) {
    const r = <usize>load<i32>(rowsPtr + (<usize>i << 2));
    const w = load<f64>(wPtr + (r << 3));
    const c = load<i32>(clsPtr + (r << 2));
    store<f64>(gwPtr + (<usize>i << 3), w);
    store<i32>(gcPtr + (<usize>i << 2), c);
    const p = statsPtr + (<usize>c << 3);
    store<f64>(p, load<f64>(p) + w);
  }
}

/**
 * Value histograms of the listed features over a node's rows: per bin [rows, Σw, Σw·y] (stride 3 doubles).
 * Feature f's block starts at histPtr + f·256·3·8 and is cleared first. The pair [Σw, Σw·y] of a bin is
 * updated as one f64x2 (two independent lanes, the same additions as two scalar ones, so sums are
 * bit-identical to the twin); two features per pass share the row index and the (w, w·y) pair, and two
 * rows per iteration give the processor independent updates to overlap (each bin still sees its rows in order).
 */
export function histValue(codesPtr: usize, nRows: i32, rowsPtr: usize, count: i32, gwPtr: usize, gsPtr: usize,
  featsPtr: usize, nFeats: i32, histPtr: usize): void {
  let k = 0;
  for (; k + 1 < nFeats; k += 2) {
    const f1 = <usize>load<i32>(featsPtr + (<usize>k << 2));
    const f2 = <usize>load<i32>(featsPtr + (<usize>(k + 1) << 2));
    const c1 = codesPtr + f1 * <usize>nRows, c2 = codesPtr + f2 * <usize>nRows;
    const h1 = histPtr + f1 * <usize>(BINS * 24), h2 = histPtr + f2 * <usize>(BINS * 24);
    memory.fill(h1, 0, BINS * 24);
    memory.fill(h2, 0, BINS * 24);
    let i = 0;
    for (; i + 1 < count; i += 2) {
      const ra = <usize>load<i32>(rowsPtr + (<usize>i << 2)), rb = <usize>load<i32>(rowsPtr + (<usize>i << 2), 4);
      const wa = f64x2.replace_lane(f64x2.splat(load<f64>(gwPtr + (<usize>i << 3))), 1, load<f64>(gsPtr + (<usize>i << 3)));
      const wb = f64x2.replace_lane(f64x2.splat(load<f64>(gwPtr + (<usize>i << 3), 8)), 1, load<f64>(gsPtr + (<usize>i << 3), 8));
      const pa = h1 + <usize>load<u8>(c1 + ra) * 24;
      store<f64>(pa, load<f64>(pa) + 1.0);
      v128.store(pa, f64x2.add(v128.load(pa, 8), wa), 8);
      const qa = h2 + <usize>load<u8>(c2 + ra) * 24;
      store<f64>(qa, load<f64>(qa) + 1.0);
      v128.store(qa, f64x2.add(v128.load(qa, 8), wa), 8);
      const pb = h1 + <usize>load<u8>(c1 + rb) * 24;
      store<f64>(pb, load<f64>(pb) + 1.0);
      v128.store(pb, f64x2.add(v128.load(pb, 8), wb), 8);
      const qb = h2 + <usize>load<u8>(c2 + rb) * 24;
      store<f64>(qb, load<f64>(qb) + 1.0);
      v128.store(qb, f64x2.add(v128.load(qb, 8), wb), 8);
    }
    for (; i < count; i++) {
      const r = <usize>load<i32>(rowsPtr + (<usize>i << 2));
      const ws = f64x2.replace_lane(f64x2.splat(load<f64>(gwPtr + (<usize>i << 3))), 1, load<f64>(gsPtr + (<usize>i << 3)));
      const p = h1 + <usize>load<u8>(c1 + r) * 24;
      store<f64>(p, load<f64>(p) + 1.0);
      v128.store(p, f64x2.add(v128.load(p, 8), ws), 8);
      const q = h2 + <usize>load<u8>(c2 + r) * 24;
      store<f64>(q, load<f64>(q) + 1.0);
      v128.store(q, f64x2.add(v128.load(q, 8), ws), 8);
    }
  }
  for (; k < nFeats; k++) {
    const f = <usize>load<i32>(featsPtr + (<usize>k << 2));
    const col = codesPtr + f * <usize>nRows;
    const h = histPtr + f * <usize>(BINS * 24);
    memory.fill(h, 0, BINS * 24);
    for (let i = 0; i < count; i++) {
      const r = <usize>load<i32>(rowsPtr + (<usize>i << 2));
      const ws = f64x2.replace_lane(f64x2.splat(load<f64>(gwPtr + (<usize>i << 3))), 1, load<f64>(gsPtr + (<usize>i << 3)));
      const p = h + <usize>load<u8>(col + r) * 24;
      store<f64>(p, load<f64>(p) + 1.0);
      v128.store(p, f64x2.add(v128.load(p, 8), ws), 8);
    }
  }
}

/** Class histograms: per bin [rows, Σw of class 0, ..., Σw of class K-1] (stride 1+K doubles). */
export function histClass(codesPtr: usize, nRows: i32, rowsPtr: usize, count: i32, gwPtr: usize, gcPtr: usize,
  nClasses: i32, featsPtr: usize, nFeats: i32, histPtr: usize): void {
  const stride = <usize>(1 + nClasses) << 3;
  for (let k = 0; k < nFeats; k++) {
    const f = <usize>load<i32>(featsPtr + (<usize>k << 2));
    const col = codesPtr + f * <usize>nRows;
    const h = histPtr + f * <usize>BINS * stride;
    memory.fill(h, 0, <usize>BINS * stride);
    for (let i = 0; i < count; i++) {
      const r = <usize>load<i32>(rowsPtr + (<usize>i << 2));
      const p = h + <usize>load<u8>(col + r) * stride;
      store<f64>(p, load<f64>(p) + 1.0);
      const q = p + 8 + (<usize>load<i32>(gcPtr + (<usize>i << 2)) << 3);
      store<f64>(q, load<f64>(q) + load<f64>(gwPtr + (<usize>i << 3)));
    }
  }
}

/** out = parent - child over the blocks of the listed features (block = 256·stride doubles); out may be parent. */
export function histSubtract(parentPtr: usize, childPtr: usize, outPtr: usize, featsPtr: usize, nFeats: i32, stride: i32): void {
  const block = <usize>(BINS * stride) << 3;
  for (let k = 0; k < nFeats; k++) {
    const off = <usize>load<i32>(featsPtr + (<usize>k << 2)) * block;
    // block is a multiple of 16 bytes: two doubles per f64x2 lane pair, each lane an ordinary subtraction
    for (let j: usize = 0; j < block; j += 16) {
      v128.store(outPtr + off + j, f64x2.sub(v128.load(parentPtr + off + j), v128.load(childPtr + off + j)));
    }
  }
}

/**
 * Stable partition of a node's rows by a 256-entry table (1 = left) indexed by bin code of one feature.
 * Left rows stay at the front of rows; right rows follow, in their original order. Returns the left count.
 */
export function partitionRows(colPtr: usize, rowsPtr: usize, count: i32, lutPtr: usize, scratchPtr: usize): i32 {
  let nl = 0, nr = 0;
  for (let i = 0; i < count; i++) {
    const r = load<i32>(rowsPtr + (<usize>i << 2));
    if (load<u8>(lutPtr + <usize>load<u8>(colPtr + <usize>r))) {
      store<i32>(rowsPtr + (<usize>nl << 2), r); nl++;
    } else {
      store<i32>(scratchPtr + (<usize>nr << 2), r); nr++;
    }
  }
  memory.copy(rowsPtr + (<usize>nl << 2), scratchPtr, <usize>nr << 2);
  return nl;
}

@inline function varImp(w: f64, s: f64): f64 {
  return w > 0 ? -(s * s) / w : 0;
}

/**
 * Best threshold of one feature's value histogram (bins 0..nBins-1; missing rows left out), scored by
 * weighted variance decrease with sums centred on `mean`. Writes to outPtr: [score, bin, leftRows, leftW,
 * leftS, knownRows, knownW, knownS]; bin = -1 when no valid threshold. The known totals are summed from
 * the same bins as the left side (so a constant response scores exactly 0), and the scan stops once
 * every known row is on the left.
 */
export function scanValue(blockPtr: usize, nBins: i32, mean: f64, leafRows: f64, leafWeight: f64, tol: f64, outPtr: usize): void {
  let tn = 0.0, nonEmpty = 0;
  // [Σw, Σw·y] summed as one f64x2: each lane is the scalar sum, in the same order
  let tws = f64x2.splat(0.0);
  for (let b = 0; b < nBins; b++) {
    const p = blockPtr + <usize>b * 24;
    const n = load<f64>(p);
    nonEmpty += <i32>(n > 0);
    tn += n; tws = f64x2.add(tws, v128.load(p, 8));
  }
  const tw = f64x2.extract_lane(tws, 0), ts = f64x2.extract_lane(tws, 1);
  const tsc = ts - mean * tw;
  store<f64>(outPtr, -Infinity);
  store<f64>(outPtr, -1, 8);
  store<f64>(outPtr, tn, 40); store<f64>(outPtr, tw, 48); store<f64>(outPtr, tsc, 56);
  if (nonEmpty < 2 || tn < 2 || tn < 2 * leafRows) return;
  const parent = varImp(tw, tsc);
  let ln = 0.0, lw = 0.0, ls = 0.0;
  let best = -Infinity, bestBin = -1, bn = 0.0, bw = 0.0, bs = 0.0;
  for (let b = 0; b < nBins - 1; b++) {
    const p = blockPtr + <usize>b * 24;
    const n = load<f64>(p);
    if (n == 0) continue;
    ln += n; lw += load<f64>(p, 8); ls += load<f64>(p, 16);
    if (ln >= tn) break;
    if (ln < leafRows || tn - ln < leafRows) continue;
    if (lw < leafWeight || tw - lw < leafWeight) continue;
    const lsc = ls - mean * lw;
    const score = parent - varImp(lw, lsc) - varImp(tw - lw, tsc - lsc);
    if (score > best + tol) { best = score; bestBin = b; bn = ln; bw = lw; bs = lsc; }
  }
  store<f64>(outPtr, best);
  store<f64>(outPtr, <f64>bestBin, 8);
  store<f64>(outPtr, bn, 16); store<f64>(outPtr, bw, 24); store<f64>(outPtr, bs, 32);
}

/**
 * Leaf reached by each row, for a tree in FlatTree form (see src/learn/flat-tree.ts) over column-major
 * float64 data (categorical codes as numbers, negative = missing; numeric NaN = missing).
 */
export function predictLeaves(kindPtr: usize, featurePtr: usize, thresholdPtr: usize, leftPtr: usize, rightPtr: usize,
  missingPtr: usize, offsetPtr: usize, widthPtr: usize, branchesPtr: usize, catBitsPtr: usize,
  dataPtr: usize, nRows: i32, outPtr: usize): void {
  for (let row = 0; row < nRows; row++) {
    let n: usize = 0;
    for (;;) {
      const kind = load<u8>(kindPtr + n);
      if (kind == 0) break;
      const f = <usize>load<i32>(featurePtr + (n << 2));
      const x = load<f64>(dataPtr + ((f * <usize>nRows + <usize>row) << 3));
      let next: i32;
      if (kind == 1) {
        if (x != x) next = load<i32>(missingPtr + (n << 2));
        else next = x <= load<f64>(thresholdPtr + (n << 3)) ? load<i32>(leftPtr + (n << 2)) : load<i32>(rightPtr + (n << 2));
      } else {
        const width = load<i32>(widthPtr + (n << 2));
        const off = load<i32>(offsetPtr + (n << 2));
        if (!(x >= 0)) next = load<i32>(missingPtr + (n << 2));
        else if (kind == 2) {
          const c = <i32>x;
          if (c >= width * 32) next = load<i32>(missingPtr + (n << 2));
          else {
            const word = load<u32>(catBitsPtr + (<usize>(off + (c >>> 5)) << 2));
            next = (word >>> (c & 31)) & 1 ? load<i32>(leftPtr + (n << 2)) : load<i32>(rightPtr + (n << 2));
          }
        } else {
          const c = <i32>x;
          if (c >= width) next = load<i32>(missingPtr + (n << 2));
          else {
            const child = load<i32>(branchesPtr + (<usize>(off + c) << 2));
            next = child < 0 ? load<i32>(missingPtr + (n << 2)) : child;
          }
        }
      }
      n = <usize>next;
    }
    store<i32>(outPtr + (<usize>row << 2), <i32>n);
  }
}

/**
 * Value histograms of a small node over its occupied bins only. The listed features' blocks must be all
 * zero on entry (the caller keeps a clean slot and zeroes the written bins afterwards); the additions are
 * those of histValue, in row order, so every bin ends up bit-identical. For the k-th listed feature, its
 * non-empty bins other than the missing bin are written ascending to binsPtr + k·count·4 and their number
 * to lensPtr + k·4. markPtr: 32 zero bytes (a 256-bit set, left zero).
 */
export function histValueSparse(codesPtr: usize, nRows: i32, rowsPtr: usize, count: i32, gwPtr: usize, gsPtr: usize,
  featsPtr: usize, nFeats: i32, histPtr: usize, binsPtr: usize, lensPtr: usize, markPtr: usize): void {
  for (let k = 0; k < nFeats; k++) {
    const f = <usize>load<i32>(featsPtr + (<usize>k << 2));
    const col = codesPtr + f * <usize>nRows;
    const h = histPtr + f * <usize>(BINS * 24);
    for (let i = 0; i < count; i++) {
      const r = <usize>load<i32>(rowsPtr + (<usize>i << 2));
      const b = <u32>load<u8>(col + r);
      const m = markPtr + (<usize>(b >> 5) << 2);
      store<u32>(m, load<u32>(m) | (<u32>1 << (b & 31)));
      const ws = f64x2.replace_lane(f64x2.splat(load<f64>(gwPtr + (<usize>i << 3))), 1, load<f64>(gsPtr + (<usize>i << 3)));
      const p = h + <usize>b * 24;
      store<f64>(p, load<f64>(p) + 1.0);
      v128.store(p, f64x2.add(v128.load(p, 8), ws), 8);
    }
    const out = binsPtr + (<usize>(k * count) << 2);
    let len = 0;
    for (let w = 0; w < 8; w++) {
      let x = load<u32>(markPtr + (<usize>w << 2));
      if (w == 7) x &= 0x7fffffff; // bin 255 = missing
      while (x != 0) {
        store<i32>(out + (<usize>len << 2), (w << 5) + <i32>ctz(x));
        len++;
        x &= x - 1;
      }
      store<u32>(markPtr + (<usize>w << 2), 0);
    }
    store<i32>(lensPtr + (<usize>k << 2), len);
  }
}

/**
 * scanValue over a list of bins: binsPtr holds nList bins ascending, every non-empty bin below nBins of the
 * block (the others are zero). Empty bins only add +0 to scanValue's sums and are skipped by its threshold
 * loop, so the output is bit-for-bit scanValue's.
 */
export function scanValueList(blockPtr: usize, binsPtr: usize, nList: i32, nBins: i32, mean: f64, leafRows: f64, leafWeight: f64, tol: f64, outPtr: usize): void {
  let tn = 0.0, tw = 0.0, ts = 0.0, nonEmpty = 0;
  for (let j = 0; j < nList; j++) {
    const p = blockPtr + <usize>load<i32>(binsPtr + (<usize>j << 2)) * 24;
    const n = load<f64>(p);
    if (n > 0) nonEmpty++;
    tn += n; tw += load<f64>(p, 8); ts += load<f64>(p, 16);
  }
  const tsc = ts - mean * tw;
  store<f64>(outPtr, -Infinity);
  store<f64>(outPtr, -1, 8);
  store<f64>(outPtr, tn, 40); store<f64>(outPtr, tw, 48); store<f64>(outPtr, tsc, 56);
  if (nonEmpty < 2 || tn < 2 || tn < 2 * leafRows) return;
  const parent = varImp(tw, tsc);
  let ln = 0.0, lw = 0.0, ls = 0.0;
  let best = -Infinity, bestBin = -1, bn = 0.0, bw = 0.0, bs = 0.0;
  for (let j = 0; j < nList; j++) {
    const b = load<i32>(binsPtr + (<usize>j << 2));
    if (b >= nBins - 1) break;
    const p = blockPtr + <usize>b * 24;
    const n = load<f64>(p);
    if (n == 0) continue;
    ln += n; lw += load<f64>(p, 8); ls += load<f64>(p, 16);
    if (ln >= tn) break;
    if (ln < leafRows || tn - ln < leafRows) continue;
    if (lw < leafWeight || tw - lw < leafWeight) continue;
    const lsc = ls - mean * lw;
    const score = parent - varImp(lw, lsc) - varImp(tw - lw, tsc - lsc);
    if (score > best + tol) { best = score; bestBin = b; bn = ln; bw = lw; bs = lsc; }
  }
  store<f64>(outPtr, best);
  store<f64>(outPtr, <f64>bestBin, 8);
  store<f64>(outPtr, bn, 16); store<f64>(outPtr, bw, 24); store<f64>(outPtr, bs, 32);
}
