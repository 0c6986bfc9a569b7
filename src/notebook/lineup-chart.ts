/**
 * The lineup chart: one small panel per metric (its name and which way is better written above it), a
 * dot per model with its score beside it, the best model of each metric in the accent colour. A pure
 * function from rows to a vega-lite v5 spec, in the house look of src/charts.
 */
import { finishChart, type ChartSpec } from '../charts/spec.js';
import { ROLE } from '../charts/theme.js';
import { formatCell } from './format-cell.js';

/**
 * The spec for lineup `rows` (model name plus one number per metric); metrics a row has no number for
 * (a score that could not be computed) are left out of that panel.
 * @example
 * lineupChart([{ model: 'tree', accuracy: 0.9 }], ['accuracy'], { accuracy: true }, 'holdout');
 */
export function lineupChart(rows: readonly Record<string, number | string>[], metrics: readonly string[],
  higherIsBetter: Readonly<Record<string, boolean>>, title: string): ChartSpec {
  const values: { model: string; metric: string; value: number; label: string; best: boolean }[] = [];
  for (const m of metrics) {
    const scored = rows.filter((r) => typeof r[m] === 'number' && Number.isFinite(r[m] as number));
    const nums = scored.map((r) => r[m] as number);
    const best = nums.length ? (higherIsBetter[m] ? Math.max(...nums) : Math.min(...nums)) : NaN;
    const metric = `${m} · ${higherIsBetter[m] ? 'higher' : 'lower'} is better`;
    for (const r of scored) {
      values.push({ model: String(r.model), metric, value: r[m] as number, label: formatCell(r[m]), best: r[m] === best });
    }
  }
  const colour = { condition: { test: 'datum.best', value: ROLE.accent }, value: ROLE.primary };
  const ink = { condition: { test: 'datum.best', value: ROLE.accentText }, value: ROLE.primary }; // amber text darkened for contrast
  const x = { field: 'value', type: 'quantitative', title: null, scale: { zero: false, nice: false, padding: 16 }, axis: { tickCount: 5, grid: true } };
  const y = { field: 'model', type: 'nominal', title: null, sort: null, axis: { grid: false } };
  return finishChart({
    data: { values },
    facet: {
      row: {
        field: 'metric', type: 'nominal', title: null, sort: null,
        header: { labelAngle: 0, labelOrient: 'top', labelAnchor: 'start', labelAlign: 'left', labelFontWeight: 'bold', labelPadding: 6 },
      },
    },
    resolve: { scale: { x: 'independent' } },
    spacing: 18,
    spec: {
      width: 420,
      height: { step: 24 },
      layer: [
        { mark: { type: 'point', filled: true, size: 80 }, encoding: { x, y, color: colour, tooltip: [{ field: 'model' }, { field: 'value', format: '.4f' }] } },
        { mark: { type: 'text', align: 'left', dx: 9, baseline: 'middle' }, encoding: { x, y, text: { field: 'label' }, color: ink } },
      ],
    },
  }, title, 'Every model scored on the same rows; the best of each metric in amber');
}
