import { describe, expect, it } from 'vitest';
import { drawWeightedCounts } from '../../../src/learn/ensemble/weighted-draw.js';
import { drawSubsampleMask } from '../../../src/learn/ensemble/subsample.js';
import { createRng } from '../../../src/util/rng.js';

describe('drawWeightedCounts(weights, rng, size)', () => {
  it('draws rows in proportion to weight; weight 0 never drawn', () => {
    const c = drawWeightedCounts(new Float64Array([0, 1, 3]), createRng(5), 40_000);
    expect(c[0]).toBe(0);
    // expected share of row 2 is 3/4; binomial sd at 40,000 draws is sqrt(0.75·0.25/40000) ≈ 0.0022 (4 sd bound)
    expect(Math.abs(c[2] / 40_000 - 0.75)).toBeLessThan(4 * 0.0022);
  });
  it('rejects negative, NaN or all-zero weights', () => {
    expect(() => drawWeightedCounts(new Float64Array([1, -1]), createRng(1))).toThrow(/weight -1/);
    expect(() => drawWeightedCounts(new Float64Array([NaN]), createRng(1))).toThrow(/NaN/);
    expect(() => drawWeightedCounts(new Float64Array([0, 0]), createRng(1))).toThrow(/sum to 0/);
  });
});

describe('drawSubsampleMask(n, fraction, rng)', () => {
  it('keeps exactly floor(fraction·n) rows, at least one', () => {
    const m = drawSubsampleMask(101, 0.5, createRng(9));
    expect(m.reduce((a, b) => a + b, 0)).toBe(50);
    expect(drawSubsampleMask(3, 0.01, createRng(9)).reduce((a, b) => a + b, 0)).toBe(1);
    expect(Array.from(drawSubsampleMask(4, 1, createRng(9)))).toEqual([1, 1, 1, 1]);
  });
  it('each row is kept with probability = fraction (selection sampling is uniform)', () => {
    const hits = new Float64Array(10);
    for (let r = 0; r < 20_000; r++) drawSubsampleMask(10, 0.3, createRng(r)).forEach((v, i) => { hits[i] += v; });
    // binomial sd of a share 0.3 over 20,000 draws ≈ 0.0032; 4 sd bound
    for (const h of hits) expect(Math.abs(h / 20_000 - 0.3)).toBeLessThan(0.013);
  });
  it('drawSubsampleMask(n, fraction, rng, out) overwrites a reused buffer with the same draw', () => {
    const out = new Uint8Array(50).fill(1);
    expect(drawSubsampleMask(50, 0.3, createRng(4), out)).toBe(out);
    expect(Array.from(out)).toEqual(Array.from(drawSubsampleMask(50, 0.3, createRng(4))));
    expect(() => drawSubsampleMask(50, 0.3, createRng(4), new Uint8Array(3))).toThrow(/out/);
  });
  it('rejects a fraction outside (0, 1]', () => {
    expect(() => drawSubsampleMask(5, 0, createRng(1))).toThrow(/rowFraction/);
    expect(() => drawSubsampleMask(5, 1.5, createRng(1))).toThrow(/rowFraction/);
  });
});
