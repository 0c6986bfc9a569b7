/**
 * The run record (`run.json`): what a headless run bound, measured, decided and how long each cell took, in a
 * form a later run can be compared with. Reading validates the shape and rejects anything else with a clear
 * message; it never evaluates code.
 */
import { existsSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { errors } from '../errors.js';
import type { DecisionRecord } from './decision-types.js';
import type { ColumnProfile } from './record-profile.js';
import type { BoundExtract, NotedMetric } from './record-state.js';

export const RUN_FORMAT = 'coppice-run';
export const RUN_VERSION = 1;

export interface CellTiming {
  /** Position among all cells of the notebook (0-based). */
  readonly cell: number;
  /** Position among code cells (1-based, the execution count). */
  readonly count: number;
  readonly ms: number;
  readonly ok: boolean;
}

export interface RunFailure {
  readonly cell: number;
  readonly count: number;
  readonly kind: string;
  readonly name: string;
  readonly message: string;
  /** First line of the failing cell's source, to recognise it. */
  readonly firstLine: string;
}

export interface ModelNote {
  /** Variable holding the model. */
  readonly name: string;
  readonly kind: string;
  readonly task: string;
  readonly seed: number;
  readonly dataFingerprint: string | null;
}

export interface RunRecord {
  readonly format: typeof RUN_FORMAT;
  readonly version: number;
  readonly id: string;
  readonly status: 'ok' | 'failed';
  readonly notebook: { readonly path: string; readonly fingerprint: string; readonly cells: number };
  readonly started: string;
  readonly finished: string;
  readonly ms: number;
  readonly extracts: readonly BoundExtract[];
  readonly metrics: readonly NotedMetric[];
  readonly tables: Readonly<Record<string, readonly Record<string, unknown>[]>>;
  readonly predictions: Readonly<Record<string, ColumnProfile>>;
  readonly decisions: readonly DecisionRecord[];
  readonly models: readonly ModelNote[];
  readonly cells: readonly CellTiming[];
  readonly failure: RunFailure | null;
  readonly affectsPeople: readonly string[];
  readonly versions: Readonly<Record<string, string>>;
  /** The run this one was compared with, if any. */
  readonly comparedWith: string | null;
}

const REQUIRED: readonly [keyof RunRecord, string][] = [
  ['id', 'string'], ['status', 'string'], ['notebook', 'object'], ['started', 'string'], ['finished', 'string'],
  ['extracts', 'array'], ['metrics', 'array'], ['decisions', 'array'], ['cells', 'array'], ['versions', 'object'],
];

function typeOf(v: unknown): string {
  return Array.isArray(v) ? 'array' : v === null ? 'null' : typeof v;
}

/**
 * Check that a parsed value is a run record this build reads.
 * @example
 * validateRunRecord(JSON.parse(text), 'out/runs/x/run.json');
 */
export function validateRunRecord(value: unknown, path: string): RunRecord {
  if (!value || typeof value !== 'object' || Array.isArray(value)) throw errors.badRunRecord(path, 'not a JSON object');
  const r = value as Record<string, unknown>;
  if (r.format !== RUN_FORMAT) throw errors.badRunRecord(path, `format is ${JSON.stringify(r.format)}, expected "${RUN_FORMAT}"`);
  if (typeof r.version !== 'number' || r.version > RUN_VERSION) {
    throw errors.badRunRecord(path, `version ${JSON.stringify(r.version)}; this build reads version ${RUN_VERSION}`);
  }
  for (const [key, type] of REQUIRED) {
    if (typeOf(r[key]) !== type) throw errors.badRunRecord(path, `field ${key} should be ${type === 'array' ? 'an array' : `a ${type}`}`);
  }
  if (r.status !== 'ok' && r.status !== 'failed') throw errors.badRunRecord(path, `status ${JSON.stringify(r.status)}`);
  for (const e of r.extracts as unknown[]) {
    const x = e as Record<string, unknown>;
    if (typeof x?.name !== 'string' || !Array.isArray(x.columns) || typeOf(x.profiles) !== 'object') {
      throw errors.badRunRecord(path, 'an extract entry lacks name, columns or profiles');
    }
  }
  return {
    tables: {}, predictions: {}, models: [], failure: null, affectsPeople: [], comparedWith: null, ms: 0,
    ...(r as object),
  } as unknown as RunRecord;
}

/**
 * Where a run record is: a `run.json` file, a run folder holding one, or an output folder whose `latest.json`
 * points at a run. Returns null when none is found.
 * @example
 * locateRunRecord('notebooks-demo/delivery-runs'); // '.../runs/2025-06-01T10-00-00-000Z/run.json'
 */
export function locateRunRecord(path: string): string | null {
  if (!existsSync(path)) return null;
  if (statSync(path).isFile()) return path;
  const direct = join(path, 'run.json');
  if (existsSync(direct)) return direct;
  const latest = readLatest(path);
  return latest ? join(path, 'runs', latest, 'run.json') : null;
}

/** The run id `latest.json` in an output folder points at, or null. */
export function readLatest(outDir: string): string | null {
  const file = join(outDir, 'latest.json');
  if (!existsSync(file)) return null;
  try {
    const v = JSON.parse(readFileSync(file, 'utf8')) as { run?: unknown };
    return typeof v.run === 'string' && /^[\w.-]+$/.test(v.run) && existsSync(join(outDir, 'runs', v.run, 'run.json')) ? v.run : null;
  } catch {
    return null;
  }
}

/**
 * Read and validate a run record from a file, run folder or output folder.
 * @example
 * const before = readRunRecord('out/runs/2025-06-01T10-00-00-000Z');
 */
export function readRunRecord(path: string): RunRecord {
  const file = locateRunRecord(path);
  if (!file) throw errors.badRunRecord(path, 'no run.json there (expected a run.json, a run folder or an output folder with latest.json)');
  let parsed: unknown;
  try {
    parsed = JSON.parse(readFileSync(file, 'utf8'));
  } catch (err) {
    throw errors.badRunRecord(file, `not valid JSON (${(err as Error).message})`);
  }
  return validateRunRecord(parsed, file);
}
