import { describe, expect, it } from 'vitest';
import { Arena } from '../../src/kernels/arena.js';
import type { KernelSet } from '../../src/kernels/kernel-set.js';
import { BINS } from '../../src/kernels/layout.js';
import { tsKernels } from '../../src/kernels/ts-kernels.js';
import { wasmKernels, wasmModule } from '../../src/kernels/wasm-kernels.js';
import { createRng } from '../../src/util/rng.js';

// The wasm build is part of `npm install` (prepare); without it only the TypeScript twins are checked.
const arena = new Arena();
const wasm = wasmKernels(arena);
const ts = tsKernels(arena);
const sets: KernelSet[] = wasm ? [ts, wasm] : [ts];

function bytes(a: Float64Array | Int32Array | Uint8Array): Uint8Array {
  return new Uint8Array(a.buffer, a.byteOffset, a.byteLength).slice();
}

/** A random problem in the arena: nRows × nFeat codes (some missing), weights, responses, classes, rows. */
function problem(seed: number, nRows: number, nFeat: number, nBins: number) {
  const rng = createRng(seed);
  const codes = new Uint8Array(nRows * nFeat).map(() => (rng.int(10) === 0 ? 255 : rng.int(nBins)));
  const w = Float64Array.from({ length: nRows }, () => rng.next() * 2);
  const y = Float64Array.from({ length: nRows }, () => rng.normal() * 3 + 1);
  const cls = Int32Array.from({ length: nRows }, () => rng.int(3));
  const rows = Int32Array.from({ length: nRows }, (_, i) => i).filter(() => rng.int(3) > 0);
  return {
    codes, w, y, cls, rows,
    codesPtr: arena.put(codes), wPtr: arena.put(w), yPtr: arena.put(y), clsPtr: arena.put(cls), rowsPtr: arena.put(rows),
    featsPtr: arena.put(Int32Array.from({ length: nFeat }, (_, f) => f)),
  };
}

describe('kernels', () => {
  it('wasm build is present (npm run build:wasm) — otherwise only twins are compared', () => {
    // informative, not a skip: the TypeScript path is always tested below
    expect(sets.length).toBe(wasmModule() ? 2 : 1);
  });

  it('histValue(...) matches a direct per-bin sum (hand check) in every kernel set', () => {
    const p = problem(1, 500, 3, 7);
    const n = p.rows.length;
    const gw = arena.alloc(n * 8), gs = arena.alloc(n * 8), st = arena.alloc(64);
    for (const k of sets) {
      k.gatherValue(p.rowsPtr, n, p.wPtr, p.yPtr, gw, gs, st);
      const hist = arena.alloc(3 * BINS * 3 * 8);
      k.histValue(p.codesPtr, 500, p.rowsPtr, n, gw, gs, p.featsPtr, 3, hist);
      const h = arena.f64(hist, 3 * BINS * 3);
      // same additions in the same order, written out plainly
      const want = new Float64Array(3 * BINS * 3);
      for (let f = 0; f < 3; f++) for (const r of p.rows) {
        const q = (f * BINS + p.codes[f * 500 + r]) * 3;
        want[q] += 1; want[q + 1] += p.w[r]; want[q + 2] += p.w[r] * p.y[r];
      }
      expect(Array.from(h)).toEqual(Array.from(want));
      let sw = 0, ss = 0, sq = 0;
      for (const r of p.rows) { const wy = p.w[r] * p.y[r]; sw += p.w[r]; ss += wy; sq += wy * p.y[r]; }
      expect(Array.from(arena.f64(st, 3))).toEqual([sw, ss, sq]);
      arena.release(hist);
    }
  });

  it('wasm and TypeScript give bit-identical histograms, subtraction, partition and scans', () => {
    if (!wasm) return;
    const nRows = 3000, nFeat = 4;
    const p = problem(2, nRows, nFeat, 40);
    const n = p.rows.length;
    const out = (k: KernelSet) => {
      const rows = arena.put(p.rows);
      const gw = arena.alloc(n * 8), gs = arena.alloc(n * 8), gc = arena.alloc(n * 4), st = arena.alloc(64), sc = arena.alloc(64);
      k.gatherValue(rows, n, p.wPtr, p.yPtr, gw, gs, st);
      const hv = arena.alloc(nFeat * BINS * 3 * 8);
      k.histValue(p.codesPtr, nRows, rows, n, gw, gs, p.featsPtr, nFeat, hv);
      k.gatherClass(rows, n, p.wPtr, p.clsPtr, gw, gc, 3, sc);
      const hc = arena.alloc(nFeat * BINS * 4 * 8);
      k.histClass(p.codesPtr, nRows, rows, n, gw, gc, 3, p.featsPtr, nFeat, hc);
      // child = first 1000 rows; larger sibling by subtraction
      k.gatherValue(rows, 1000, p.wPtr, p.yPtr, gw, gs, st);
      const child = arena.alloc(nFeat * BINS * 3 * 8), sib = arena.alloc(nFeat * BINS * 3 * 8);
      k.histValue(p.codesPtr, nRows, rows, 1000, gw, gs, p.featsPtr, nFeat, child);
      k.histSubtract(hv, child, sib, p.featsPtr, nFeat, 3);
      const scan = arena.alloc(64 * nFeat);
      for (let f = 0; f < nFeat; f++) k.scanValue(hv + f * BINS * 24, 40, 0.7, 5, 1, 1e-9, scan + 64 * f);
      const lut = arena.put(Uint8Array.from({ length: 256 }, (_, b) => (b < 17 || b === 255 ? 1 : 0)));
      const scratch = arena.alloc(n * 4);
      const nl = k.partitionRows(p.codesPtr + 2 * nRows, rows, n, lut, scratch);
      return {
        hv: bytes(arena.f64(hv, nFeat * BINS * 3)), hc: bytes(arena.f64(hc, nFeat * BINS * 4)),
        sib: bytes(arena.f64(sib, nFeat * BINS * 3)), scan: Array.from(arena.f64(scan, 8 * nFeat)),
        nl, rows: Array.from(arena.i32(rows, n)), st: Array.from(arena.f64(st, 3)), sc: Array.from(arena.f64(sc, 3)),
      };
    };
    const a = out(ts), b = out(wasm);
    expect(b.hv).toEqual(a.hv);
    expect(b.hc).toEqual(a.hc);
    expect(b.sib).toEqual(a.sib);
    expect(b.scan).toEqual(a.scan);
    expect(b.nl).toBe(a.nl);
    expect(b.rows).toEqual(a.rows);
    expect(b.st).toEqual(a.st);
    expect(b.sc).toEqual(a.sc);
  });

  it('partitionRows(...) is stable: left rows then right rows, each in original order', () => {
    for (const k of sets) {
      const codes = arena.put(Uint8Array.of(0, 5, 255, 1, 5, 0));
      const rows = arena.put(Int32Array.of(0, 1, 2, 3, 4, 5));
      const lut = arena.put(Uint8Array.from({ length: 256 }, (_, b) => (b <= 1 || b === 255 ? 1 : 0)));
      const scratch = arena.alloc(24);
      expect(k.partitionRows(codes, rows, 6, lut, scratch)).toBe(4);
      expect(Array.from(arena.i32(rows, 6))).toEqual([0, 2, 3, 5, 1, 4]);
    }
  });

  it('scanValue(...) finds the hand-computed best threshold', () => {
    // bins 0..2 with rows (1, 1, 2), weights (1, 1, 2), sums (0, 0, 10); node mean 10/4 = 2.5, so the
    // centred sums are (-2.5, -2.5, 5) and the parent's centred sum is 0.
    // Cut after bin 0: L (-2.5 over w 1), R (2.5 over w 3): 6.25 + 6.25/3 = 8.3333
    // Cut after bin 1: L (-5 over w 2), R (5 over w 2): 12.5 + 12.5 = 25  (the best)
    for (const k of sets) {
      const hist = arena.put(Float64Array.of(1, 1, 0, 1, 1, 0, 2, 2, 10));
      const outp = arena.alloc(64);
      k.scanValue(hist, 3, 2.5, 1, 0, 0, outp);
      const o = arena.f64(outp, 8);
      expect(o[1]).toBe(1);
      expect(o[0]).toBeCloseTo(25, 12);
      expect([o[2], o[3], o[4], o[5], o[6], o[7]]).toEqual([2, 2, -5, 4, 4, 0]);
      // leafRows 3 forbids every cut
      k.scanValue(hist, 3, 2.5, 3, 0, 0, outp);
      expect(arena.f64(outp, 2)[1]).toBe(-1);
    }
  });

  it('Arena.alloc/release reuses freed blocks and grows the memory', () => {
    const a = new Arena();
    const x = a.alloc(100), y = a.alloc(100);
    a.release(x);
    expect(a.alloc(64)).toBe(x);
    const big = a.alloc(8 << 20);
    expect(a.buffer.byteLength).toBeGreaterThanOrEqual(big + (8 << 20));
    a.release(big); a.release(y);
  });
});

describe('predictLeaves(tree, data, nRows, out)', () => {
  // A hand-built FlatTree (layout in src/learn/flat-tree.ts): node 0 numeric x0 <= 2.5 (missing -> right),
  // node 1 subset on x1 codes {0, 2} -> left (missing -> left), node 2 multiway on x1 (code 0 -> 5, 1 -> 6,
  // 2 -> missing child 6); leaves 3, 4, 5, 6.
  const tree = {
    kind: Uint8Array.of(1, 2, 3, 0, 0, 0, 0), feature: Int32Array.of(0, 1, 1, -1, -1, -1, -1),
    threshold: Float64Array.of(2.5, 0, 0, 0, 0, 0, 0), left: Int32Array.of(1, 3, -1, -1, -1, -1, -1),
    right: Int32Array.of(2, 4, -1, -1, -1, -1, -1), missing: Int32Array.of(2, 3, 6, -1, -1, -1, -1),
    offset: Int32Array.of(0, 0, 0, 0, 0, 0, 0), width: Int32Array.of(0, 1, 3, 0, 0, 0, 0),
    branches: Int32Array.of(5, 6, -1), catBits: Uint32Array.of(0b101),
  };
  // rows: (x0, x1) = (1, 0) (1, 1) (1, NaN) (1, 40) (3, 0) (3, 1) (3, 2) (NaN, 0) (3, -1)
  const x0 = [1, 1, 1, 1, 3, 3, 3, NaN, 3], x1 = [0, 1, -1, 40, 0, 1, 2, 0, -1];
  const want = [3, 4, 3, 3, 5, 6, 6, 5, 6];
  it('routes numeric, subset, multiway and missing values as flat-tree.ts describes', () => {
    for (const k of sets) {
      const p = {
        kind: arena.put(tree.kind), feature: arena.put(tree.feature), threshold: arena.put(tree.threshold),
        left: arena.put(tree.left), right: arena.put(tree.right), missing: arena.put(tree.missing), offset: arena.put(tree.offset),
        width: arena.put(tree.width), branches: arena.put(tree.branches), catBits: arena.put(tree.catBits),
      };
      const data = arena.put(Float64Array.from([...x0, ...x1]));
      const out = arena.alloc(9 * 4);
      k.predictLeaves(p, data, 9, out);
      expect(Array.from(arena.i32(out, 9)), k.name).toEqual(want);
    }
  });
});
