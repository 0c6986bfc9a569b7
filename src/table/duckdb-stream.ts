/**
 * Streaming a big extract from DuckDB straight into a Frame's typed arrays: the row count is asked
 * first, every column is preallocated (Float64Array, or Int32Array dictionary codes), and result chunks
 * are copied in as they arrive — no row objects, no per-value strings (text columns are coded inside
 * DuckDB through an ENUM type built from the sorted dictionary). Dates and timestamps become part
 * columns exactly as in the table layer (`datePartColumns`: `<name>.year`, `.month`, ...).
 */
import type { DuckDBConnection } from '@duckdb/node-api';
import { errors } from '../errors.js';
import { describeColumns, openDuck, quoteName, quoteText, relationOf, type DuckColumn, type DuckInput } from './duckdb-source.js';
import { datePartColumns } from './encode-column.js';
import type { Column, Frame } from './frame.js';
import { makeFrame } from './make-frame.js';

interface Sink {
  readonly col: DuckColumn;
  readonly values: Float64Array | Int32Array;
  readonly categories: string[] | null;
  readonly expr: string;
}

async function scalar(con: DuckDBConnection, sql: string, label: string): Promise<unknown[][]> {
  try {
    return (await con.runAndReadAll(sql)).getRowsJS() as unknown[][];
  } catch (e) {
    throw errors.badQuery(label, (e as Error).message.split('\n')[0]);
  }
}

async function prepareSinks(con: DuckDBConnection, cols: DuckColumn[], rel: string, n: number, label: string): Promise<Sink[]> {
  const sinks: Sink[] = [];
  for (const [j, col] of cols.entries()) {
    if (col.kind !== 'categorical') { sinks.push({ col, values: new Float64Array(n), categories: null, expr: col.select }); continue; }
    const rows = await scalar(con, `SELECT DISTINCT ${col.select} FROM ${rel} WHERE ${quoteName(col.name)} IS NOT NULL`, label);
    const categories = rows.map((r) => String(r[0])).sort();
    let expr = 'CAST(NULL AS INTEGER)';
    if (categories.length) {
      const type = `coppice_dictionary_${j}`;
      await scalar(con, `CREATE TYPE ${type} AS ENUM (${categories.map(quoteText).join(', ')})`, label);
      expr = `CAST(enum_code(CAST(${col.select} AS ${type})) AS INTEGER)`;
    }
    sinks.push({ col, values: new Int32Array(n), categories, expr });
  }
  return sinks;
}

/**
 * Read a Parquet file or query result into a Frame without building row objects.
 * Numbers and booleans: numeric columns (NaN for NULL; ±Infinity refused); text: categorical columns
 * with a sorted dictionary (-1 for NULL); dates and timestamps: part columns named `<name>.<part>`.
 * @example
 * const frame = await streamFrameWithDuckDB('node_modules/vega-datasets/data/flights-3m.parquet');
 * frame.nRows; // 3000000
 */
export async function streamFrameWithDuckDB(source: DuckInput): Promise<Frame> {
  const { label, sql: rel } = relationOf(source);
  const { con, done } = await openDuck();
  try {
    const cols = await describeColumns(con, rel, label);
    const n = Number((await scalar(con, `SELECT count(*) FROM ${rel}`, label))[0][0]);
    const sinks = await prepareSinks(con, cols, rel, n, label);
    if (sinks.length) await fill(con, sinks, rel, n, label);
    const columns: Column[] = [];
    for (const s of sinks) {
      if (s.categories) columns.push({ name: s.col.name, kind: 'categorical', codes: s.values as Int32Array, categories: s.categories });
      else if (s.col.kind === 'date') columns.push(...datePartColumns(s.col.name, s.values as Float64Array));
      else columns.push({ name: s.col.name, kind: s.col.kind === 'boolean' ? 'boolean' : 'numeric', values: s.values as Float64Array });
    }
    return makeFrame(n, columns);
  } finally {
    done();
  }
}

async function fill(con: DuckDBConnection, sinks: Sink[], rel: string, n: number, label: string): Promise<void> {
  const select = sinks.map((s, j) => `${s.expr} AS c${j}`).join(', ');
  let result;
  try {
    result = await con.stream(`SELECT ${select} FROM ${rel}`);
  } catch (e) {
    throw errors.badQuery(label, (e as Error).message.split('\n')[0]);
  }
  let at = 0;
  for (;;) {
    const chunk = await result.fetchChunk();
    if (!chunk || chunk.rowCount === 0) break;
    const m = chunk.rowCount;
    if (at + m > n) throw errors.badQuery(label, 'more rows arrived than counted');
    sinks.forEach((s, j) => {
      const vec = chunk.getColumnVector(j);
      const out = s.values;
      if (s.categories) {
        for (let i = 0; i < m; i++) { const v = vec.getItem(i); out[at + i] = v === null ? -1 : (v as number); }
        return;
      }
      for (let i = 0; i < m; i++) {
        const v = vec.getItem(i) as number | null;
        if (v === null) { out[at + i] = NaN; continue; }
        if (v === Infinity || v === -Infinity) throw errors.badValue(s.col.name, at + i, v, 'a finite number');
        out[at + i] = v;
      }
    });
    at += m;
  }
  if (at !== n) throw errors.badQuery(label, `expected ${n} rows, read ${at}`);
}
