/**
 * Recording a modelling decision: what was chosen, why, the evidence shown for it, and checks that must keep
 * holding. Checks are evaluated now (against the metrics and tables noted in this session) and again on every
 * rerun, since a rerun executes the same call. The decision is shown as a card and kept for the run record; the
 * headless runner writes it into the executed notebook's metadata.
 */
import { errors } from '../errors.js';
import { evaluateCheck, normalizeCheck } from './decision-checks.js';
import { decisionBundle } from './decision-card.js';
import type { CheckSpec, DecisionRecord, EvidenceItem } from './decision-types.js';
import { emitDisplay } from './display-sink.js';
import { currentRunState, type RunState } from './record-state.js';

export interface DecisionInput {
  /** What was decided, in one line. */
  readonly title: string;
  /** Why. Blank lines separate paragraphs. __Default:__ `''`. */
  readonly reasoning?: string;
  /** Names of metrics, tables or charts shown earlier that support it. __Default:__ `[]`. */
  readonly evidence?: readonly string[];
  /** Conditions that must keep holding (objects or text such as `'auc >= 0.75'`). __Default:__ `[]`. */
  readonly checks?: readonly (CheckSpec | string)[];
  /** Uses affecting people the model serves (e.g. `['credit']`); the report adds cautions. __Default:__ `[]`. */
  readonly affects?: readonly string[];
  /** Show the card as a display output. __Default:__ `true`. */
  readonly display?: boolean;
}

function evidenceItem(name: string, state: RunState): EvidenceItem {
  const kind = state.shown.get(name) ?? null;
  const metric = state.metrics.get(name);
  return { name, found: kind !== null, kind, value: metric ? metric.value : null };
}

function stringList(value: unknown, field: string): string[] {
  if (value === undefined) return [];
  if (!Array.isArray(value) || value.some((v) => typeof v !== 'string')) throw errors.badDecision(field, 'expected a list of names');
  return value as string[];
}

/**
 * Record a modelling decision, evaluate its checks and show it as a card.
 * @example
 * recordDecision({
 *   title: 'Use the boosted model',
 *   reasoning: 'Best held-out log loss; the forest is close but slower to score.',
 *   evidence: ['model comparison', 'holdout auc'],
 *   checks: ['holdout auc >= 0.75', 'distance_km in top 3 of importance'],
 * });
 */
export function recordDecision(input: DecisionInput): DecisionRecord {
  if (!input || typeof input !== 'object') throw errors.badDecision('input', 'expected an object with a title');
  if (typeof input.title !== 'string' || input.title.trim() === '') throw errors.badDecision('title', 'expected a non-empty text');
  if (input.reasoning !== undefined && typeof input.reasoning !== 'string') throw errors.badDecision('reasoning', 'expected text');
  const evidenceNames = stringList(input.evidence, 'evidence');
  const affects = stringList(input.affects, 'affects');
  if (input.checks !== undefined && !Array.isArray(input.checks)) throw errors.badDecision('checks', 'expected a list');
  const specs = (input.checks ?? []).map(normalizeCheck);
  const state = currentRunState();
  const checks = specs.map((c) => evaluateCheck(c, state));
  const record: DecisionRecord = {
    title: input.title.trim(),
    reasoning: (input.reasoning ?? '').trim(),
    evidence: evidenceNames.map((n) => evidenceItem(n, state)),
    checks,
    holds: checks.every((c) => c.holds),
    affects,
    recorded: new Date().toISOString(),
  };
  // Running the cell again replaces the decision with the same title.
  state.decisions = state.decisions.filter((d) => d.title !== record.title).concat(record);
  for (const a of affects) state.affectsPeople.add(a);
  if (input.display !== false) emitDisplay({ data: decisionBundle(record), metadata: {}, transient: {} });
  // The card is already shown; when a cell ends with this call its value prints as one short line, not a dump.
  Object.defineProperty(record, Symbol.for('nodejs.util.inspect.custom'), {
    enumerable: false,
    value: () => `[decision recorded: ${record.title} — ${checks.filter((c) => c.holds).length} of ${checks.length} checks hold]`,
  });
  return record;
}
