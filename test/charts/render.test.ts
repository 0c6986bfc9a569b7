import { describe, expect, it } from 'vitest';
import { chartImportance } from '../../src/charts/importance.js';
import { findFonts, renderPng } from '../../src/charts/render-png.js';
import { renderSvg, renderSvgWithWarnings } from '../../src/charts/render-svg.js';
import type { ChartSpec } from '../../src/charts/spec.js';
import { CoppiceError } from '../../src/errors.js';

const spec = chartImportance([{ feature: 'bruise_score', value: 0.2 }, { feature: 'variety', value: 0.05 }]);
// vega-lite warns that strokeDash cannot be encoded on a rect mark.
const warns = { data: { values: [{ a: 1, b: 2 }] }, mark: 'rect', encoding: { x: { field: 'a', type: 'quantitative' }, strokeDash: { value: [2, 2] } } } as unknown as ChartSpec;

describe('renderSvg(spec)', () => {
  it('returns an SVG document containing the chart text', async () => {
    const svg = await renderSvg(spec);
    expect(svg.startsWith('<svg')).toBe(true);
    expect(svg).toContain('bruise_score');
    expect(svg).toContain('Feature importance');
  });
  it('throws a CoppiceError listing the warnings vega-lite logged, or returns them on request', async () => {
    await expect(renderSvg(warns)).rejects.toThrow(CoppiceError);
    await expect(renderSvg(warns)).rejects.toThrow(/strokeDash/);
    const { svg, warnings } = await renderSvgWithWarnings(warns);
    expect(svg.startsWith('<svg')).toBe(true);
    expect(warnings.some((w) => w.includes('strokeDash'))).toBe(true);
    await expect(renderSvg(warns, { warnings: 'return' })).resolves.toContain('<svg');
  });
  it('throws a CoppiceError for a spec vega-lite cannot compile', async () => {
    await expect(renderSvg({ mark: 'nonsense' } as unknown as ChartSpec)).rejects.toThrow(CoppiceError);
  });
});

describe('renderPng(spec)', () => {
  it('returns PNG bytes (signature 89 50 4E 47) at the requested scale', async () => {
    const one = await renderPng(spec, { scale: 1 });
    const two = await renderPng(spec, { scale: 2 });
    expect(Array.from(one.slice(0, 4))).toEqual([0x89, 0x50, 0x4e, 0x47]);
    const width = (b: Uint8Array) => new DataView(b.buffer, b.byteOffset).getUint32(16);
    expect(width(two)).toBeGreaterThan(1.9 * width(one));
  });
  it('findFonts() finds a font file on this machine', () => {
    const { files, family } = findFonts();
    expect(files.length).toBeGreaterThan(0);
    expect(family).toBeDefined();
  });
});
