import { describe, expect, it } from 'vitest';
import { inferProfileKind, profileColumn, quantileOf, shareAtOrBelow, type NumericProfile } from '../../src/notebook/record-profile.js';

// Hand-worked distribution functions of tiny inputs (definitions: empirical distribution function, common practice).
describe('profileColumn(values)', () => {
  it('keeps few distinct numbers exactly', () => {
    const p = profileColumn([3, 1, 2, 2, null, NaN]) as NumericProfile;
    // non-missing sorted: 1 2 2 3 -> F(1)=1/4, F(2)=3/4, F(3)=1
    expect(p).toMatchObject({ kind: 'numeric', rows: 6, missing: 2, points: [1, 2, 3], cum: [0.25, 0.75, 1], exact: true, mean: 2 });
    expect(shareAtOrBelow(p, 0.5)).toBe(0);
    expect(shareAtOrBelow(p, 2)).toBe(0.75);
    expect(shareAtOrBelow(p, 2.9)).toBe(0.75);
    expect(shareAtOrBelow(p, 99)).toBe(1);
    expect(quantileOf(p, 0.5)).toBe(2);
    expect(quantileOf(p, 0.25)).toBe(1);
  });

  it('sketches many distinct numbers with interpolated quantiles', () => {
    const values = Array.from({ length: 10001 }, (_, i) => i); // 0..10000 uniform
    const p = profileColumn(values, { exactLimit: 100, sketchPoints: 100 }) as NumericProfile;
    expect(p.exact).toBe(false);
    expect(p.points).toHaveLength(101);
    expect(p.points[50]).toBe(5000);
    expect(shareAtOrBelow(p, 2500)).toBeCloseTo(0.25, 10);
    expect(shareAtOrBelow(p, 2550)).toBeCloseTo(0.255, 10); // halfway between the 25% and 26% points
    expect(quantileOf(p, 0.1)).toBeCloseTo(1000, 10);
  });

  it('counts categories and lumps those past the limit', () => {
    const p = profileColumn(['a', 'b', 'a', 'c', '', null, 'c', 'a'], { categoryLimit: 2 });
    expect(p).toEqual({ kind: 'categorical', rows: 8, missing: 2, counts: { a: 3, c: 2 }, otherCount: 1 });
  });

  it('profiles booleans, dates and empty or all-missing columns', () => {
    expect(profileColumn([true, false, true])).toMatchObject({ kind: 'boolean', points: [0, 1], cum: [1 / 3, 1] });
    expect(inferProfileKind(['2024-01-02', '2024-03-04T10:00:00Z'])).toBe('date');
    const d = profileColumn([new Date(Date.UTC(1970, 0, 2))]) as NumericProfile;
    expect(d.points).toEqual([1]); // epoch days
    expect(profileColumn([])).toMatchObject({ rows: 0, missing: 0, points: [], mean: NaN });
    const m = profileColumn([null, null]) as NumericProfile;
    expect(m).toMatchObject({ rows: 2, missing: 2, points: [] });
    expect(shareAtOrBelow(m, 0)).toBe(0);
    expect(quantileOf(m, 0.5)).toBeNaN();
  });
});
