/**
 * Read an extract source into an arquero table. The table layer's `readExtract` does the reading (CSV, JSON,
 * Arrow, Parquet and SQL through DuckDB); it is looked up when first needed so this module loads even where the
 * table layer is built without it. Without it, CSV, TSV, JSON and Arrow files are read with arquero directly.
 */
import { existsSync } from 'node:fs';
import { extname } from 'node:path';
import * as aq from 'arquero';
import type { ColumnTable } from 'arquero';
import { errors } from '../errors.js';

type Reader = (source: string) => Promise<ColumnTable>;

let reader: Reader | null | undefined;

async function tableLayerReader(): Promise<Reader | null> {
  if (reader !== undefined) return reader;
  const mod = (await import('../table/index.js')) as Record<string, unknown>;
  const fn = mod.readExtract;
  reader = typeof fn === 'function' ? (fn as Reader) : null;
  return reader;
}

async function readWithArquero(source: string): Promise<ColumnTable> {
  if (/^sql:/i.test(source.trim())) throw errors.notSupported('A query source without the table layer reader');
  if (!existsSync(source)) throw errors.badFile(source, 'no such file');
  const ext = extname(source).toLowerCase();
  if (ext === '.csv') return aq.loadCSV(source);
  if (ext === '.tsv') return aq.loadCSV(source, { delimiter: '\t' });
  if (ext === '.json') return aq.loadJSON(source);
  if (ext === '.arrow' || ext === '.feather') return aq.loadArrow(source);
  throw errors.badFile(source, `unknown extract format ${JSON.stringify(ext || '(none)')}`);
}

/**
 * Read a source (absolute file path or `sql:` query) into a table.
 * @example
 * const t = await loadExtractTable('/data/shipments.csv');
 */
export async function loadExtractTable(source: string): Promise<ColumnTable> {
  const fromTable = await tableLayerReader();
  return fromTable ? fromTable(source) : readWithArquero(source);
}
