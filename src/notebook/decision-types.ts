/**
 * The shape of a decision record and its checks (shared by decisions, the runner, the report and comparison).
 */

/** A metric must stay at or above / at or below a bound (either or both). */
export interface MetricCheck {
  readonly metric: string;
  readonly atLeast?: number;
  readonly atMost?: number;
  /** The value to test; when absent it is looked up among the metrics noted so far. */
  readonly value?: number;
}

/** A feature must rank among the first `withinTop` rows of an importance table. */
export interface RankCheck {
  readonly feature: string;
  readonly withinTop: number;
  /** Name of a noted table, or the rows themselves. */
  readonly table: string | readonly Record<string, unknown>[];
  /** Column holding feature names. __Default:__ `'feature'`. */
  readonly nameColumn?: string;
  /** Column ranked, larger first. __Default:__ `'value'` (else `'importance'`). */
  readonly rankColumn?: string;
}

/** Any condition the notebook evaluates itself. */
export interface CustomCheck {
  readonly label: string;
  readonly holds: boolean;
  readonly detail?: string;
}

export type CheckSpec = MetricCheck | RankCheck | CustomCheck;

/** A check evaluated: whether it holds now, and what was seen. */
export interface CheckResult {
  /** Short readable statement, e.g. `auc >= 0.75` or `distance_km in top 3 of importance`. */
  readonly label: string;
  readonly kind: 'metric' | 'rank' | 'custom';
  readonly holds: boolean;
  /** What was observed: the metric value, the feature's rank, ... */
  readonly observed: number | string | null;
  /** Why it fails, or what it saw. */
  readonly detail: string;
}

/** A piece of evidence named by a decision and whether it was shown in this session. */
export interface EvidenceItem {
  readonly name: string;
  readonly found: boolean;
  /** 'metric', 'table', 'chart', ... when found. */
  readonly kind: string | null;
  /** A metric's value when the evidence is a metric. */
  readonly value: number | null;
}

export interface DecisionRecord {
  readonly title: string;
  readonly reasoning: string;
  readonly evidence: readonly EvidenceItem[];
  readonly checks: readonly CheckResult[];
  /** True when every check holds. */
  readonly holds: boolean;
  /** Flags of use affecting people, if the decision declares any (e.g. ['credit']). */
  readonly affects: readonly string[];
  /** ISO time it was recorded. */
  readonly recorded: string;
}
