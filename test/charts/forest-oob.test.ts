/** Out-of-bag curves straight from fitted forests (seeded packhouse crates). */
import { describe, expect, it } from 'vitest';
import { chartOutOfBag, outOfBagRows } from '../../src/charts/forest-oob.js';
import { CoppiceError } from '../../src/errors.js';
import { fitForest } from '../../src/learn/ensemble/forest.js';
import { crateDataset } from './packhouse-data.js';
import { checkSpec } from './validate-spec.js';

type Spec = { encoding: { y: { title: string } }; title: { text: string } };

describe('outOfBagRows(input) / chartOutOfBag(input, options)', () => {
  const grades = crateDataset(200, 'grade');
  const a = fitForest(grades, { size: 12, featuresPerSplit: 2, seed: 1 });
  const b = fitForest(grades, { size: 12, featuresPerSplit: 4, seed: 1 });

  it('one row per recorded size with a finite error, tagged with the series name', () => {
    const rows = outOfBagRows({ two: a, four: b });
    const finite = (m: typeof a) => m.oobCurve.filter((p) => !Number.isNaN(p.error)).length;
    expect(rows).toHaveLength(finite(a) + finite(b));
    expect(rows.filter((r) => r.series === 'two').map((r) => r.error)).toEqual(a.oobCurve.filter((p) => !Number.isNaN(p.error)).map((p) => p.error));
    expect(outOfBagRows(a).every((r) => r.series === undefined)).toBe(true);
  });

  it('leaves out points recorded before any row was out-of-bag (error NaN)', () => {
    const fake = { ...a, oobCurve: [{ size: 1, error: NaN }, { size: 2, error: 0.3 }] };
    expect(outOfBagRows(fake)).toEqual([{ size: 2, error: 0.3 }]);
  });

  it('titles the error by task and validates', async () => {
    const spec = chartOutOfBag({ two: a, four: b });
    expect((spec as unknown as Spec).encoding.y.title).toBe('Out-of-bag error rate');
    expect((await checkSpec(spec)).warnings).toEqual([]);
    const shelf = fitForest(crateDataset(150, 'shelf'), { size: 6, seed: 2 });
    expect((chartOutOfBag(shelf) as unknown as Spec).title.text).toBe('Out-of-bag mean squared error by ensemble size');
  });

  it('refuses forests of different tasks in one chart', () => {
    const shelf = fitForest(crateDataset(100, 'shelf'), { size: 3, seed: 2 });
    expect(() => chartOutOfBag({ a, shelf })).toThrow(CoppiceError);
  });
});
