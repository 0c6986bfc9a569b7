import { table } from 'arquero';
import { describe, expect, it } from 'vitest';
import { alignFrame } from '../../src/table/align-frame.js';
import { toFrame } from '../../src/table/to-frame.js';
import { readExtract } from '../../src/table/read-extract.js';
import type { CategoricalColumn, NumericColumn } from '../../src/table/frame.js';

const DATA = 'node_modules/vega-datasets/data';

const trained = toFrame([
  { region: 'north', spend: 10, active: true, opened: '2020-01-31' },
  { region: 'south', spend: 20, active: false, opened: '2021-06-01' },
]);
const features = trained.schema.columns;

describe('alignFrame(input, features)', () => {
  it('re-encodes categories with the model dictionary and counts unseen ones with examples', () => {
    const rows = [
      { region: 'south', spend: 5, active: true, opened: '2022-03-01' },
      { region: 'west', spend: 6, active: false, opened: '2022-03-02' },
      { region: 'east', spend: 7, active: true, opened: '2022-03-03' },
      { region: 'west', spend: 8, active: null, opened: null },
      { region: null, spend: 9, active: true, opened: '2022-03-04' },
    ];
    const { frame, report } = alignFrame(rows, features);
    const region = frame.columns[0] as CategoricalColumn;
    expect(region.categories).toEqual(['north', 'south']);
    expect(Array.from(region.codes)).toEqual([1, -1, -1, -1, -1]);
    expect(report.unseen).toEqual([{ column: 'region', rows: 3, distinct: 2, examples: ['west', 'east'] }]);
    expect(report.clean).toBe(false);
    expect(report.missingColumns).toEqual([]);
    expect(frame.schema.fingerprint).toBe(trained.schema.fingerprint);
    expect(frame.columns.map((c) => c.name)).toEqual(trained.columns.map((c) => c.name));
    // the date column is re-expanded into the model's parts
    expect(Array.from((frame.columns[3] as NumericColumn).values)).toEqual([2022, 2022, 2022, NaN, 2022]);
  });

  it('fills a missing column with missing values and reports it, listing extra columns', () => {
    const { frame, report } = alignFrame([{ region: 'north', active: true, opened: '2020-01-01', extra: 1 }], features);
    expect(Array.from((frame.columns[1] as NumericColumn).values)).toEqual([NaN]);
    expect(report.missingColumns).toEqual([{ column: 'spend', rows: 1 }]);
    expect(report.extraColumns).toEqual(['extra']);
  });

  it('reports every part of an absent date column', () => {
    const { report } = alignFrame([{ region: 'north', spend: 1, active: true }], features);
    expect(report.missingColumns.map((m) => m.column)).toEqual(['opened.year', 'opened.month', 'opened.day', 'opened.weekday', 'opened.dayOfYear', 'opened.epochDays']);
  });

  it('treats a column whose type changed as missing and says what it found', () => {
    const rows = [{ region: 'north', spend: 'ten', active: true, opened: '2020-01-01' }, { region: 'south', spend: null, active: true, opened: '2020-01-01' }];
    const { frame, report } = alignFrame(rows, features);
    expect(Array.from((frame.columns[1] as NumericColumn).values)).toEqual([NaN, NaN]);
    expect(report.typeChanges).toEqual([{ column: 'spend', expected: 'numeric', found: '1 texts', rows: 1 }]);
  });

  it('turns ±Infinity and a non-0/1 boolean into missing and reports them', () => {
    const rows = [{ region: 'north', spend: Infinity, active: 2, opened: '2020-01-01' }, { region: 'north', spend: 3, active: 1, opened: '2020-01-01' }];
    const { frame, report } = alignFrame(rows, features);
    expect(Array.from((frame.columns[1] as NumericColumn).values)).toEqual([NaN, 3]);
    expect(Array.from((frame.columns[2] as NumericColumn).values)).toEqual([NaN, 1]);
    expect(report.invalid).toEqual([{ column: 'spend', rows: 1, examples: ['Infinity'] }, { column: 'active', rows: 1, examples: ['2'] }]);
  });

  it('gives a clean report for a table shaped like the training one, and accepts a Frame', () => {
    const again = alignFrame(trained, features);
    expect(again.report.clean).toBe(true);
    expect(again.report.extraColumns).toEqual([]);
    expect(again.frame.columns).toEqual(trained.columns);
  });

  it('never throws for an empty table', () => {
    const { frame, report } = alignFrame(table({ region: [], spend: [] }), features);
    expect(frame.nRows).toBe(0);
    expect(report.missingColumns.map((m) => m.rows)).toEqual([0, 0, 0, 0, 0, 0, 0]);
  });

  // Palmer penguins (vega-datasets penguins.json): the Sex value "." is unseen by a model trained on the
  // rows read with "." as missing; exactly one row holds it.
  it('flags the one penguin whose Sex is "." as unseen', async () => {
    const model = toFrame(await readExtract(`${DATA}/penguins.json`, { missingText: ['', '.'] })).schema.columns;
    const { report } = alignFrame(await readExtract(`${DATA}/penguins.json`), model);
    expect(report.unseen).toEqual([{ column: 'Sex', rows: 1, distinct: 1, examples: ['.'] }]);
    expect(report.missingColumns).toEqual([]);
  });
});
