import { describe, expect, it } from 'vitest';
import { chartEnsembleSizeError, type EnsembleSizeRow } from '../../src/charts/ensemble-size.js';
import { CoppiceError } from '../../src/errors.js';
import { checkSpec } from './validate-spec.js';

type Spec = { layer: { mark: { opacity?: number }; transform?: unknown[] }[]; encoding: { y: { title: string; scale: { domain?: number[] } } }; title: { subtitle?: string } };

// error 0.5 at 1 tree falling to about 0.2: the first trees sit far above the rest
const rows: EnsembleSizeRow[] = Array.from({ length: 40 }, (_, i) => ({ size: i + 1, error: 0.2 + 0.3 / (i + 1) }));

describe('chartEnsembleSizeError(rows, { earlyTrees })', () => {
  it('capitalises the y-axis title like the x-axis title', () => {
    const spec = chartEnsembleSizeError(rows) as unknown as Spec;
    expect(spec.encoding.y.title).toBe('Out-of-bag error rate');
  });

  it('draws the first 10 trees faint and fits the y-axis to the larger ensembles, saying so', async () => {
    const spec = chartEnsembleSizeError(rows) as unknown as Spec;
    expect(spec.layer).toHaveLength(2);
    expect(spec.layer[0].mark.opacity).toBeLessThan(1);
    expect(spec.layer[1].transform).toEqual([{ filter: 'datum.size > 10' }]);
    expect(spec.encoding.y.scale.domain).toEqual([0.2 + 0.3 / 40, 0.2 + 0.3 / 11]);
    expect(spec.title.subtitle).toContain('the y-axis fits the larger ones');
    const { schema, warnings } = await checkSpec(spec as never);
    expect(schema).toEqual([]);
    expect(warnings).toEqual([]);
  });

  it('earlyTrees 0, or no size beyond it, draws every point alike with the scale from all data', () => {
    for (const spec of [chartEnsembleSizeError(rows, { earlyTrees: 0 }), chartEnsembleSizeError(rows.slice(0, 5))] as unknown as Spec[]) {
      expect(spec.layer).toHaveLength(1);
      expect(spec.encoding.y.scale.domain).toBeUndefined();
      expect(spec.title.subtitle).toBeUndefined();
    }
  });

  it('faint early trees inside the later range: no scale fitted, no clipping note', () => {
    const flat = rows.map((r) => ({ ...r, error: r.size <= 10 ? 0.25 : 0.2 + 0.1 * Math.sin(r.size) }));
    const spec = chartEnsembleSizeError(flat) as unknown as Spec;
    expect(spec.encoding.y.scale.domain).toBeUndefined();
    expect(spec.title.subtitle).not.toContain('y-axis');
  });

  it('rejects a negative or NaN earlyTrees', () => {
    expect(() => chartEnsembleSizeError(rows, { earlyTrees: -1 })).toThrow(CoppiceError);
    expect(() => chartEnsembleSizeError(rows, { earlyTrees: NaN })).toThrow(/earlyTrees/);
  });
});
