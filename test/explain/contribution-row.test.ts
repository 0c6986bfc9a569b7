/** contributionRow: one row of contributionsOf in the walk shape the contributions chart draws. */
import { describe, expect, it } from 'vitest';
import { contributionRow } from '../../src/explain/contribution-row.js';
import { contributionsOf } from '../../src/explain/contributions.js';
import { fitTree } from '../../src/learn/tree/fit-tree.js';
import { predictFrame } from '../../src/learn/predict.js';
import { orchard } from './fixtures.js';

describe('contributionRow(contributions, frame, i, output?)', () => {
  const data = orchard(120, 61, 'class');
  const model = fitTree(data, { depthLimit: 4 });
  const c = contributionsOf(model, data.features, { rows: [3, 9] });

  it('expected + Σ contributions = output; feature values read from the frame (labels, NaN → null)', () => {
    const w = contributionRow(c, data.features, 1, 'watch');
    expect(w.expected + w.contributions.reduce((a, b) => a + b.contribution, 0)).toBeCloseTo(w.output, 12);
    const variety = data.features.columns[1] as { codes: Int32Array; categories: readonly string[] };
    expect(w.contributions[1].value).toBe(variety.codes[9] < 0 ? null : variety.categories[variety.codes[9]]);
    expect(w.output).toBeCloseTo(predictFrame(model, data.features).proba[9 * 3 + 1], 12);
  });
  it('defaults to the last output; rejects an unknown output and a row out of range', () => {
    expect(contributionRow(c, data.features, 0).output).toBe(c.outputs[2][0]);
    expect(() => contributionRow(c, data.features, 0, 'rotten')).toThrow(/output/);
    expect(() => contributionRow(c, data.features, 2)).toThrow(/row/);
  });
});
