import { describe, expect, it } from 'vitest';
import { readWithDuckDB } from '../../src/table/duckdb.js';
import { streamFrameWithDuckDB } from '../../src/table/duckdb-stream.js';

// Flights: vega-datasets `flights-3m.parquet`, 3,000,000 rows: date, delay, distance, origin, destination
// (CHECKS.md, "Open data shipped by npm packages").
const FLIGHTS = 'node_modules/vega-datasets/data/flights-3m.parquet';

describe('readWithDuckDB(source)', () => {
  it('reads a SQL query: numbers, booleans, text, NULL, timestamps as UTC Dates', async () => {
    const t = await readWithDuckDB("sql:SELECT * FROM (VALUES (1, true, 'b', TIMESTAMP '2001-01-01 10:30:00'), (NULL, false, NULL, NULL)) v(n, f, s, d)");
    expect(t.numRows()).toBe(2);
    expect(t.array('n')).toEqual([1, null]);
    expect(t.array('f')).toEqual([true, false]);
    expect(t.array('s')).toEqual(['b', null]);
    expect((t.array('d') as (Date | null)[])[0]?.toISOString()).toBe('2001-01-01T10:30:00.000Z');
  });

  it('reads Parquet through a query object', async () => {
    const t = await readWithDuckDB({ query: `SELECT * FROM read_parquet('${FLIGHTS}') LIMIT 5` });
    expect(t.columnNames()).toEqual(['date', 'delay', 'distance', 'origin', 'destination']);
    expect(t.numRows()).toBe(5);
  });

  it('rejects a source that is neither parquet nor SQL, and reports SQL errors by source', async () => {
    await expect(readWithDuckDB('data.csv')).rejects.toThrow(/source/);
    await expect(readWithDuckDB('sql:SELECT * FROM no_such_table')).rejects.toThrow(/DuckDB could not read/);
  });
});

describe('streamFrameWithDuckDB(source)', () => {
  it('flights-3m has 3,000,000 rows (CHECKS.md); a slice agrees value by value with readWithDuckDB', async () => {
    const count = await readWithDuckDB(`sql:SELECT count(*) AS n FROM read_parquet('${FLIGHTS}')`);
    expect(count.array('n')).toEqual([3_000_000]);
    const q = `sql:SELECT * FROM read_parquet('${FLIGHTS}') ORDER BY date, origin, destination, delay, distance LIMIT 5000`;
    const [frame, t] = await Promise.all([streamFrameWithDuckDB(q), readWithDuckDB(q)]);
    expect(frame.nRows).toBe(5000);
    const names = frame.columns.map((c) => c.name);
    expect(names.slice(0, 7)).toEqual(['date.year', 'date.month', 'date.day', 'date.weekday', 'date.dayOfYear', 'date.epochDays', 'date.hour']);
    expect(names.slice(7)).toEqual(['delay', 'distance', 'origin', 'destination']);
    const delay = frame.columns[7], origin = frame.columns[9];
    if (delay.kind === 'categorical' || origin.kind !== 'categorical') throw new Error('kinds');
    expect(Array.from(delay.values)).toEqual(t.array('delay'));
    expect(Array.from(origin.codes, (c) => origin.categories[c])).toEqual(t.array('origin'));
    expect([...origin.categories]).toEqual([...origin.categories].sort());
    const dates = t.array('date') as Date[];
    const hour = frame.columns[6];
    if (hour.kind === 'categorical') throw new Error('kinds');
    expect(Array.from(hour.values)).toEqual(dates.map((d) => d.getUTCHours()));
  });

  it('NULLs become NaN and -1; an empty result is an empty frame', async () => {
    const f = await streamFrameWithDuckDB("sql:SELECT * FROM (VALUES (1.5, 'x'), (NULL, NULL), (2, 'a')) v(n, s)");
    const [n, s] = f.columns;
    if (n.kind === 'categorical' || s.kind !== 'categorical') throw new Error('kinds');
    expect(Array.from(n.values)).toEqual([1.5, NaN, 2]);
    expect(Array.from(s.codes)).toEqual([1, -1, 0]);
    expect(s.categories).toEqual(['a', 'x']);
    const e = await streamFrameWithDuckDB("sql:SELECT 1.0 AS n, 'a' AS s WHERE false");
    expect(e.nRows).toBe(0);
    expect(e.columns.map((c) => c.kind)).toEqual(['numeric', 'categorical']);
  });

  it('refuses infinite values by column and row', async () => {
    await expect(streamFrameWithDuckDB("sql:SELECT * FROM (VALUES (1.0), ('inf'::DOUBLE)) v(x)")).rejects.toThrow(/"x", row 1/);
  });
});
