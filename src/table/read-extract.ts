/**
 * Read an extract (CSV, TSV, JSON, Arrow IPC, Parquet or a SQL query) into an arquero table. Reading never
 * writes anything.
 */
import { readFile, stat } from 'node:fs/promises';
import { extname } from 'node:path';
import { fromArrow, type ColumnTable } from 'arquero';
import { errors } from '../errors.js';
import type { CellOptions } from './columns-table.js';
import { loadDuckReader, type DuckSource } from './load-duck-reader.js';
import { readDelimitedText } from './read-delimited.js';
import { readJsonText } from './read-json.js';

export type ExtractFormat = 'csv' | 'tsv' | 'json' | 'arrow' | 'parquet';

/** Options for `readExtract`. */
export interface ReadExtractOptions extends CellOptions {
  /** File format. __Default:__ from the extension (.csv, .tsv/.tab, .json, .arrow/.feather/.ipc, .parquet). */
  readonly format?: ExtractFormat;
  /** Field delimiter for delimited text. __Default:__ `','` for csv, a tab for tsv. */
  readonly delimiter?: string;
}

const BY_EXTENSION: Record<string, ExtractFormat> = {
  '.csv': 'csv', '.tsv': 'tsv', '.tab': 'tsv', '.json': 'json',
  '.arrow': 'arrow', '.feather': 'arrow', '.ipc': 'arrow', '.parquet': 'parquet',
};
const FORMATS: readonly ExtractFormat[] = ['csv', 'tsv', 'json', 'arrow', 'parquet'];

function formatOf(path: string, options: ReadExtractOptions): ExtractFormat {
  if (options.format !== undefined) {
    if (!FORMATS.includes(options.format)) throw errors.badOption('format', options.format, FORMATS.join(', '));
    return options.format;
  }
  const ext = extname(path).toLowerCase();
  const format = BY_EXTENSION[ext];
  if (!format) throw errors.unknownFormat(path, ext);
  return format;
}

async function checkFile(path: string): Promise<void> {
  try {
    const s = await stat(path);
    if (!s.isFile()) throw errors.badFile(path, 'it is not a file');
  } catch (e) {
    if ((e as NodeJS.ErrnoException).code === 'ENOENT') throw errors.fileNotFound(path);
    throw e;
  }
}

function readArrowBytes(bytes: Uint8Array, path: string): ColumnTable {
  try {
    return fromArrow(bytes);
  } catch (e) {
    throw errors.badFile(path, `not an Arrow IPC file (${(e as Error).message})`);
  }
}

/**
 * Read an extract into an arquero table.
 *
 * `source` is a file path, a SQL text starting with `sql:`, or `{ query }`. CSV/TSV are checked strictly
 * (a ragged or badly quoted line is an error naming the line and field counts) and typed on every cell:
 * booleans, numbers, ISO dates (as Dates; UTC when no offset) or text. JSON must be an array of records.
 * Arrow IPC files (.arrow, .feather) are read with dates as Dates. Parquet and SQL go to the DuckDB reader.
 *
 * Options:
 * - `format`: __Default:__ from the file extension.
 * - `delimiter`: __Default:__ `','` for csv, tab for tsv.
 * - `missingText`: cell texts read as missing. __Default:__ `['']`
 * - `keepText`: columns left as text, untyped. __Default:__ `[]`
 *
 * @example
 * const claims = await readExtract('data/claims.csv', { missingText: ['', 'NA'] });
 * const recent = await readExtract('sql:SELECT * FROM read_parquet(\'claims.parquet\') WHERE year = 2024');
 */
export async function readExtract(source: DuckSource, options: ReadExtractOptions = {}): Promise<ColumnTable> {
  if (typeof source === 'object' && source !== null) {
    if (typeof source.query !== 'string' || source.query.trim() === '') {
      throw errors.badOption('source.query', source.query, 'a SQL text');
    }
    return (await loadDuckReader('a SQL query'))(source);
  }
  if (typeof source !== 'string' || source.trim() === '') throw errors.badOption('source', source, 'a file path, "sql:..." or { query }');
  if (source.startsWith('sql:')) return (await loadDuckReader('a SQL query'))(source);

  const format = formatOf(source, options);
  await checkFile(source);
  switch (format) {
    case 'parquet':
      return (await loadDuckReader(JSON.stringify(source)))(source);
    case 'arrow':
      return readArrowBytes(new Uint8Array(await readFile(source)), source);
    case 'json':
      return readJsonText(await readFile(source, 'utf8'), source, options);
    case 'csv':
    case 'tsv': {
      const delimiter = options.delimiter ?? (format === 'tsv' ? '\t' : ',');
      return readDelimitedText(await readFile(source, 'utf8'), delimiter, source, options);
    }
  }
}
