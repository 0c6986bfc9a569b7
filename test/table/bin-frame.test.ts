import { describe, expect, it } from 'vitest';
import { binFrame, binOfValue, categoryBins, MISSING_BIN } from '../../src/table/bin-frame.js';
import { binnedFrameFor, rememberBinnedFrame } from '../../src/table/bin-cache.js';
import { makeFrame } from '../learn/hist/make-frame.js';

describe('binOfValue(upper, x)', () => {
  it('finds the first bound >= x; NaN is the missing bin', () => {
    const u = Float64Array.of(1.5, 3.5, Infinity);
    expect([1, 1.5, 2, 3.5, 4, -1e300, 1e300].map((x) => binOfValue(u, x))).toEqual([0, 0, 1, 1, 2, 0, 2]);
    expect(binOfValue(u, NaN)).toBe(MISSING_BIN);
  });
});

describe('binFrame(frame, options)', () => {
  const frame = makeFrame({
    x: [3, 1, null, 2, 1],
    c: { cat: ['b', 'a', 'c', null, 'a'] },
    m: [null, null, null, null, null],
  });

  it('codes column-major with missing = 255', () => {
    const b = binFrame(frame);
    expect(b.nRows).toBe(5);
    expect(Array.from(b.codes.subarray(0, 5))).toEqual([2, 0, 255, 1, 0]);
    expect(Array.from(b.codes.subarray(5, 10))).toEqual([1, 0, 2, 255, 0]);
    expect(Array.from(b.codes.subarray(10, 15))).toEqual([255, 255, 255, 255, 255]);
    expect(b.features.map((f) => [f.kind, f.nBins])).toEqual([['numeric', 3], ['categorical', 3], ['numeric', 1]]);
    expect(Array.from(b.features[0].upper)).toEqual([1.5, 2.5, Infinity]);
  });

  it('an empty frame gives empty codes', () => {
    const b = binFrame(makeFrame({ x: [] }));
    expect(b.codes.length).toBe(0);
    expect(b.features[0].nBins).toBe(1);
  });

  it('rejects binLimit outside 2..255', () => {
    expect(() => binFrame(frame, { binLimit: 256 })).toThrow(/binLimit/);
    expect(() => binFrame(frame, { binLimit: 1 })).toThrow(/binLimit/);
  });
});

describe('categoryBins(column, limit)', () => {
  it('more categories than the limit: the most frequent keep a bin, the rest share the last', () => {
    const f = makeFrame({ c: { cat: ['a', 'b', 'b', 'c', 'c', 'c', 'd'] } });
    const col = f.columns[0];
    if (col.kind !== 'categorical') throw new Error('test setup');
    const { binOfCode, nBins } = categoryBins(col, 3);
    expect(nBins).toBe(3);
    // c (3 rows) and b (2 rows) keep bins in code order: b -> 0, c -> 1; a and d share bin 2
    expect(Array.from(binOfCode)).toEqual([2, 0, 1, 2]);
  });
});

describe('binnedFrameFor(frame, options)', () => {
  it('returns the cached binned frame for the same frame and options', () => {
    const f = makeFrame({ x: [1, 2, 3] });
    const a = binnedFrameFor(f);
    expect(binnedFrameFor(f)).toBe(a);
    expect(binnedFrameFor(f, { binLimit: 2 })).not.toBe(a);
  });

  it('shares bins between equal frames by fingerprint', () => {
    const f1 = makeFrame({ x: [1, 2, 3] }), f2 = makeFrame({ x: [1, 2, 3] });
    const a = binnedFrameFor(f1, { fingerprint: 'fp-1' });
    expect(binnedFrameFor(f2, { fingerprint: 'fp-1' })).toBe(a);
  });

  it('rememberBinnedFrame rejects a binned frame of another shape', () => {
    const f = makeFrame({ x: [1, 2, 3] });
    expect(() => rememberBinnedFrame(f, binFrame(makeFrame({ x: [1] })))).toThrow(/does not match/);
  });
});

describe('codeNumeric(values, upper, out)', () => {
  it('gives the same codes as binOfValue on uniform, skewed and tied data', async () => {
    const { codeNumeric } = await import('../../src/table/bin-frame.js');
    const { numericBounds } = await import('../../src/table/bin-edges.js');
    const { createRng } = await import('../../src/util/rng.js');
    const rng = createRng(8);
    const sets = [
      Float64Array.from({ length: 20000 }, () => rng.next()),
      Float64Array.from({ length: 20000 }, () => Math.exp(rng.normal() * 3)),
      Float64Array.from({ length: 20000 }, () => (rng.int(5) === 0 ? NaN : Math.round(rng.normal() * 100) / 10)),
    ];
    for (const xs of sets) {
      const upper = numericBounds(xs, { limit: 255, exactRows: 1 << 20, sketchK: 800 });
      const out = new Uint8Array(xs.length);
      codeNumeric(xs, upper, out);
      // also at the bounds themselves and their neighbours
      const edges = Float64Array.from(Array.from(upper.subarray(0, -1)).flatMap((u) => [u, u - Math.abs(u) * 1e-16, u + Math.abs(u) * 1e-15]));
      const eo = new Uint8Array(edges.length);
      codeNumeric(edges, upper, eo);
      expect(Array.from(out)).toEqual(Array.from(xs, (x) => binOfValue(upper, x)));
      expect(Array.from(eo)).toEqual(Array.from(edges, (x) => binOfValue(upper, x)));
    }
  });
});

describe('numericBounds on a large column with repeated values', () => {
  it('counting distinct values gives the same bounds as sorting', async () => {
    const { numericBounds, distinctCounts } = await import('../../src/table/bin-edges.js');
    const { createRng } = await import('../../src/util/rng.js');
    const rng = createRng(9);
    const xs = Float64Array.from({ length: 300_000 }, () => Math.round(rng.normal() * 300) / 10);
    const counted = numericBounds(xs, { limit: 255, exactRows: 1 << 20, sketchK: 800 });
    expect(distinctCounts(xs, 1 << 16)).not.toBeNull();
    // the same cut rule applied to a direct sort of the full column
    const sorted = xs.slice().sort();
    const vals: number[] = [], counts: number[] = [];
    for (const x of sorted) { if (vals.length && vals[vals.length - 1] === x) counts[counts.length - 1]++; else { vals.push(x); counts.push(1); } }
    const { equalCountCuts, midpoint } = await import('../../src/table/bin-edges.js');
    const cuts = equalCountCuts(Float64Array.from(counts), 255);
    expect(Array.from(counted.subarray(0, -1))).toEqual(cuts.map((j) => midpoint(vals[j], vals[j + 1])));
  });
});
