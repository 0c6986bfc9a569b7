/**
 * Shared by the DuckDB readers: what to read (a Parquet path, `sql:` text or `{ query }`) as a SQL
 * relation, a connection to an in-memory DuckDB, and how each DuckDB column type is brought into
 * JavaScript (numbers as DOUBLE, dates and timestamps as epoch milliseconds, text as dictionary codes).
 */
import type { DuckDBConnection } from '@duckdb/node-api';
import { errors } from '../errors.js';

/** A Parquet path, a `sql:` text, or a query object. */
export type DuckInput = string | { readonly query: string };

export type DuckColumnKind = 'numeric' | 'boolean' | 'date' | 'categorical';

export interface DuckColumn {
  readonly name: string;
  readonly kind: DuckColumnKind;
  /** SQL expression selecting the column in its JavaScript-friendly form. */
  readonly select: string;
}

/** Quote an identifier for SQL. */
export function quoteName(name: string): string {
  return `"${name.replace(/"/g, '""')}"`;
}

/** Quote a string literal for SQL. */
export function quoteText(text: string): string {
  return `'${text.replace(/'/g, "''")}'`;
}

/**
 * A label for messages, and the SQL relation to read from.
 * @example
 * relationOf('x.parquet').sql; // read_parquet('x.parquet')
 */
export function relationOf(source: DuckInput): { label: string; sql: string } {
  if (typeof source === 'object' && source !== null && typeof source.query === 'string') return { label: source.query, sql: `(${source.query})` };
  if (typeof source !== 'string' || source.length === 0) throw errors.badOption('source', source, "a .parquet path, 'sql:SELECT ...' or { query }");
  if (source.startsWith('sql:')) return { label: source, sql: `(${source.slice(4)})` };
  if (!/\.parquet$/i.test(source)) throw errors.badOption('source', source, "a .parquet path, 'sql:SELECT ...' or { query }");
  return { label: source, sql: `read_parquet(${quoteText(source)})` };
}

/** Open an in-memory database; the caller closes it with `done()`. */
export async function openDuck(): Promise<{ con: DuckDBConnection; done: () => void }> {
  // Loaded on first use so that importing coppice does not load DuckDB's native module.
  const { DuckDBInstance } = await import('@duckdb/node-api');
  const instance = await DuckDBInstance.create(':memory:');
  const con = await instance.connect();
  return { con, done: () => { con.closeSync(); instance.closeSync(); } };
}

function kindOf(type: string): DuckColumnKind | null {
  const t = type.toUpperCase();
  if (/^(TINYINT|SMALLINT|INTEGER|BIGINT|HUGEINT|UTINYINT|USMALLINT|UINTEGER|UBIGINT|UHUGEINT|FLOAT|DOUBLE|REAL|DECIMAL)/.test(t)) return 'numeric';
  if (t === 'BOOLEAN') return 'boolean';
  if (/^(DATE|TIMESTAMP)/.test(t)) return 'date';
  if (t === 'VARCHAR' || t.startsWith('ENUM')) return 'categorical';
  return null;
}

/** The columns of `relation` and how to select each; unsupported types are refused by name. */
export async function describeColumns(con: DuckDBConnection, relation: string, label: string): Promise<DuckColumn[]> {
  let rows: Record<string, unknown>[];
  try {
    rows = (await con.runAndReadAll(`DESCRIBE SELECT * FROM ${relation}`)).getRowObjectsJS() as Record<string, unknown>[];
  } catch (e) {
    throw errors.badQuery(label, (e as Error).message.split('\n')[0]);
  }
  return rows.map((r) => {
    const name = String(r.column_name), type = String(r.column_type);
    const kind = kindOf(type);
    if (!kind) throw errors.notSupported(`Column ${JSON.stringify(name)} of DuckDB type ${type}`);
    const q = quoteName(name);
    const select = kind === 'numeric' ? `CAST(${q} AS DOUBLE)` : kind === 'boolean' ? `CAST(${q} AS DOUBLE)`
      : kind === 'date' ? `CAST(epoch_ms(CAST(${q} AS TIMESTAMP)) AS DOUBLE)` : `CAST(${q} AS VARCHAR)`;
    return { name, kind, select };
  });
}
