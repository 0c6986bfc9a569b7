/**
 * The lineup chart: one small panel per metric, a dot per model, the best model's dot marked. A pure
 * function from rows to a vega-lite v5 spec.
 */
import type { ChartSpec } from '../charts/spec.js';

/**
 * The spec for lineup `rows` (model name plus one number per metric).
 * @example
 * lineupChart([{ model: 'tree', accuracy: 0.9 }], ['accuracy'], { accuracy: true }, 'holdout');
 */
export function lineupChart(rows: readonly Record<string, number | string>[], metrics: readonly string[],
  higherIsBetter: Readonly<Record<string, boolean>>, title: string): ChartSpec {
  const values: { model: string; metric: string; value: number; best: boolean }[] = [];
  for (const m of metrics) {
    const scored = rows.filter((r) => typeof r[m] === 'number' && Number.isFinite(r[m] as number));
    const nums = scored.map((r) => r[m] as number);
    const best = nums.length ? (higherIsBetter[m] ? Math.max(...nums) : Math.min(...nums)) : NaN;
    for (const r of scored) values.push({ model: String(r.model), metric: `${m} (${higherIsBetter[m] ? 'higher' : 'lower'} is better)`, value: r[m] as number, best: r[m] === best });
  }
  return {
    $schema: 'https://vega.github.io/schema/vega-lite/v5.json',
    title,
    data: { values },
    facet: { row: { field: 'metric', type: 'nominal', title: null } },
    resolve: { scale: { x: 'independent' } },
    spec: {
      width: 360,
      height: { step: 22 },
      mark: { type: 'point', filled: true, size: 80 },
      encoding: {
        y: { field: 'model', type: 'nominal', title: null, sort: null },
        x: { field: 'value', type: 'quantitative', title: null, scale: { zero: false } },
        color: { field: 'best', type: 'nominal', title: 'best', scale: { domain: [true, false], range: ['#d95f02', '#7570b3'] } },
        tooltip: [{ field: 'model' }, { field: 'value', format: '.4f' }],
      },
    },
  } as ChartSpec;
}
