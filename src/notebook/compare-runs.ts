/**
 * Comparison of two runs of a notebook: for each extract, schema changes and drift per column (PSI); metric
 * deltas; the shift of noted predictions; and the state of every decision check now versus before. The exit code
 * a scheduler sees follows from it: 0 when every check holds, 1 when a check fails, 2 when the run failed.
 */
import { columnDrift, type DriftBand, type DriftBin } from './drift-psi.js';
import { diffSchemas, type SchemaChange } from './compare-schema.js';
import type { RunRecord } from './record-file.js';

export interface ColumnDriftRow {
  readonly extract: string;
  readonly column: string;
  readonly kind: string;
  readonly psi: number;
  readonly band: DriftBand;
  /** Date columns are expected to move between extracts; their drift is listed but not flagged. */
  readonly flagged: boolean;
  readonly bins: readonly DriftBin[];
  readonly baselineMean: number | null;
  readonly currentMean: number | null;
}

export interface ExtractComparison {
  readonly name: string;
  readonly baselineSource: string;
  readonly currentSource: string;
  readonly baselineRows: number;
  readonly currentRows: number;
  readonly sameData: boolean;
  readonly schema: readonly SchemaChange[];
  readonly drift: readonly ColumnDriftRow[];
}

export interface MetricDelta {
  readonly name: string;
  readonly baseline: number | null;
  readonly current: number | null;
  readonly delta: number | null;
  readonly higherIsBetter: boolean | null;
  /** 'better' / 'worse' when the direction is known, 'changed' when not, 'same', 'new', 'gone'. */
  readonly verdict: 'better' | 'worse' | 'changed' | 'same' | 'new' | 'gone';
}

export interface PredictionShift {
  readonly name: string;
  readonly baselineMean: number | null;
  readonly currentMean: number | null;
  readonly psi: number | null;
  readonly band: DriftBand | null;
}

export interface CheckChange {
  readonly decision: string;
  readonly label: string;
  /** Whether it held in the baseline run (null: not there). */
  readonly before: boolean | null;
  readonly now: boolean;
  readonly observed: number | string | null;
  readonly detail: string;
}

export interface RunComparison {
  readonly baseline: { readonly id: string; readonly finished: string; readonly status: string };
  readonly current: { readonly id: string; readonly finished: string; readonly status: string };
  readonly extracts: readonly ExtractComparison[];
  readonly metrics: readonly MetricDelta[];
  readonly predictions: readonly PredictionShift[];
  readonly checks: readonly CheckChange[];
  readonly failingChecks: number;
  /** Current run's failure, if it failed. */
  readonly failure: RunRecord['failure'];
  /** 0 every check holds, 1 a check fails, 2 the run failed. */
  readonly exitCode: 0 | 1 | 2;
}

/**
 * Exit code for a run on its own: 2 failed, 1 a decision check fails, else 0.
 * @example
 * runExitCode(readRunRecord('runs/latest.json')); // 1 when a decision check no longer holds
 */
export function runExitCode(run: RunRecord): 0 | 1 | 2 {
  if (run.status !== 'ok') return 2;
  return run.decisions.some((d) => d.checks.some((c) => !c.holds)) ? 1 : 0;
}

function meanOf(p: { kind: string; mean?: number } | undefined): number | null {
  return p && p.kind !== 'categorical' && Number.isFinite(p.mean) ? (p.mean as number) : null;
}

function compareExtracts(a: RunRecord, b: RunRecord): ExtractComparison[] {
  const before = new Map(a.extracts.map((e) => [e.name, e]));
  const out: ExtractComparison[] = [];
  for (const cur of b.extracts) {
    const base = before.get(cur.name);
    if (!base) continue;
    const drift: ColumnDriftRow[] = [];
    for (const col of cur.columns) {
      const bp = base.profiles[col.name], cp = cur.profiles[col.name];
      if (!bp || !cp) continue;
      const d = columnDrift(bp, cp);
      if (!d) continue;
      drift.push({
        extract: cur.name, column: col.name, kind: cp.kind, psi: d.psi, band: d.band, flagged: cp.kind !== 'date' && d.band !== 'stable',
        bins: d.bins, baselineMean: meanOf(bp), currentMean: meanOf(cp),
      });
    }
    drift.sort((x, y) => y.psi - x.psi);
    out.push({
      name: cur.name, baselineSource: base.source, currentSource: cur.source, baselineRows: base.rows, currentRows: cur.rows,
      sameData: base.fingerprint === cur.fingerprint, schema: diffSchemas(base, cur), drift,
    });
  }
  return out;
}

/** Relative tolerance under which a metric counts as unchanged. */
const SAME = 1e-12;

function compareMetrics(a: RunRecord, b: RunRecord): MetricDelta[] {
  const before = new Map(a.metrics.map((m) => [m.name, m]));
  const out: MetricDelta[] = [];
  for (const m of b.metrics) {
    const base = before.get(m.name);
    const hib = m.higherIsBetter ?? base?.higherIsBetter ?? null;
    if (!base) { out.push({ name: m.name, baseline: null, current: m.value, delta: null, higherIsBetter: hib, verdict: 'new' }); continue; }
    const delta = m.value - base.value;
    const same = Math.abs(delta) <= SAME * Math.max(1, Math.abs(base.value)) || (Number.isNaN(m.value) && Number.isNaN(base.value));
    const verdict = same ? 'same' : hib === null || Number.isNaN(delta) ? 'changed' : (delta > 0) === hib ? 'better' : 'worse';
    out.push({ name: m.name, baseline: base.value, current: m.value, delta, higherIsBetter: hib, verdict });
  }
  const now = new Set(b.metrics.map((m) => m.name));
  for (const m of a.metrics) {
    if (!now.has(m.name)) out.push({ name: m.name, baseline: m.value, current: null, delta: null, higherIsBetter: m.higherIsBetter ?? null, verdict: 'gone' });
  }
  return out;
}

function comparePredictions(a: RunRecord, b: RunRecord): PredictionShift[] {
  return Object.entries(b.predictions).map(([name, cp]) => {
    const bp = a.predictions[name];
    const d = bp ? columnDrift(bp, cp) : null;
    return { name, baselineMean: meanOf(bp), currentMean: meanOf(cp), psi: d ? d.psi : null, band: d ? d.band : null };
  });
}

function compareChecks(a: RunRecord, b: RunRecord): CheckChange[] {
  const out: CheckChange[] = [];
  for (const d of b.decisions) {
    const old = a.decisions.find((x) => x.title === d.title);
    for (const c of d.checks) {
      const prev = old?.checks.find((x) => x.label === c.label);
      out.push({ decision: d.title, label: c.label, before: prev ? prev.holds : null, now: c.holds, observed: c.observed, detail: c.detail });
    }
  }
  return out;
}

/**
 * Compare a run with a baseline run.
 * @example
 * const cmp = compareRuns(readRunRecord('out/runs/A'), readRunRecord('out/runs/B'));
 * cmp.exitCode; // 1 when a decision check now fails
 */
export function compareRuns(baseline: RunRecord, current: RunRecord): RunComparison {
  const checks = compareChecks(baseline, current);
  return {
    baseline: { id: baseline.id, finished: baseline.finished, status: baseline.status },
    current: { id: current.id, finished: current.finished, status: current.status },
    extracts: compareExtracts(baseline, current),
    metrics: compareMetrics(baseline, current),
    predictions: comparePredictions(baseline, current),
    checks,
    failingChecks: checks.filter((c) => !c.now).length,
    failure: current.failure,
    exitCode: runExitCode(current),
  };
}
