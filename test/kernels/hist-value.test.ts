import { describe, expect, it } from 'vitest';
import { Arena } from '../../src/kernels/arena.js';
import { BINS } from '../../src/kernels/layout.js';
import { tsKernels } from '../../src/kernels/ts-kernels.js';
import { wasmKernels } from '../../src/kernels/wasm-kernels.js';
import { createRng } from '../../src/util/rng.js';

const arena = new Arena();
const wasm = wasmKernels(arena), ts = tsKernels(arena);

// The wasm histValue takes two features and two rows per step; odd feature and row counts take the
// remainder paths. Each must add the same numbers in the same order as the twin (bit-identical sums).
describe('histValue(codes, nRows, rows, count, gw, gs, feats, nFeats, hist): wasm equals the TypeScript twin', () => {
  for (const [nFeats, count] of [[3, 0], [3, 1], [3, 7], [1, 8], [2, 9], [5, 64]] as const) {
    it(`${nFeats} features, ${count} rows (repeated bins included)`, () => {
      if (!wasm) return;
      const rng = createRng(100 + count), nRows = 80;
      const codes = new Uint8Array(nRows * nFeats).map(() => rng.int(6) * 40 + (rng.int(9) === 0 ? 15 : 0));
      const rows = Int32Array.from({ length: count }, () => rng.int(nRows));
      const p = {
        codes: arena.put(codes), rows: arena.put(rows.length ? rows : Int32Array.of(0)),
        gw: arena.put(Float64Array.from({ length: Math.max(1, count) }, () => rng.next() * 3)),
        gs: arena.put(Float64Array.from({ length: Math.max(1, count) }, () => rng.normal() * 1e3)),
        feats: arena.put(Int32Array.from({ length: nFeats }, (_, f) => nFeats - 1 - f)),
      };
      const a = arena.alloc(nFeats * BINS * 24), b = arena.alloc(nFeats * BINS * 24);
      arena.f64(a, nFeats * BINS * 3).fill(7);
      ts.histValue(p.codes, nRows, p.rows, count, p.gw, p.gs, p.feats, nFeats, a);
      wasm.histValue(p.codes, nRows, p.rows, count, p.gw, p.gs, p.feats, nFeats, b);
      expect(Array.from(arena.f64(b, nFeats * BINS * 3))).toEqual(Array.from(arena.f64(a, nFeats * BINS * 3)));
      let rowsSeen = 0;
      for (const v of arena.f64(a, nFeats * BINS * 3).filter((_, i) => i % 3 === 0)) rowsSeen += v;
      expect(rowsSeen).toBe(nFeats * count);
    });
  }
});
