/**
 * Charts straight from assessment results: a real `searchGrid` and a real `biasVariance` over `fitTree` on
 * seeded packhouse crates, drawn without glue code.
 */
import { describe, expect, it } from 'vitest';
import { biasVariance } from '../../src/assess/bias-variance.js';
import { searchGrid } from '../../src/assess/search-settings.js';
import { chartBiasVarianceResult, chartSearch } from '../../src/charts/from-results.js';
import { CoppiceError } from '../../src/errors.js';
import { fitTree } from '../../src/learn/tree/fit-tree.js';
import { crateDataset } from './packhouse-data.js';
import { checkSpec } from './validate-spec.js';

type Values = { values: Record<string, unknown>[] };
type Layer = { data?: Values; layer?: Layer[]; mark?: unknown };
type Spec = { data?: Values; layer: Layer[]; title: { text: string } };

/** Every data row the spec carries, from all layers. */
function allRows(spec: unknown): Record<string, unknown>[] {
  const out: Record<string, unknown>[] = [];
  const walk = (node: Layer & { data?: Values }) => { out.push(...(node.data?.values ?? [])); node.layer?.forEach(walk); };
  walk(spec as Layer);
  return out;
}

describe('chartSearch(result, setting, options)', () => {
  const data = crateDataset(240, 'shelf');
  const found = searchGrid(data, (train, s, ctx) => fitTree(train, { depthLimit: s.depthLimit as number, seed: ctx.seed }),
    { depthLimit: [1, 2, 4, 8] }, { metric: 'rmse', split: { method: 'folds', k: 3 }, seed: 5, complexity: (s) => s.depthLimit as number });

  it('one point per setting and fold with that fold\'s score, and the chosen value marked', async () => {
    const spec = chartSearch(found, 'depthLimit');
    const rows = allRows(spec);
    for (const r of found.table) {
      expect(rows.some((p) => p.value === r.depthLimit && p.fold === String(r.fold) && p.score === r.score)).toBe(true);
    }
    const marker = rows.find((p) => typeof p.label === 'string' && p.label.startsWith('chosen '))!;
    expect(marker.x).toBe(found.best.values.depthLimit);
    const { schema, warnings } = await checkSpec(spec);
    expect(schema).toEqual([]);
    expect(warnings).toEqual([]);
  });

  it("pick 'withinOneSe' marks the one-standard-error choice", () => {
    const rows = allRows(chartSearch(found, 'depthLimit', { pick: 'withinOneSe' }));
    const marker = rows.find((p) => typeof p.label === 'string' && p.label.startsWith('chosen '))!;
    expect(marker.x).toBe(found.withinOneSe!.values.depthLimit);
    expect(marker.label).toContain(`chosen ${found.withinOneSe!.values.depthLimit} `);
  });

  it('refuses a setting that was not searched', () => {
    expect(() => chartSearch(found, 'leafRows')).toThrow(CoppiceError);
  });
});

describe('chartBiasVarianceResult(rows, complexity, options)', () => {
  const train = crateDataset(160, 'shelf'), test = crateDataset(80, 'shelf', 2024, 160);
  const parts = biasVariance(train, test, (d, s) => fitTree(d, { depthLimit: s.depthLimit as number }),
    [1, 3, 6].map((depthLimit) => ({ depthLimit })), { resamples: 6, seed: 2 });

  it('regression: error, bias² and variance at each depth, equal to the result rows', async () => {
    const spec = chartBiasVarianceResult(parts, 'depthLimit');
    const rows = allRows(spec).filter((r) => typeof r.complexity === 'number' && typeof r.value === 'number');
    for (const p of parts) {
      const at = rows.filter((r) => r.complexity === p.depthLimit);
      expect(at.map((r) => r.value)).toEqual(expect.arrayContaining([p.mse, p.biasSquared, p.variance]));
    }
    const { schema, warnings } = await checkSpec(spec);
    expect(schema).toEqual([]);
    expect(warnings).toEqual([]);
  });

  it('zero-one loss rows (class target) are drawn as shares of rows', () => {
    const g = crateDataset(120, 'grade'), gt = crateDataset(60, 'grade', 2024, 120);
    const zo = biasVariance(g, gt, (d, s) => fitTree(d, { depthLimit: s.depthLimit as number }), [{ depthLimit: 1 }, { depthLimit: 4 }], { resamples: 4 });
    const spec = chartBiasVarianceResult(zo, 'depthLimit');
    expect(JSON.stringify(spec)).toContain('zero-one loss (share of rows)');
    const rows = allRows(spec).filter((r) => r.complexity === 4 && typeof r.value === 'number');
    // Domingos (2000): loss = bias + net variance, so the drawn parts add up to the drawn error.
    expect(rows.map((r) => r.value)).toEqual(expect.arrayContaining([zo[1].loss, zo[1].bias, zo[1].netVariance]));
    expect((zo[1].bias as number) + (zo[1].netVariance as number)).toBeCloseTo(zo[1].loss as number, 12);
  });

  it('refuses a complexity that is not a numeric setting of every row', () => {
    expect(() => chartBiasVarianceResult(parts, 'leafRows')).toThrow(CoppiceError);
  });
});
