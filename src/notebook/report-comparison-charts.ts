/**
 * Charts for the comparison section of a report: drift per column of each extract, and metric changes. Metrics
 * whose direction (higher or lower is better) was not noted stay in the table only: the chart would colour them
 * as better or worse without knowing.
 */
import { chartDrift, chartMetricDeltas } from '../charts/index.js';
import type { RunComparison } from './compare-runs.js';
import type { ComparisonChart } from './report-comparison.js';

/**
 * The comparison charts, as titled vega-lite specs.
 * @example
 * renderReport({ notebook, record, comparison, comparisonCharts: comparisonCharts(comparison) });
 */
export function comparisonCharts(c: RunComparison): ComparisonChart[] {
  const out: ComparisonChart[] = [];
  for (const e of c.extracts) {
    // Date columns are expected to move between extracts and would dwarf the rest; they stay in the table.
    const rows = e.drift.filter((d) => d.kind !== 'date' && Number.isFinite(d.psi)).map((d) => ({ feature: d.column, psi: d.psi }));
    if (rows.length) out.push({ title: `Drift in ${e.name}`, spec: chartDrift(rows, { title: `Drift by column: ${e.name} (date columns left out)` }) });
  }
  const metrics = c.metrics
    .filter((m) => m.baseline !== null && m.current !== null && Number.isFinite(m.baseline) && Number.isFinite(m.current) && m.higherIsBetter !== null)
    .map((m) => ({ metric: m.name, before: m.baseline as number, after: m.current as number, higherIsBetter: m.higherIsBetter as boolean }));
  if (metrics.length) out.push({ title: 'Metric changes', spec: chartMetricDeltas(metrics, { runs: [c.baseline.id, c.current.id] }) });
  return out;
}
