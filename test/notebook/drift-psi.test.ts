import { describe, expect, it } from 'vitest';
import { categoricalDrift, columnDrift, driftBand, numericDrift, psiFromShares, PSI_FLOOR, quantileEdges } from '../../src/notebook/drift-psi.js';
import { profileColumn, type CategoricalProfile, type NumericProfile } from '../../src/notebook/record-profile.js';

// PSI definition: Σ (c − b) ln(c / b) over bins (population stability index as used in credit scoring; the
// formula and the 0.1 / 0.25 bands are common practice). Every expected value below is worked by hand.
const TOL = 1e-12; // arithmetic in doubles; the hand values are computed with the same Math.log

describe('psiFromShares(baseline, current)', () => {
  it('matches the hand arithmetic for two bins', () => {
    // (0.4 − 0.5) ln(0.4/0.5) + (0.6 − 0.5) ln(0.6/0.5)
    // = (−0.1)(−0.2231436) + (0.1)(0.1823216) = 0.02231436 + 0.01823216 = 0.04054651
    expect(psiFromShares([0.5, 0.5], [0.4, 0.6])).toBeCloseTo(0.04054651, 8);
  });
  it('is zero for equal shares and symmetric in its arguments', () => {
    expect(psiFromShares([0.2, 0.3, 0.5], [0.2, 0.3, 0.5])).toBe(0);
    expect(psiFromShares([0.2, 0.8], [0.6, 0.4])).toBeCloseTo(psiFromShares([0.6, 0.4], [0.2, 0.8]), 15);
  });
  it('floors empty bins so the index stays finite', () => {
    // bin 2 empty in the baseline: (0.5 − 1e-4) ln(0.5 / 1e-4) = 0.4999 × 8.5171932 = 4.2577449...
    const v = psiFromShares([1, 0], [0.5, 0.5]);
    const byHand = (0.5 - 1) * Math.log(0.5 / 1) + (0.5 - PSI_FLOOR) * Math.log(0.5 / PSI_FLOOR);
    expect(v).toBeCloseTo(byHand, 12);
    expect(Number.isFinite(v)).toBe(true);
  });
  it('rejects bin lists of different lengths', () => {
    expect(() => psiFromShares([1], [0.5, 0.5])).toThrow(RangeError);
  });
});

describe('driftBand(psi)', () => {
  it('uses the 0.1 / 0.25 bands (common practice)', () => {
    expect(driftBand(0)).toBe('stable');
    expect(driftBand(0.0999)).toBe('stable');
    expect(driftBand(0.1)).toBe('moderate');
    expect(driftBand(0.25)).toBe('moderate');
    expect(driftBand(0.2501)).toBe('major');
  });
});

describe('numericDrift(baseline, current, k)', () => {
  it('bins at the baseline median with a missing bin (hand example)', () => {
    const a = profileColumn([1, 2, 3, 4]) as NumericProfile;
    const b = profileColumn([1, 3, 4, 5, null]) as NumericProfile;
    expect(quantileEdges(a, 2)).toEqual([2]);
    const d = numericDrift(a, b, 2);
    // bins: ≤ 2 | > 2 | missing.  baseline 0.5, 0.5, 0 ; current 1/5, 3/5, 1/5
    expect(d.bins.map((x) => x.label)).toEqual(['≤ 2', '> 2', 'missing']);
    expect(d.bins.map((x) => x.baseline)).toEqual([0.5, 0.5, 0]);
    expect(d.bins[0].current).toBeCloseTo(0.2, 15);
    expect(d.bins[1].current).toBeCloseTo(0.6, 15);
    expect(d.bins[2].current).toBeCloseTo(0.2, 15);
    // (0.2−0.5)ln(0.2/0.5) = 0.2748872; (0.6−0.5)ln(0.6/0.5) = 0.0182322; (0.2−1e-4)ln(0.2/1e-4) = 1.5194204
    expect(d.psi).toBeCloseTo(0.2748872 + 0.0182322 + 1.5194204, 6);
    expect(d.psi).toBeCloseTo(1.8125398, 6);
    expect(d.band).toBe('major');
  });

  it('finds no drift between a column and itself, and drift after a shift', () => {
    const xs = Array.from({ length: 2000 }, (_, i) => (i * 7919) % 2000);
    const a = profileColumn(xs) as NumericProfile;
    expect(numericDrift(a, a).psi).toBeLessThan(TOL);
    const shifted = profileColumn(xs.map((x) => x + 400)) as NumericProfile; // a fifth of the range
    const d = numericDrift(a, shifted);
    expect(d.band).toBe('major'); // two deciles emptied, two new ones beyond the top edge
  });

  it('deduplicates repeated edges of a discrete column', () => {
    const a = profileColumn([0, 0, 0, 0, 0, 0, 0, 1, 1, 2]) as NumericProfile;
    expect(quantileEdges(a)).toEqual([0, 1]);
  });
});

describe('categoricalDrift(baseline, current)', () => {
  it('uses categories from both sides; a new category gets a floored baseline share', () => {
    const a = profileColumn(['x', 'x', 'y', 'y']) as CategoricalProfile;
    const b = profileColumn(['x', 'y', 'y', 'z']) as CategoricalProfile;
    const d = categoricalDrift(a, b);
    expect(d.bins.map((x) => x.label)).toEqual(['x', 'y', 'z']);
    // x: (0.25−0.5)ln(0.25/0.5) = 0.1732868 ; y: 0 ; z: (0.25−1e-4)ln(0.25/1e-4) = 0.2499 × 7.8240460 = 1.9552291
    expect(d.psi).toBeCloseTo(0.25 * Math.log(2) + (0.25 - 1e-4) * Math.log(2500), 12);
    expect(d.psi).toBeCloseTo(2.1285159, 6);
  });
});

describe('columnDrift(baseline, current)', () => {
  it('returns null when the kinds differ (a schema change, reported elsewhere)', () => {
    expect(columnDrift(profileColumn([1, 2]), profileColumn(['a', 'b']))).toBeNull();
    expect(columnDrift(profileColumn([1, 2]), profileColumn([true, false]))).toBeNull();
  });
  it('handles empty and all-missing columns', () => {
    const empty = profileColumn([]);
    const missing = profileColumn([null, null]);
    expect(columnDrift(empty, empty)?.psi).toBe(0);
    const d = columnDrift(profileColumn([1, 2]), missing);
    expect(d?.band).toBe('major'); // all rows moved to the missing bin
  });
});
