/**
 * lineupChart: a pure spec builder. Checked against the vega-lite v5 JSON schema (vega-lite's own
 * build/vega-lite-schema.json, via test/charts/validate-spec.ts) and rendered by vega without warnings.
 */
import { describe, expect, it } from 'vitest';
import { lineupChart } from '../../src/notebook/lineup-chart.js';
import { checkSpec } from '../charts/validate-spec.js';

const rows = [
  { model: 'small', accuracy: 0.9535, logLoss: 0.1078 },
  { model: 'forest', accuracy: 0.9535, logLoss: 0.2107 },
  { model: 'boosted', accuracy: 0.9884, logLoss: 'n/a: no probabilities' },
];

describe('lineupChart(rows, metrics, higherIsBetter, title)', () => {
  it('marks the best model of each metric, labels each dot, and leaves out scores that are not numbers', () => {
    const spec = lineupChart(rows, ['accuracy', 'logLoss'], { accuracy: true, logLoss: false }, 'holdout') as unknown as { data: { values: Record<string, unknown>[] } };
    expect(spec.data.values).toEqual([
      { model: 'small', metric: 'accuracy · higher is better', value: 0.9535, label: '0.9535', best: false },
      { model: 'forest', metric: 'accuracy · higher is better', value: 0.9535, label: '0.9535', best: false },
      { model: 'boosted', metric: 'accuracy · higher is better', value: 0.9884, label: '0.9884', best: true },
      { model: 'small', metric: 'logLoss · lower is better', value: 0.1078, label: '0.1078', best: true },
      { model: 'forest', metric: 'logLoss · lower is better', value: 0.2107, label: '0.2107', best: false },
    ]);
  });

  it('is a valid vega-lite v5 spec that renders without warnings', async () => {
    const { schema, warnings, svg } = await checkSpec(lineupChart(rows, ['accuracy', 'logLoss'], { accuracy: true, logLoss: false }, 'holdout'));
    expect(schema).toEqual([]);
    expect(warnings).toEqual([]);
    expect(svg).toContain('accuracy · higher is better');
  });

  it('draws ties as best for every tied model, and an empty lineup without failing', async () => {
    const tie = lineupChart([{ model: 'a', r: 1 }, { model: 'b', r: 1 }], ['r'], { r: true }, 't') as unknown as { data: { values: { best: boolean }[] } };
    expect(tie.data.values.map((v) => v.best)).toEqual([true, true]);
    const { schema, warnings } = await checkSpec(lineupChart([], ['accuracy'], { accuracy: true }, 'empty'));
    expect(schema).toEqual([]);
    expect(warnings).toEqual([]);
  });
});
