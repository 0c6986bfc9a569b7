/**
 * Decision checks: conditions a modelling decision relies on, evaluated when the decision is recorded and again
 * on every rerun. A check is an object (`MetricCheck`, `RankCheck`, `CustomCheck`) or a short text:
 *
 *   `holdout auc >= 0.75`            a noted metric at or above a bound (also `<=`, `>`, `<`)
 *   `distance_km in top 3 of importance`   a feature among the first 3 rows of a noted table
 */
import { errors } from '../errors.js';
import type { CheckResult, CheckSpec, CustomCheck, MetricCheck, RankCheck } from './decision-types.js';
import type { RunState } from './record-state.js';

/** A metric check that also allows strict bounds (from `>` / `<` in text). */
interface BoundCheck extends MetricCheck {
  readonly above?: number;
  readonly below?: number;
}

const COMPARISON = /^(.+?)\s*(>=|<=|>|<|≥|≤)\s*(-?(?:\d+\.?\d*|\.\d+)(?:e[+-]?\d+)?)\s*$/i;
const RANKING = /^(.+?)\s+in\s+top\s+(\d+)\s+of\s+(.+)$/i;

/**
 * Parse a check written as text.
 * @example
 * parseCheck('holdout auc >= 0.75'); // { metric: 'holdout auc', atLeast: 0.75 }
 * parseCheck('distance_km in top 3 of importance'); // { feature: 'distance_km', withinTop: 3, table: 'importance' }
 */
export function parseCheck(text: string): CheckSpec {
  const t = text.trim();
  const rank = RANKING.exec(t);
  if (rank) {
    const k = Number(rank[2]);
    if (!(k >= 1)) throw errors.badCheck(text, 'top k needs k >= 1');
    return { feature: unquote(rank[1]), withinTop: k, table: unquote(rank[3]) };
  }
  const cmp = COMPARISON.exec(t);
  if (cmp) {
    const metric = unquote(cmp[1]);
    const bound = Number(cmp[3]);
    switch (cmp[2]) {
      case '>=': case '≥': return { metric, atLeast: bound };
      case '<=': case '≤': return { metric, atMost: bound };
      case '>': return { metric, above: bound } as BoundCheck;
      default: return { metric, below: bound } as BoundCheck;
    }
  }
  throw errors.badCheck(text, 'expected "<metric> >= <number>", "<metric> <= <number>" or "<feature> in top <k> of <table>"');
}

function unquote(s: string): string {
  const t = s.trim();
  return /^(["'`]).*\1$/.test(t) ? t.slice(1, -1) : t;
}

function isMetric(c: CheckSpec): c is BoundCheck {
  return typeof (c as MetricCheck).metric === 'string';
}

function isRank(c: CheckSpec): c is RankCheck {
  return typeof (c as RankCheck).feature === 'string';
}

function isCustom(c: CheckSpec): c is CustomCheck {
  return typeof (c as CustomCheck).label === 'string' && typeof (c as CustomCheck).holds === 'boolean';
}

/**
 * Validate a check given as an object or text; returns the object form.
 * @example
 * normalizeCheck('holdout mae <= 0.6'); // { metric: 'holdout mae', atMost: 0.6 }
 * normalizeCheck({ feature: 'truck_temp_c', withinTop: 3, table: 'importance' }); // returned as given
 */
export function normalizeCheck(check: unknown): CheckSpec {
  if (typeof check === 'string') return parseCheck(check);
  if (!check || typeof check !== 'object') throw errors.badCheck(check, 'expected an object or text');
  const c = check as CheckSpec;
  if (isMetric(c)) {
    const bounds = [c.atLeast, c.atMost, c.above, c.below].filter((b) => b !== undefined);
    if (bounds.length === 0) throw errors.badCheck(check, 'a metric check needs atLeast or atMost');
    if (bounds.some((b) => typeof b !== 'number' || Number.isNaN(b))) throw errors.badCheck(check, 'bounds must be numbers');
    return c;
  }
  if (isRank(c)) {
    if (!Number.isInteger(c.withinTop) || c.withinTop < 1) throw errors.badCheck(check, 'withinTop must be an integer >= 1');
    if (typeof c.table !== 'string' && !Array.isArray(c.table)) throw errors.badCheck(check, 'table must be a name or rows');
    return c;
  }
  if (isCustom(c)) return c;
  throw errors.badCheck(check, 'expected a metric, a feature rank or a label with holds');
}

function fmt(x: number): string {
  if (!Number.isFinite(x)) return String(x);
  const a = Math.abs(x);
  return a !== 0 && (a < 1e-3 || a >= 1e6) ? x.toExponential(3) : String(Number(x.toPrecision(4)));
}

function metricLabel(c: BoundCheck): string {
  const parts: string[] = [];
  if (c.atLeast !== undefined) parts.push(`${c.metric} >= ${c.atLeast}`);
  if (c.above !== undefined) parts.push(`${c.metric} > ${c.above}`);
  if (c.atMost !== undefined) parts.push(`${c.metric} <= ${c.atMost}`);
  if (c.below !== undefined) parts.push(`${c.metric} < ${c.below}`);
  return parts.join(' and ');
}

function evaluateMetric(c: BoundCheck, state: RunState): CheckResult {
  const label = metricLabel(c);
  const value = c.value ?? state.metrics.get(c.metric)?.value;
  if (value === undefined) {
    return { label, kind: 'metric', holds: false, observed: null, detail: `metric ${JSON.stringify(c.metric)} was not reported in this run` };
  }
  if (!Number.isFinite(value)) return { label, kind: 'metric', holds: false, observed: String(value), detail: `value is ${value}` };
  const holds = (c.atLeast === undefined || value >= c.atLeast) && (c.above === undefined || value > c.above)
    && (c.atMost === undefined || value <= c.atMost) && (c.below === undefined || value < c.below);
  return { label, kind: 'metric', holds, observed: value, detail: `${c.metric} = ${fmt(value)}` };
}

function rankColumnOf(rows: readonly Record<string, unknown>[], given: string | undefined): string | null {
  if (given) return given;
  const first = rows[0] ?? {};
  for (const k of ['value', 'importance']) if (k in first) return k;
  return null;
}

function evaluateRank(c: RankCheck, state: RunState): CheckResult {
  const tableName = typeof c.table === 'string' ? c.table : 'the given table';
  const label = `${c.feature} in top ${c.withinTop} of ${tableName}`;
  const rows = typeof c.table === 'string' ? state.tables.get(c.table) : c.table;
  const fail = (detail: string, observed: number | null = null): CheckResult =>
    ({ label, kind: 'rank', holds: false, observed, detail });
  if (!rows) return fail(`table ${JSON.stringify(tableName)} was not reported in this run`);
  const nameCol = c.nameColumn ?? 'feature';
  const rankCol = rankColumnOf(rows, c.rankColumn);
  if (!rankCol) return fail(`table ${JSON.stringify(tableName)} has no value or importance column`);
  const score = (r: Record<string, unknown>): number => {
    const v = Number(r[rankCol]);
    return Number.isNaN(v) ? -Infinity : v;
  };
  const ordered = rows.map((r, i) => ({ r, i })).sort((a, b) => score(b.r) - score(a.r) || a.i - b.i);
  const at = ordered.findIndex((o) => String(o.r[nameCol]) === c.feature);
  if (at < 0) return fail(`${c.feature} is not in ${tableName}`);
  const rank = at + 1;
  return { label, kind: 'rank', holds: rank <= c.withinTop, observed: rank, detail: `${c.feature} ranks ${rank} of ${rows.length}` };
}

/**
 * Evaluate a check against what the session has noted.
 * @example
 * evaluateCheck({ metric: 'auc', atLeast: 0.7, value: 0.81 }, currentRunState()).holds; // true
 */
export function evaluateCheck(check: CheckSpec, state: RunState): CheckResult {
  if (isMetric(check)) return evaluateMetric(check, state);
  if (isRank(check)) return evaluateRank(check, state);
  if (!isCustom(check)) throw errors.badCheck(check, 'expected a metric, a feature rank or a label with holds');
  return { label: check.label, kind: 'custom', holds: check.holds, observed: null, detail: check.detail ?? (check.holds ? 'holds' : 'does not hold') };
}
