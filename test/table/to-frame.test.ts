import { table } from 'arquero';
import { describe, expect, it } from 'vitest';
import { readExtract } from '../../src/table/read-extract.js';
import { toFrame } from '../../src/table/to-frame.js';
import { schemaFingerprint } from '../../src/table/fingerprint.js';
import type { CategoricalColumn, Column, Frame, NumericColumn } from '../../src/table/frame.js';

const DATA = 'node_modules/vega-datasets/data';

function col(frame: Frame, name: string): Column {
  const c = frame.columns.find((x) => x.name === name);
  if (!c) throw new Error(`no column ${name}`);
  return c;
}
const num = (f: Frame, n: string) => col(f, n) as NumericColumn;
const cat = (f: Frame, n: string) => col(f, n) as CategoricalColumn;

describe('toFrame(rows)', () => {
  it('types numbers, texts and booleans, with missing as NaN / -1', () => {
    const f = toFrame([
      { spend: 12.5, region: 'south', active: true },
      { spend: null, region: 'north', active: false },
      { spend: NaN, region: '', active: null },
      { spend: '', region: undefined, active: true },
      { region: 'north' },
    ]);
    expect(f.nRows).toBe(5);
    expect(Array.from(num(f, 'spend').values)).toEqual([12.5, NaN, NaN, NaN, NaN]);
    expect(num(f, 'spend').kind).toBe('numeric');
    expect(cat(f, 'region').categories).toEqual(['north', 'south']);
    expect(Array.from(cat(f, 'region').codes)).toEqual([1, 0, -1, -1, 0]);
    expect(num(f, 'active').kind).toBe('boolean');
    expect(Array.from(num(f, 'active').values)).toEqual([1, 0, NaN, 1, NaN]);
  });

  it('sorts the dictionary by string value (code-unit order)', () => {
    const f = toFrame([{ c: 'b' }, { c: 'B' }, { c: 'a' }, { c: 'b' }]);
    expect(cat(f, 'c').categories).toEqual(['B', 'a', 'b']);
    expect(Array.from(cat(f, 'c').codes)).toEqual([2, 0, 1, 2]);
  });

  it('refuses ±Infinity naming column and row, but keeps NaN as missing', () => {
    expect(() => toFrame([{ x: 1 }, { x: NaN }, { x: Infinity }])).toThrow('Column "x", row 2: value Infinity is invalid');
    expect(() => toFrame([{ x: -Infinity }])).toThrow(/row 0: value -Infinity/);
  });

  it('reads a column mixing numbers and texts as categorical', () => {
    const f = toFrame([{ m: 1 }, { m: 'x' }, { m: 2.5 }]);
    expect(cat(f, 'm').categories).toEqual(['1', '2.5', 'x']);
  });

  it('forces kinds on request', () => {
    const rows = [{ zip: 2134, score: '3.5', code: 'a' }, { zip: 10001, score: null, code: 'b' }];
    const f = toFrame(rows, { categorical: ['zip'], numeric: ['score'] });
    expect(cat(f, 'zip').categories).toEqual(['10001', '2134']);
    expect(Array.from(num(f, 'score').values)).toEqual([3.5, NaN]);
    expect(() => toFrame(rows, { numeric: ['code'] })).toThrow('Column "code", row 0: value "a" is invalid: expected a number or a missing value.');
    expect(() => toFrame(rows, { numeric: ['nope'] })).toThrow('Unknown column "nope" in option numeric.');
    expect(() => toFrame(rows, { numeric: ['zip'], categorical: ['zip'] })).toThrow(/listed in both categorical and numeric/);
  });

  it('keeps and orders the columns asked for', () => {
    const f = toFrame([{ a: 1, b: 2, c: 3 }], { columns: ['c', 'a'] });
    expect(f.columns.map((c) => c.name)).toEqual(['c', 'a']);
    expect(() => toFrame([{ a: 1 }], { columns: ['z'] })).toThrow('Unknown column "z" in option columns.');
  });

  it('expands Dates and ISO date texts into parts (UTC), adding hour only when needed', () => {
    const f = toFrame([{ d: new Date(Date.UTC(2012, 0, 1)) }, { d: null }, { d: new Date(Date.UTC(2015, 11, 31)) }]);
    expect(f.columns.map((c) => c.name)).toEqual(['d.year', 'd.month', 'd.day', 'd.weekday', 'd.dayOfYear', 'd.epochDays']);
    // 2012-01-01: a Sunday, epoch day 15340; 2015-12-31: a Thursday, day 365, epoch day 16800 (Python datetime)
    expect(Array.from(num(f, 'd.weekday').values)).toEqual([7, NaN, 4]);
    expect(Array.from(num(f, 'd.epochDays').values)).toEqual([15340, NaN, 16800]);
    expect(num(f, 'd.year').origin).toEqual({ source: 'd', part: 'year' });
    const g = toFrame([{ t: '2012-01-02T08:30' }, { t: '2012-01-02' }]);
    expect(Array.from(num(g, 't.hour').values)).toEqual([8, 0]);
    expect(() => toFrame([{ d: 'soon' }], { dates: ['d'] })).toThrow(/Column "d", row 0: value "soon" is invalid: expected a date/);
  });

  it('reports a date part that clashes with an existing column', () => {
    expect(() => toFrame([{ d: '2012-01-01', 'd.year': 1 }])).toThrow('Column "d.year" made from date column "d" clashes with an existing column.');
  });

  it('sets the schema with its fingerprint', () => {
    const f = toFrame([{ a: 1, b: 'x' }]);
    expect(f.schema.columns).toEqual([{ name: 'a', kind: 'numeric' }, { name: 'b', kind: 'categorical', categories: ['x'] }]);
    expect(f.schema.fingerprint).toBe(schemaFingerprint(f.schema.columns));
    expect(toFrame([{ a: 1, b: 'y' }]).schema.fingerprint).not.toBe(f.schema.fingerprint);
  });

  it('refuses rows that are not objects and values it cannot represent', () => {
    expect(() => toFrame([1 as unknown as Record<string, unknown>])).toThrow('Row 0 is 1: expected an object of column values.');
    expect(() => toFrame([{ o: { a: 1 } }, { o: 'x' }])).toThrow(/Column "o", row 0/);
  });
});

describe('toFrame(degenerate input)', () => {
  it('empty array: no rows, no columns', () => {
    const f = toFrame([]);
    expect(f.nRows).toBe(0);
    expect(f.columns).toEqual([]);
  });

  it('empty arquero table keeps its columns, with zero rows', () => {
    const f = toFrame(table({ a: [], b: [] }));
    expect(f.nRows).toBe(0);
    expect(f.columns.map((c) => [c.name, c.kind])).toEqual([['a', 'numeric'], ['b', 'numeric']]);
  });

  it('one row', () => {
    const f = toFrame([{ a: 3, b: 'x' }]);
    expect(f.nRows).toBe(1);
    expect(Array.from(num(f, 'a').values)).toEqual([3]);
  });

  it('all-missing column becomes numeric NaN', () => {
    const f = toFrame([{ a: null }, { a: undefined }, { a: NaN }]);
    expect(num(f, 'a').kind).toBe('numeric');
    expect(Array.from(num(f, 'a').values)).toEqual([NaN, NaN, NaN]);
  });
});

describe('toFrame(table)', () => {
  it('respects an arquero filter and order', () => {
    const t = table({ a: [3, 1, 2], b: ['z', 'x', 'y'] }).filter((d: { a: number }) => d.a > 1).orderby('a');
    const f = toFrame(t);
    expect(Array.from(num(f, 'a').values)).toEqual([2, 3]);
    expect(cat(f, 'b').categories).toEqual(['y', 'z']);
  });

  // Palmer penguins (vega-datasets penguins.json; Gorman, Williams & Fraser 2014): 344 rows; Adelie 152,
  // Chinstrap 68, Gentoo 124; 2 rows with all four measurements missing, 11 rows missing Sex when the
  // file's "." is read as missing.
  it('reads penguins into typed columns with missing values kept', async () => {
    const f = toFrame(await readExtract(`${DATA}/penguins.json`, { missingText: ['', '.'] }));
    expect(f.nRows).toBe(344);
    const species = cat(f, 'Species');
    expect(species.categories).toEqual(['Adelie', 'Chinstrap', 'Gentoo']);
    const counts = [0, 0, 0];
    for (const k of species.codes) counts[k]++;
    expect(counts).toEqual([152, 68, 124]);
    expect(Array.from(num(f, 'Body Mass (g)').values).filter(Number.isNaN).length).toBe(2);
    expect(Array.from(cat(f, 'Sex').codes).filter((k) => k === -1).length).toBe(11);
    expect(cat(f, 'Sex').categories).toEqual(['FEMALE', 'MALE']);
  });

  // Seattle weather (vega-datasets seattle-weather.csv): 1461 daily rows from 2012-01-01 to 2015-12-31.
  it('expands the seattle-weather date column into parts', async () => {
    const f = toFrame(await readExtract(`${DATA}/seattle-weather.csv`));
    expect(f.nRows).toBe(1461);
    expect(f.columns.map((c) => c.name)).toEqual([
      'date.year', 'date.month', 'date.day', 'date.weekday', 'date.dayOfYear', 'date.epochDays',
      'precipitation', 'temp_max', 'temp_min', 'wind', 'weather',
    ]);
    const epoch = num(f, 'date.epochDays').values;
    // consecutive days: 2012-01-01 is epoch day 15340, 2015-12-31 is 16800 (Python datetime); 16800 - 15340 + 1 = 1461
    expect(epoch[0]).toBe(15340);
    expect(epoch[1460]).toBe(16800);
    expect(cat(f, 'weather').categories).toEqual(['drizzle', 'fog', 'rain', 'snow', 'sun']);
  });

  // Cars (vega-datasets cars.json): 406 rows; Miles_per_Gallon missing in 8, Horsepower in 6 (14 rows in all).
  it('reads cars with the Year texts as dates', async () => {
    const f = toFrame(await readExtract(`${DATA}/cars.json`));
    expect(f.nRows).toBe(406);
    const mpg = num(f, 'Miles_per_Gallon').values, hp = num(f, 'Horsepower').values;
    let rows = 0;
    for (let i = 0; i < f.nRows; i++) if (Number.isNaN(mpg[i]) || Number.isNaN(hp[i])) rows++;
    expect(rows).toBe(14);
    const years = new Set(num(f, 'Year.year').values);
    expect(Math.min(...years)).toBe(1970);
    expect(Math.max(...years)).toBe(1982);
  });
});

describe('toFrame(frame)', () => {
  it('returns the same columns (origins kept) and can select some', () => {
    const f = toFrame([{ d: '2012-01-01', x: 1 }]);
    expect(toFrame(f).columns).toEqual(f.columns);
    const g = toFrame(f, { columns: ['x', 'd.year'] });
    expect(g.columns.map((c) => c.name)).toEqual(['x', 'd.year']);
    expect(num(g, 'd.year').origin).toEqual({ source: 'd', part: 'year' });
  });
});
