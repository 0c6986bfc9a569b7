/**
 * The comparison of two runs as plain text for a terminal.
 */
import { describeSchemaChange } from './compare-schema.js';
import type { RunComparison } from './compare-runs.js';

function num(x: number | null): string {
  if (x === null) return '–';
  if (!Number.isFinite(x)) return String(x);
  const a = Math.abs(x);
  return a !== 0 && (a < 1e-3 || a >= 1e6) ? x.toExponential(2) : String(Number(x.toPrecision(4)));
}

function signed(x: number | null): string {
  if (x === null) return '';
  return `${x > 0 ? '+' : x < 0 ? '−' : '±'}${num(Math.abs(x))}`;
}

/** A column mean for display: dates (kept as epoch days) as ISO dates, other numbers as numbers. */
export function meanText(x: number | null, kind: string): string {
  if (x === null || kind !== 'date' || !Number.isFinite(x)) return num(x);
  return new Date(Math.round(x * 86_400_000)).toISOString().slice(0, 10);
}

/** Why the exit code is what it is, in words. */
export function exitCodeReason(code: 0 | 1 | 2): string {
  return code === 0 ? 'every decision check holds' : code === 1 ? 'a decision check fails' : 'the run failed';
}

/**
 * Text report of a comparison.
 * @param options.stableLimit how many stable columns to list by name. __Default:__ `0` (only counted).
 * @example
 * process.stdout.write(comparisonText(compareRuns(before, after)));
 */
export function comparisonText(c: RunComparison, options: { stableLimit?: number } = {}): string {
  const out: string[] = [];
  out.push(`Compared run ${c.current.id} with run ${c.baseline.id}`);
  for (const e of c.extracts) {
    out.push('');
    out.push(`Extract ${e.name}: ${e.baselineRows} → ${e.currentRows} rows${e.sameData ? ' (same data)' : ''}`);
    if (e.baselineSource !== e.currentSource) out.push(`  source: ${e.baselineSource} → ${e.currentSource}`);
    if (e.schema.length) {
      out.push('  Schema changes:');
      for (const s of e.schema) out.push(`    ${describeSchemaChange(s)}`);
    } else out.push('  Schema: unchanged');
    const moving = e.drift.filter((d) => d.band !== 'stable');
    const stable = e.drift.filter((d) => d.band === 'stable');
    out.push('  Drift by population stability index (bands 0.1 / 0.25, common practice):');
    const width = Math.max(8, ...e.drift.map((d) => d.column.length));
    for (const d of [...moving, ...stable.slice(0, options.stableLimit ?? 0)]) {
      const mean = d.baselineMean !== null && d.currentMean !== null ? `   mean ${meanText(d.baselineMean, d.kind)} → ${meanText(d.currentMean, d.kind)}` : '';
      const note = d.flagged ? '' : d.band === 'stable' ? '' : '  (date column: expected to move)';
      out.push(`    ${d.flagged ? '!' : ' '} ${d.column.padEnd(width)}  PSI ${num(d.psi).padStart(6)}  ${d.band}${mean}${note}`);
    }
    const shownStable = Math.min(stable.length, options.stableLimit ?? 0);
    if (stable.length > shownStable) out.push(`      ${stable.length - shownStable} more column(s) stable (PSI < 0.1)`);
  }
  if (c.metrics.length) {
    out.push('');
    out.push('Metrics:');
    const width = Math.max(8, ...c.metrics.map((m) => m.name.length));
    for (const m of c.metrics) {
      out.push(`    ${m.name.padEnd(width)}  ${num(m.baseline).padStart(8)} → ${num(m.current).padEnd(8)} ${signed(m.delta).padStart(8)}  ${m.verdict}`);
    }
  }
  if (c.predictions.length) {
    out.push('');
    out.push('Predictions on the new data:');
    for (const p of c.predictions) {
      const psi = p.psi === null ? 'no baseline' : `PSI ${num(p.psi)} ${p.band}`;
      out.push(`    ${p.name}: mean ${num(p.baselineMean)} → ${num(p.currentMean)}, ${psi}`);
    }
  }
  out.push('');
  if (c.checks.length) {
    out.push(`Decision checks: ${c.failingChecks} of ${c.checks.length} fail`);
    for (const k of c.checks) {
      const was = k.before === null ? 'new check' : k.before ? 'held before' : 'failed before too';
      out.push(`    [${k.now ? 'holds' : 'FAILS'}] ${k.label}   (${k.detail}; ${was})`);
    }
  } else out.push('Decision checks: none recorded');
  if (c.failure) out.push(`Run failed at cell ${c.failure.count}: ${c.failure.name}: ${c.failure.message}`);
  out.push(`Exit code ${c.exitCode}: ${exitCodeReason(c.exitCode)}.`);
  return `${out.join('\n')}\n`;
}
