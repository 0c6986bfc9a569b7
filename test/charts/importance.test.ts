import { describe, expect, it } from 'vitest';
import { chartImportance } from '../../src/charts/importance.js';
import { CoppiceError } from '../../src/errors.js';

type Spec = { data: { values: { feature: string; label: string }[] }; layer: { encoding: { y?: { axis?: { labelPadding?: number } }; x?: { axis?: { format?: string } } } }[] };
const labels = (spec: unknown) => (spec as Spec).data.values.map((v) => v.label);

describe('chartImportance(rows, { valueFormat })', () => {
  it('shares of a whole (none negative, summing to 1) are written as percentages with one decimal', () => {
    const spec = chartImportance([{ feature: 'a', value: 0.6 }, { feature: 'b', value: 0.3 }, { feature: 'c', value: 0.1 }]);
    expect(labels(spec)).toEqual(['60.0%', '30.0%', '10.0%']);
    expect((spec as unknown as Spec).layer[0].encoding.x!.axis!.format).toBe('~%');
  });

  it('other values get the same decimals for all: three significant digits of the largest', () => {
    const spec = chartImportance([{ feature: 'a', value: 0.38 }, { feature: 'b', value: 0.0911 }, { feature: 'c', value: 0.0255 }]);
    expect(labels(spec)).toEqual(['0.380', '0.091', '0.026']);
    expect(labels(chartImportance([{ feature: 'a', value: 12.5 }, { feature: 'b', value: -0.26 }]))).toEqual(['12.5', '−0.3']);
  });

  it("valueFormat 'number' or 'share' overrides the guess; a bad value is refused", () => {
    const rows = [{ feature: 'a', value: 0.75 }, { feature: 'b', value: 0.25 }];
    expect(labels(chartImportance(rows, { valueFormat: 'number' }))).toEqual(['0.750', '0.250']);
    expect(labels(chartImportance([{ feature: 'a', value: 0.2 }], { valueFormat: 'share' }))).toEqual(['20.0%']);
    expect(() => chartImportance(rows, { valueFormat: 'pct' as 'share' })).toThrow(CoppiceError);
  });

  it('leaves room between the feature names and the axis', () => {
    const spec = chartImportance([{ feature: 'a', value: 1 }]) as unknown as Spec;
    expect(spec.layer[0].encoding.y!.axis!.labelPadding).toBe(8);
  });
});
