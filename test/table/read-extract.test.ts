import { mkdtempSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { readExtract } from '../../src/table/read-extract.js';

const DATA = 'node_modules/vega-datasets/data';
const dir = mkdtempSync(join(tmpdir(), 'coppice-read-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
function file(name: string, text: string): string {
  const p = join(dir, name);
  writeFileSync(p, text);
  return p;
}

describe('readExtract(path) on CSV', () => {
  // Seattle weather (vega-datasets seattle-weather.csv): 1461 rows, five weather classes; class counts
  // rain 641, sun 640, fog 101, drizzle 53, snow 26 counted with Python's csv module.
  it('reads seattle-weather.csv with typed columns and dates', async () => {
    const t = await readExtract(`${DATA}/seattle-weather.csv`);
    expect(t.numRows()).toBe(1461);
    expect(t.columnNames()).toEqual(['date', 'precipitation', 'temp_max', 'temp_min', 'wind', 'weather']);
    const counts: Record<string, number> = {};
    for (const w of t.array('weather') as string[]) counts[w] = (counts[w] ?? 0) + 1;
    expect(counts).toEqual({ rain: 641, sun: 640, fog: 101, drizzle: 53, snow: 26 });
    expect(t.get('date', 0)).toEqual(new Date(Date.UTC(2012, 0, 1)));
    expect(t.get('temp_min', 1460)).toBe(-2.1);
  });

  it('keeps quoted commas and line breaks, and reads empty cells as missing', async () => {
    const p = file('notes.csv', 'id,note,amount\n1,"late, again",10.5\n2,"two\nlines",\n3,,7\n');
    const t = await readExtract(p);
    expect(t.array('note')).toEqual(['late, again', 'two\nlines', null]);
    expect(t.array('amount')).toEqual([10.5, null, 7]);
  });

  it('reports a ragged line with its number and field counts', async () => {
    const p = file('ragged.csv', 'a,b,c\n1,2,3\n4,5\n');
    await expect(readExtract(p)).rejects.toThrow(`${JSON.stringify(p)}, line 3: 2 field(s), expected 3 as in the header.`);
  });

  it('reads listed texts as missing and keeps listed columns as text', async () => {
    const p = file('na.csv', 'zip,score\n02134,NA\n10001,3\n');
    const t = await readExtract(p, { missingText: ['', 'NA'], keepText: ['zip'] });
    expect(t.array('zip')).toEqual(['02134', '10001']);
    expect(t.array('score')).toEqual([null, 3]);
    await expect(readExtract(p, { keepText: ['nope'] })).rejects.toThrow(/Unknown column "nope" in option keepText/);
  });

  it('reads TSV by extension and a custom delimiter', async () => {
    expect((await readExtract(file('a.tsv', 'x\ty\n1\t2\n'))).array('y')).toEqual([2]);
    expect((await readExtract(file('b.csv', 'x;y\n1;2\n'), { delimiter: ';' })).array('y')).toEqual([2]);
  });
});

describe('readExtract(path) on JSON', () => {
  // Palmer penguins (vega-datasets penguins.json; Gorman, Williams & Fraser 2014; Horst, Hill & Gorman 2020):
  // 344 rows; Adelie 152, Chinstrap 68, Gentoo 124. The file has null in 10 rows and the text "." as Sex in
  // one more; counting "." as missing gives the published 11 rows with a missing value.
  it('reads penguins.json keeping missing values', async () => {
    const t = await readExtract(`${DATA}/penguins.json`);
    expect(t.numRows()).toBe(344);
    const sex = t.array('Sex') as (string | null)[];
    expect(sex.filter((s) => s === null).length).toBe(10);
    expect(sex.filter((s) => s === '.').length).toBe(1);
    const t2 = await readExtract(`${DATA}/penguins.json`, { missingText: ['', '.'] });
    const names = t2.columnNames();
    const rowsWithMissing = t2.objects().filter((r) => names.some((n) => (r as Record<string, unknown>)[n] === null));
    expect(rowsWithMissing.length).toBe(11);
    expect(t2.objects().filter((r) => (r as Record<string, unknown>)['Body Mass (g)'] === null).length).toBe(2);
  });

  // Cars (vega-datasets cars.json): 406 rows, 14 with a missing value (8 Miles_per_Gallon, 6 Horsepower).
  it('reads cars.json, turning the ISO Year texts into dates', async () => {
    const t = await readExtract(`${DATA}/cars.json`);
    expect(t.numRows()).toBe(406);
    expect(t.get('Year', 0)).toEqual(new Date(Date.UTC(1970, 0, 1)));
    expect((t.array('Miles_per_Gallon') as unknown[]).filter((v) => v === null).length).toBe(8);
    expect((t.array('Horsepower') as unknown[]).filter((v) => v === null).length).toBe(6);
  });

  it('takes the union of keys and refuses nested values or non-arrays', async () => {
    const t = await readExtract(file('u.json', '[{"a":1},{"b":"x"}]'));
    expect(t.columnNames()).toEqual(['a', 'b']);
    expect(t.array('a')).toEqual([1, null]);
    await expect(readExtract(file('n.json', '[{"a":{"b":1}}]'))).rejects.toThrow(/record 0, column "a": nested value/);
    await expect(readExtract(file('o.json', '{"a":1}'))).rejects.toThrow(/expected a JSON array of records/);
    await expect(readExtract(file('bad.json', '[{"a":1}'))).rejects.toThrow(/invalid JSON/);
  });
});

describe('readExtract(source) errors and dispatch', () => {
  it('names a missing file', async () => {
    await expect(readExtract(join(dir, 'absent.csv'))).rejects.toThrow(`File not found: ${JSON.stringify(join(dir, 'absent.csv'))}.`);
    await expect(readExtract(join(dir, 'absent.parquet'))).rejects.toThrow(/File not found/);
  });

  it('refuses an unknown extension unless a format is given', async () => {
    const p = file('data.txt', 'a\n1\n');
    await expect(readExtract(p)).rejects.toThrow(/extension ".txt"/);
    expect((await readExtract(p, { format: 'csv' })).array('a')).toEqual([1]);
    await expect(readExtract(p, { format: 'xls' as 'csv' })).rejects.toThrow(/Option format/);
  });

  it('sends SQL to the DuckDB reader, or says clearly that it is not available', async () => {
    const hasReader = readdirSync('src/table').includes('duckdb.ts');
    const run = readExtract('sql:SELECT 42 AS answer');
    if (hasReader) expect(Array.from((await run).array('answer') as ArrayLike<unknown>, Number)).toEqual([42]);
    else await expect(run).rejects.toThrow(/needs the DuckDB reader/);
  });

  it('reads a Parquet file through the DuckDB reader', async () => {
    if (!readdirSync('src/table').includes('duckdb.ts')) return;
    // write a small Parquet file with DuckDB itself (a general-purpose database)
    const { DuckDBInstance } = await import('@duckdb/node-api');
    const db = await DuckDBInstance.create(':memory:');
    const con = await db.connect();
    const p = join(dir, 'small.parquet');
    await con.run(`COPY (SELECT * FROM (VALUES (1, 'a'), (2, NULL)) AS t(n, s)) TO '${p}' (FORMAT parquet)`);
    con.closeSync(); db.closeSync();
    const t = await readExtract(p);
    expect(Array.from(t.array('n') as ArrayLike<unknown>, Number)).toEqual([1, 2]);
    expect(t.array('s')).toEqual(['a', null]);
  });

  it('writes nothing while reading', async () => {
    const before = readdirSync(dir).sort();
    await readExtract(file('w.csv', 'a\n1\n'));
    expect(readdirSync(dir).sort()).toEqual([...before, 'w.csv'].sort());
  });
});
