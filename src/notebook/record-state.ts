/**
 * What the current notebook session has recorded so far: the extracts it bound, the metrics, tables and
 * predictions it noted, and the decisions it recorded. The headless runner resets this state before a run and
 * reads it afterwards to write the run record; in an interactive kernel it simply accumulates.
 *
 * The state lives on `globalThis` under a registered symbol so that every copy of this module (the notebook may
 * import coppice through a different path than the runner) sees the same session.
 */
import type { ColumnProfile } from './record-profile.js';
import type { DecisionRecord } from './decision-types.js';

/** An extract the notebook bound by name (see `declareExtract`). */
export interface BoundExtract {
  readonly name: string;
  /** The source used: the override if one was given, else the default. */
  readonly source: string;
  /** The notebook's default source. */
  readonly defaultSource: string;
  readonly overridden: boolean;
  /** Absolute path when the source is a file, else null. */
  readonly path: string | null;
  readonly rows: number;
  readonly columns: readonly { readonly name: string; readonly kind: ColumnProfile['kind'] }[];
  /** FNV-1a 64 over column names, kinds and every value (see `extractFingerprint`). */
  readonly fingerprint: string;
  readonly profiles: Readonly<Record<string, ColumnProfile>>;
}

/** A named metric the notebook reported. */
export interface NotedMetric {
  readonly name: string;
  readonly value: number;
  /** Whether a larger value is better, when known. */
  readonly higherIsBetter?: boolean;
}

export interface RunState {
  extractOverrides: Record<string, string>;
  extracts: BoundExtract[];
  metrics: Map<string, NotedMetric>;
  tables: Map<string, readonly Record<string, unknown>[]>;
  predictions: Map<string, ColumnProfile>;
  /** Names of everything shown so far (metrics, tables, charts), with their kind, for decision evidence. */
  shown: Map<string, string>;
  decisions: DecisionRecord[];
  /** Flags of use affecting people ("credit", "insurance", "hiring", "pricing", ...) noted by the notebook. */
  affectsPeople: Set<string>;
}

const KEY = Symbol.for('coppice.notebook.runState');

function fresh(): RunState {
  return {
    extractOverrides: {}, extracts: [], metrics: new Map(), tables: new Map(), predictions: new Map(),
    shown: new Map(), decisions: [], affectsPeople: new Set(),
  };
}

/**
 * The current session's state (created on first use).
 * @example
 * currentRunState().metrics.get('holdout auc');
 */
export function currentRunState(): RunState {
  const g = globalThis as unknown as Record<symbol, RunState | undefined>;
  let s = g[KEY];
  if (!s) { s = fresh(); g[KEY] = s; }
  return s;
}

/**
 * Start a new session, optionally binding extract names to sources (used by the headless runner).
 * @example
 * resetRunState({ shipments: '/data/shipments-2025-06.csv' });
 */
export function resetRunState(extractOverrides: Record<string, string> = {}): RunState {
  const s = fresh();
  s.extractOverrides = { ...extractOverrides };
  (globalThis as unknown as Record<symbol, RunState>)[KEY] = s;
  return s;
}

/**
 * Bind extract names to sources for the rest of the session (later calls add to earlier ones).
 * @example
 * setExtractOverrides({ shipments: 'sql:SELECT * FROM shipments' });
 */
export function setExtractOverrides(overrides: Record<string, string>): void {
  Object.assign(currentRunState().extractOverrides, overrides);
}
