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
