/**
 * Notes a notebook makes for its run record: named metrics, tables and prediction sets. Decisions cite them as
 * evidence and check them; a rerun compares them with the previous run.
 */
import { errors } from '../errors.js';
import { currentRunState } from './record-state.js';
import { profileColumn } from './record-profile.js';

function checkName(name: unknown, what: string): string {
  if (typeof name !== 'string' || name.trim() === '') throw errors.badOption(`${what} name`, name, 'a non-empty string');
  return name.trim();
}

/**
 * Note a named metric (the latest value for a name wins) and return the value.
 * @param options.higherIsBetter whether larger is better, for the comparison's wording. __Default:__ unknown.
 * @example
 * const auc = noteMetric('holdout auc', rocAuc(y, p), { higherIsBetter: true });
 */
export function noteMetric(name: string, value: number, options: { higherIsBetter?: boolean } = {}): number {
  const key = checkName(name, 'metric');
  if (typeof value !== 'number') throw errors.badOption(`metric ${key}`, value, 'a number');
  const state = currentRunState();
  state.metrics.set(key, { name: key, value, ...(options.higherIsBetter === undefined ? {} : { higherIsBetter: options.higherIsBetter }) });
  state.shown.set(key, 'metric');
  return value;
}

/**
 * Note a named table (array of row objects), e.g. an importance table a decision check ranks; returns the rows.
 * @example
 * noteTable('importance', [{ feature: 'distance_km', value: 0.4 }, { feature: 'weight_kg', value: 0.2 }]);
 */
export function noteTable<R extends Record<string, unknown>>(name: string, rows: readonly R[]): readonly R[] {
  const key = checkName(name, 'table');
  if (!Array.isArray(rows)) throw errors.badOption(`table ${key}`, rows, 'an array of row objects');
  const state = currentRunState();
  state.tables.set(key, rows.map((r) => ({ ...r })));
  state.shown.set(key, 'table');
  return rows;
}

/**
 * Note a set of predictions (numbers: probabilities or values) so a rerun can report how they shifted.
 * @example
 * notePredictions('late probability', probs);
 */
export function notePredictions(name: string, values: ArrayLike<number>): void {
  const key = checkName(name, 'predictions');
  const state = currentRunState();
  state.predictions.set(key, profileColumn(Array.from(values)));
  state.shown.set(key, 'predictions');
}

/**
 * Note that something was shown under a name (a chart, a table), so a decision can cite it as evidence.
 * @example
 * noteShown('learning curve', 'chart');
 */
export function noteShown(name: string, kind: string): void {
  currentRunState().shown.set(checkName(name, kind), kind);
}

/**
 * Mark this notebook's use as affecting people (e.g. 'credit', 'insurance', 'hiring', 'pricing'); the report then
 * carries the usual cautions.
 * @example
 * noteAffectsPeople('pricing');
 */
export function noteAffectsPeople(...uses: string[]): void {
  const s = currentRunState().affectsPeople;
  for (const u of uses) s.add(checkName(u, 'use'));
}
