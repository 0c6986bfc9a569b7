/**
 * Named extract inputs of a notebook. A notebook declares each input once, with a default source; a rerun binds
 * the name to another source (a refreshed file or query) without editing the notebook.
 *
 * The source used for a name is, in order: an override set in this session (`setExtractOverrides`, used by the
 * headless runner), an entry of the `COPPICE_EXTRACTS` environment variable (a JSON object of name → source),
 * else the notebook's default. Each bound extract is recorded (name, source, rows, columns, fingerprint and
 * column profiles) for the run record.
 */
import { isAbsolute, resolve } from 'node:path';
import type { ColumnTable } from 'arquero';
import { CoppiceError, errors } from '../errors.js';
import { currentRunState, type BoundExtract } from './record-state.js';
import { loadExtractTable } from './record-source.js';
import { extractFingerprint } from './record-fingerprint.js';
import { profileColumn, type ColumnProfile } from './record-profile.js';

const NAME = /^[A-Za-z_$][A-Za-z0-9_$]*$/;

/**
 * True when a source names a query rather than a file (`sql:...`).
 * @example
 * isQuerySource('sql:SELECT * FROM pallets'); // true
 * isQuerySource('data/pallets-spring.csv');    // false
 */
export function isQuerySource(source: string): boolean {
  return /^sql:/i.test(source.trim());
}

/** Sources from the `COPPICE_EXTRACTS` environment variable (a JSON object of name → source). */
function environmentOverrides(): Record<string, string> {
  const text = process.env.COPPICE_EXTRACTS;
  if (!text) return {};
  let parsed: unknown;
  try {
    parsed = JSON.parse(text);
  } catch {
    throw errors.badOption('COPPICE_EXTRACTS', text, 'a JSON object of extract name to source');
  }
  if (!parsed || typeof parsed !== 'object' || Array.isArray(parsed)) {
    throw errors.badOption('COPPICE_EXTRACTS', text, 'a JSON object of extract name to source');
  }
  const out: Record<string, string> = {};
  for (const [k, v] of Object.entries(parsed)) {
    if (typeof v !== 'string') throw errors.badOption(`COPPICE_EXTRACTS.${k}`, v, 'a source string');
    out[k] = v;
  }
  return out;
}

/**
 * Which source a name resolves to now, and whether it was overridden (by `coppice run --extract` or the
 * `COPPICE_EXTRACTS` environment variable).
 * @example
 * resolveExtractSource('pallets', 'data/pallets-spring.csv'); // { source: 'data/pallets-spring.csv', overridden: false }
 */
export function resolveExtractSource(name: string, defaultSource: string): { source: string; overridden: boolean } {
  const session = currentRunState().extractOverrides;
  if (Object.prototype.hasOwnProperty.call(session, name)) return { source: session[name], overridden: true };
  const env = environmentOverrides();
  if (Object.prototype.hasOwnProperty.call(env, name)) return { source: env[name], overridden: true };
  return { source: defaultSource, overridden: false };
}

/**
 * Declare a named extract input and read it into an arquero table. The notebook's extract magic compiles to
 * this call; a rerun binds the name to another source.
 *
 * @param name an identifier naming the input (also the variable the magic binds).
 * @param defaultSource a file path (relative to the working directory, which is the notebook's folder in a run)
 *   or a query (`sql:SELECT ...`), used unless the name is bound to another source.
 * @example
 * const shipments = await declareExtract('shipments', 'data/shipments-baseline.csv');
 * shipments.numRows();
 */
export async function declareExtract(name: string, defaultSource: string): Promise<ColumnTable> {
  if (typeof name !== 'string' || !NAME.test(name)) throw errors.badExtractName(name);
  if (typeof defaultSource !== 'string' || defaultSource.trim() === '') {
    throw errors.badOption(`source of extract ${name}`, defaultSource, 'a file path or sql: query');
  }
  const { source, overridden } = resolveExtractSource(name, defaultSource);
  const path = isQuerySource(source) ? null : (isAbsolute(source) ? source : resolve(source));
  let table: ColumnTable;
  try {
    table = await loadExtractTable(path ?? source);
  } catch (err) {
    const reason = err instanceof Error ? err.message.replace(/\.$/, '') : String(err);
    if (err instanceof CoppiceError && err.code === 'unreadable-extract') throw err;
    throw errors.unreadableExtract(name, source, reason);
  }
  recordExtract({ name, source, defaultSource, overridden, path, table });
  return table;
}

function recordExtract(args: {
  name: string; source: string; defaultSource: string; overridden: boolean; path: string | null; table: ColumnTable;
}): void {
  const { table } = args;
  const profiles: Record<string, ColumnProfile> = {};
  const columns: { name: string; kind: ColumnProfile['kind'] }[] = [];
  for (const col of table.columnNames()) {
    const p = profileColumn(table.array(col) as ArrayLike<unknown>);
    profiles[col] = p;
    columns.push({ name: col, kind: p.kind });
  }
  const bound: BoundExtract = {
    name: args.name, source: args.source, defaultSource: args.defaultSource, overridden: args.overridden,
    path: args.path, rows: table.numRows(), columns, fingerprint: extractFingerprint(table, columns), profiles,
  };
  const state = currentRunState();
  // A cell run twice binds the name again: keep the latest binding only.
  state.extracts = state.extracts.filter((e) => e.name !== args.name).concat(bound);
}
