/**
 * Reading Parquet files and SQL query results through an embedded DuckDB (`@duckdb/node-api`, offline)
 * into an arquero table, for extracts of moderate size. For extracts too big for row-by-row values,
 * `streamFrameWithDuckDB` (duckdb-stream.ts) reads straight into a Frame's typed arrays.
 */
import { table, type ColumnTable } from 'arquero';
import { errors } from '../errors.js';
import { describeColumns, openDuck, relationOf, type DuckInput } from './duckdb-source.js';

/**
 * Read a Parquet file (`'data/x.parquet'`) or a query (`'sql:SELECT ...'` or `{ query }`) into an arquero
 * table: numbers as numbers, booleans as booleans, dates and timestamps as `Date` (UTC), text as strings,
 * SQL NULL as null.
 * @example
 * const t = await readWithDuckDB("sql:SELECT * FROM read_parquet('flights.parquet') LIMIT 1000");
 */
export async function readWithDuckDB(source: DuckInput): Promise<ColumnTable> {
  const { label, sql } = relationOf(source);
  const { con, done } = await openDuck();
  try {
    const cols = await describeColumns(con, sql, label);
    if (cols.length === 0) return table({});
    const select = cols.map((c, j) => `${c.select} AS c${j}`).join(', ');
    let data: unknown[][];
    try {
      data = (await con.runAndReadAll(`SELECT ${select} FROM ${sql}`)).getColumnsJS() as unknown[][];
    } catch (e) {
      throw errors.badQuery(label, (e as Error).message.split('\n')[0]);
    }
    const out: Record<string, unknown[]> = {};
    cols.forEach((c, j) => {
      const v = data[j];
      if (c.kind === 'date') out[c.name] = v.map((x) => (x === null ? null : new Date(x as number)));
      else if (c.kind === 'boolean') out[c.name] = v.map((x) => (x === null ? null : x === 1));
      else out[c.name] = v;
    });
    return table(out);
  } finally {
    done();
  }
}
