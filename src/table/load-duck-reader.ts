/**
 * The DuckDB reader (Parquet files and SQL queries) lives in `./duckdb.ts`, written separately; it is
 * loaded on first use so that the rest of reading works without it.
 */
import type { ColumnTable } from 'arquero';
import { errors } from '../errors.js';

/** A Parquet path, a `sql:` text, or a query object, as given to `readExtract`. */
export type DuckSource = string | { readonly query: string };

/** The reader `./duckdb.ts` exports as `readWithDuckDB`. */
export type DuckReader = (source: DuckSource) => Promise<ColumnTable>;

const SPECIFIER = './duckdb.js';

function isNotFound(e: unknown): boolean {
  const err = e as { code?: unknown; message?: unknown };
  const text = `${String(err?.code ?? '')} ${String(err?.message ?? '')}`;
  return /duckdb/i.test(text) && /(ERR_MODULE_NOT_FOUND|Cannot find module|Failed to load|does not exist)/i.test(text);
}

/**
 * Load `readWithDuckDB` from `./duckdb.js`; `what` names the source in the error thrown when that module
 * or its export is missing.
 *
 * @example const read = await loadDuckReader('"flights.parquet"'); const t = await read('flights.parquet');
 */
export async function loadDuckReader(what: string): Promise<DuckReader> {
  let mod: { readWithDuckDB?: unknown };
  try {
    mod = (await import(SPECIFIER)) as { readWithDuckDB?: unknown };
  } catch (e) {
    if (isNotFound(e)) throw errors.readerMissing(what);
    throw e;
  }
  if (typeof mod.readWithDuckDB !== 'function') throw errors.readerMissing(what);
  return mod.readWithDuckDB as DuckReader;
}
