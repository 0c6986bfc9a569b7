import { describe, expect, it } from 'vitest';
import { distinctCounts } from '../../src/table/bin-edges.js';
import { createRng } from '../../src/util/rng.js';

// Reference: counting with a JavaScript Map (SameValueZero keys, so -0 and 0 are one key) and sorting.
function byMap(xs: Float64Array): { values: number[]; counts: number[] } {
  const m = new Map<number, number>();
  for (const x of xs) if (x === x) m.set(x, (m.get(x) ?? 0) + 1);
  const values = [...m.keys()].sort((a, b) => a - b);
  return { values, counts: values.map((v) => m.get(v) as number) };
}

describe('distinctCounts(values, cap)', () => {
  it('equals a Map count on repeated values, with NaN skipped, ±0 merged and ±Infinity kept', () => {
    const rng = createRng(4);
    const xs = Float64Array.from({ length: 50_000 }, () => Math.round(rng.normal() * 2000) / 10);
    xs[3] = NaN; xs[4] = -0; xs[5] = 0; xs[6] = Infinity; xs[7] = -Infinity; xs[8] = Infinity;
    const got = distinctCounts(xs, 1 << 16);
    const want = byMap(xs);
    expect(got).not.toBeNull();
    expect(Array.from(got?.values ?? [])).toEqual(want.values);
    expect(Array.from(got?.counts ?? [])).toEqual(want.counts);
    expect(Object.is(got?.values[want.values.indexOf(0)], 0)).toBe(true);
  });

  it('returns null past the cap, and empty arrays for an all-missing column', () => {
    expect(distinctCounts(Float64Array.of(1, 2, 3, 2), 2)).toBeNull();
    expect(Array.from(distinctCounts(Float64Array.of(1, 2, 3, 2), 3)?.counts ?? [])).toEqual([1, 2, 1]);
    const empty = distinctCounts(Float64Array.of(NaN, NaN), 10);
    expect(empty?.values.length).toBe(0);
  });
});
