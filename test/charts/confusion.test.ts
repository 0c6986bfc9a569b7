import { describe, expect, it } from 'vitest';
import { confusionTable } from '../../src/assess/metrics/confusion-table.js';
import { chartConfusion, confusionFromRows } from '../../src/charts/confusion.js';
import { CoppiceError } from '../../src/errors.js';

type Spec = { data: { values: { count: number; text: string; shareText: string }[] }; layer: { transform?: { filter: string }[]; mark: { color?: string } }[] };

// actual [0, 0, 1, 1, 2], predicted [0, 1, 1, 1, 2]: hand-counted matrix [[1,1,0],[0,2,0],[0,0,1]]
const actual = [0, 0, 1, 1, 2], predicted = [0, 1, 1, 1, 2];
const classes = ['stay', 'leave', 'paused'];

describe('chartConfusion(confusionTable(...)) / confusionFromRows(rows)', () => {
  it('takes the rows of confusionTable as they are: the same chart as the counts matrix', () => {
    const rows = confusionTable(actual, predicted, { classes });
    expect(confusionFromRows(rows)).toEqual({ classes, counts: Float64Array.of(1, 1, 0, 0, 2, 0, 0, 0, 1) });
    expect(chartConfusion(rows)).toEqual(chartConfusion({ classes, counts: [[1, 1, 0], [0, 2, 0], [0, 0, 1]] }));
  });

  it('a pair with no row counts 0; a class only ever predicted still gets its column', () => {
    const m = confusionFromRows([{ actual: 'a', predicted: 'a', count: 3 }, { actual: 'a', predicted: 'b', count: 1 }]);
    expect(m.classes).toEqual(['a', 'b']);
    expect(Array.from(m.counts as Float64Array)).toEqual([3, 1, 0, 0]);
  });

  it('rejects a repeated pair and a NaN count', () => {
    const dup = [{ actual: 'a', predicted: 'a', count: 1 }, { actual: 'a', predicted: 'a', count: 2 }];
    expect(() => confusionFromRows(dup)).toThrow(CoppiceError);
    expect(() => confusionFromRows([{ actual: 'a', predicted: 'a', count: NaN }])).toThrow(/count of row 0/);
  });

  it('empty cells show a faint 0 and no share; filled cells show count and share', () => {
    const spec = chartConfusion({ classes, counts: [[1, 1, 0], [0, 2, 0], [0, 0, 1]] }) as unknown as Spec;
    const empty = spec.data.values.filter((c) => c.count === 0);
    expect(empty).toHaveLength(5);
    expect(empty.every((c) => c.text === '0' && c.shareText === '')).toBe(true);
    expect(spec.data.values[0]).toMatchObject({ text: '1', shareText: '50%' });
    const faint = spec.layer.find((l) => l.transform?.[0].filter === 'datum.count === 0')!;
    expect(faint.mark.color).toBe('#9aa1ad');
  });
});
