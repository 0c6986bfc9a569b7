import { describe, expect, it } from 'vitest';
import { Arena } from '../../src/kernels/arena.js';
import { BINS, MISSING } from '../../src/kernels/layout.js';
import { scanValueListTs, scanValueTs } from '../../src/kernels/ts-scan.js';
import { tsKernels } from '../../src/kernels/ts-kernels.js';
import { wasmKernels } from '../../src/kernels/wasm-kernels.js';
import { createRng } from '../../src/util/rng.js';

const arena = new Arena();
const sets = [tsKernels(arena), wasmKernels(arena)].filter((k) => k !== null);

describe('scanValueList(block, binsPtr, nList, nBins, mean, leafRows, leafWeight, tol, out), both kernel sets', () => {
  it('is bit-identical to the dense scan (TypeScript and wasm) on small random nodes', () => {
    const rng = createRng(11);
    const block = arena.alloc(BINS * 3 * 8), out = arena.alloc(64), out2 = arena.alloc(64);
    let found = 0;
    for (let trial = 0; trial < 300; trial++) {
      const h = arena.f64(block, BINS * 3).fill(0);
      const nBins = 2 + rng.int(254), count = 1 + rng.int(40);
      for (let i = 0; i < count; i++) {
        const b = rng.int(8) === 0 ? MISSING : rng.int(nBins);
        const w = rng.int(5) === 0 ? 0.5 : 1, y = rng.normal() * 4;
        h[b * 3] += 1; h[b * 3 + 1] += w; h[b * 3 + 2] += w * y;
      }
      const list = Int32Array.from({ length: nBins }, (_, b) => b).filter((b) => h[b * 3] > 0);
      const mean = rng.normal(), leafRows = 1 + rng.int(3), leafWeight = rng.int(2), tol = 1e-12;
      const listPtr = arena.put(list.length ? list : Int32Array.of(0));
      scanValueListTs(arena.buffer, block, listPtr, list.length, nBins, mean, leafRows, leafWeight, tol, out2);
      const got = Array.from(arena.f64(out2, 8));
      for (const k of sets) {
        k.scanValueList(block, listPtr, list.length, nBins, mean, leafRows, leafWeight, tol, out);
        expect(Array.from(arena.f64(out, 8)), k.name).toEqual(got);
      }
      arena.release(listPtr);
      scanValueTs(arena.buffer, block, nBins, mean, leafRows, leafWeight, tol, out);
      expect(got).toEqual(Array.from(arena.f64(out, 8)));
      for (const k of sets) {
        k.scanValue(block, nBins, mean, leafRows, leafWeight, tol, out);
        expect(got, k.name).toEqual(Array.from(arena.f64(out, 8)));
      }
      if (got[1] >= 0) found++;
    }
    expect(found).toBeGreaterThan(50);
  });

  it('histValueSparse(...) equals histValue(...) on a clean block and lists the occupied bins ascending', () => {
    const rng = createRng(12);
    const nRows = 300, nFeat = 3;
    const codes = new Uint8Array(nRows * nFeat).map(() => (rng.int(6) === 0 ? MISSING : rng.int(200)));
    const rows = Int32Array.from({ length: 37 }, () => rng.int(nRows));
    const gw = Float64Array.from(rows, () => rng.next()), gs = Float64Array.from(rows, () => rng.normal());
    const p = { codes: arena.put(codes), rows: arena.put(rows), gw: arena.put(gw), gs: arena.put(gs), feats: arena.put(Int32Array.of(2, 0)) };
    const dense = arena.alloc(nFeat * BINS * 24), sparse = arena.alloc(nFeat * BINS * 24);
    const bins = arena.alloc(2 * rows.length * 4), lens = arena.alloc(8), mark = arena.alloc(32);
    for (const k of sets) {
      arena.f64(sparse, nFeat * BINS * 3).fill(0);
      arena.u8(mark, 32).fill(0);
      k.histValue(p.codes, nRows, p.rows, rows.length, p.gw, p.gs, p.feats, 2, dense);
      k.histValueSparse(p.codes, nRows, p.rows, rows.length, p.gw, p.gs, p.feats, 2, sparse, bins, lens, mark);
      for (const [slot, f] of [[0, 2], [1, 0]]) {
        const off = f * BINS * 3;
        expect(Array.from(arena.f64(sparse + off * 8, BINS * 3)), k.name).toEqual(Array.from(arena.f64(dense + off * 8, BINS * 3)));
        const want = [...new Set(Array.from(rows, (r) => codes[f * nRows + r]))].filter((b) => b !== MISSING).sort((a, b) => a - b);
        expect(Array.from(arena.i32(bins + slot * rows.length * 4, arena.i32(lens, 2)[slot])), k.name).toEqual(want);
      }
      expect(Array.from(arena.u8(mark, 32)).every((v) => v === 0)).toBe(true);
    }
  });
});
