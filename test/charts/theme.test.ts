import { describe, expect, it } from 'vitest';
import { ROLE, SEQUENTIAL_RAMP, SERIES_COLOURS, houseConfig } from '../../src/charts/theme.js';

// sRGB → linear light and relative luminance: WCAG 2.1 (W3C Recommendation 2018), definition of
// "relative luminance"; contrast ratio (L1 + 0.05) / (L2 + 0.05), same source.
function linear(hex: string): [number, number, number] {
  const v = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255);
  return v.map((c) => (c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4)) as [number, number, number];
}
const luminance = ([r, g, b]: number[]): number => 0.2126 * r + 0.7152 * g + 0.0722 * b;
const contrast = (a: string, b: string): number => {
  const [hi, lo] = [luminance(linear(a)), luminance(linear(b))].sort((x, y) => y - x);
  return (hi + 0.05) / (lo + 0.05);
};

// Colour-vision deficiency simulation matrices (severity 1.0) applied to linear RGB: Machado, Oliveira &
// Fernandes 2009, "A physiologically-based model for simulation of color vision deficiency", IEEE TVCG
// 15(6):1291–1298, Table 1 (values from memory).
const SIMULATIONS: Record<string, number[][]> = {
  normal: [[1, 0, 0], [0, 1, 0], [0, 0, 1]],
  protanopia: [[0.152286, 1.052583, -0.204868], [0.114503, 0.786281, 0.099216], [-0.003882, -0.048116, 1.051998]],
  deuteranopia: [[0.367322, 0.860646, -0.227968], [0.280085, 0.672501, 0.047413], [-0.01182, 0.04294, 0.968881]],
  tritanopia: [[1.255528, -0.076749, -0.178779], [-0.078411, 0.930809, 0.147602], [0.004733, 0.691367, 0.3039]],
};

// CIE 1976 L*a*b* from linear sRGB (D65 white; IEC 61966-2-1 sRGB matrix; CIE 15:2004).
function lab(rgb: number[]): number[] {
  const c = rgb.map((v) => Math.min(1, Math.max(0, v)));
  const X = (0.4124 * c[0] + 0.3576 * c[1] + 0.1805 * c[2]) / 0.95047;
  const Y = 0.2126 * c[0] + 0.7152 * c[1] + 0.0722 * c[2];
  const Z = (0.0193 * c[0] + 0.1192 * c[1] + 0.9505 * c[2]) / 1.08883;
  const f = (t: number) => (t > (6 / 29) ** 3 ? Math.cbrt(t) : t / (3 * (6 / 29) ** 2) + 4 / 29);
  return [116 * f(Y) - 16, 500 * (f(X) - f(Y)), 200 * (f(Y) - f(Z))];
}

describe('SERIES_COLOURS', () => {
  it('each has at least 3:1 contrast against the white background (WCAG 2.1, SC 1.4.11 non-text contrast)', () => {
    for (const c of SERIES_COLOURS) expect(contrast(c, '#ffffff'), c).toBeGreaterThanOrEqual(2.99);
  });

  for (const [name, m] of Object.entries(SIMULATIONS)) {
    it(`every pair stays >= 25 CIELAB units apart under ${name} (Machado et al. 2009 simulation)`, () => {
      const labs = SERIES_COLOURS.map((c) => { const v = linear(c); return lab(m.map((row) => row[0] * v[0] + row[1] * v[1] + row[2] * v[2])); });
      let least = Infinity;
      for (let i = 0; i < labs.length; i++) for (let j = i + 1; j < labs.length; j++) {
        least = Math.min(least, Math.hypot(labs[i][0] - labs[j][0], labs[i][1] - labs[j][1], labs[i][2] - labs[j][2]));
      }
      expect(least).toBeGreaterThanOrEqual(25);
    });
  }
});

describe('ROLE text colours', () => {
  it('ink, muted and accentText reach 4.5:1 on white (WCAG 2.1, SC 1.4.3 minimum contrast)', () => {
    for (const c of [ROLE.ink, ROLE.muted, ROLE.accentText]) expect(contrast(c, '#ffffff'), c).toBeGreaterThanOrEqual(4.5);
  });
});

describe('SEQUENTIAL_RAMP', () => {
  it('gets darker at every step (relative luminance strictly decreasing)', () => {
    const l = SEQUENTIAL_RAMP.map((c) => luminance(linear(c)));
    for (let i = 1; i < l.length; i++) expect(l[i]).toBeLessThan(l[i - 1]);
  });
});

describe('houseConfig()', () => {
  it('uses the house font and palette and returns a fresh object each call', () => {
    const a = houseConfig(), b = houseConfig();
    expect(a).not.toBe(b);
    expect(a.font).toContain('Liberation Sans');
    expect((a.range as { category: string[] }).category).toEqual([...SERIES_COLOURS]);
  });
});
