import { describe, expect, it } from 'vitest';
import { Arena } from '../../src/kernels/arena.js';
import { BINS, MISSING } from '../../src/kernels/layout.js';
import { scanValueListTs, scanValueTs } from '../../src/kernels/ts-scan.js';
import { tsKernels } from '../../src/kernels/ts-kernels.js';
import { wasmKernels } from '../../src/kernels/wasm-kernels.js';
import { createRng } from '../../src/util/rng.js';

const arena = new Arena();
const sets = [tsKernels(arena), wasmKernels(arena)].filter((k) => k !== null);

describe('scanValueListTs(buf, block, bins, nList, nBins, mean, leafRows, leafWeight, tol, out)', () => {
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
      scanValueListTs(arena.buffer, block, list, 0, list.length, nBins, mean, leafRows, leafWeight, tol, out2);
      const got = Array.from(arena.f64(out2, 8));
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
});
