import { describe, expect, it } from 'vitest';
import { compareRuns, runExitCode } from '../../src/notebook/compare-runs.js';
import { comparisonText } from '../../src/notebook/compare-text.js';
import { profileColumn } from '../../src/notebook/record-profile.js';
import { boundExtract, decision, runRecord } from './record-fixtures.js';

// Expected values follow from the inline records by hand (PSI arithmetic is checked in drift-psi.test.ts).
const km = Array.from({ length: 100 }, (_, i) => i);

describe('compareRuns(baseline, current)', () => {
  it('reports schema changes, drift, metric deltas, prediction shift and failing checks', () => {
    const a = runRecord('A', {
      extracts: [boundExtract('parcels', { km, depot: km.map((i) => (i % 2 ? 'n' : 's')), when: km.map((i) => `2025-01-${String(1 + (i % 28)).padStart(2, '0')}`) }, 'fa')],
      metrics: [{ name: 'rmse', value: 2, higherIsBetter: false }, { name: 'auc', value: 0.8, higherIsBetter: true }, { name: 'old', value: 1 }],
      predictions: { late: profileColumn(km.map((i) => i / 100)) },
      decisions: [decision('Use it', [['rmse <= 2.5', true], ['auc >= 0.75', true]])],
    });
    const b = runRecord('B', {
      extracts: [boundExtract('parcels', { km: km.map((x) => x + 30), depot: km.map((i) => (i % 3 ? 'n' : 'e')), when: km.map((i) => `2025-03-${String(1 + (i % 28)).padStart(2, '0')}`) }, 'fb')],
      metrics: [{ name: 'rmse', value: 3, higherIsBetter: false }, { name: 'auc', value: 0.85 }, { name: 'new', value: 5 }],
      predictions: { late: profileColumn(km.map((i) => i / 100 + 0.3)) },
      decisions: [decision('Use it', [['rmse <= 2.5', false], ['auc >= 0.75', true]]), decision('Later', [['x', true]])],
    });
    const c = compareRuns(a, b);
    const e = c.extracts[0];
    expect(e.sameData).toBe(false);
    expect(e.schema.map((s) => s.change)).toEqual(['new-categories', 'lost-categories']);
    const byCol = Object.fromEntries(e.drift.map((d) => [d.column, d]));
    expect(byCol.km.band).toBe('major'); // 30% of the rows moved past the top decile edge
    expect(byCol.km.flagged).toBe(true);
    expect(byCol.km.baselineMean).toBeCloseTo(49.5, 12);
    expect(byCol.km.currentMean).toBeCloseTo(79.5, 12);
    expect(byCol.when.kind).toBe('date');
    expect(byCol.when.flagged).toBe(false); // dates are expected to move
    expect(c.metrics).toEqual([
      { name: 'rmse', baseline: 2, current: 3, delta: 1, higherIsBetter: false, verdict: 'worse' },
      { name: 'auc', baseline: 0.8, current: 0.85, delta: expect.closeTo(0.05, 12), higherIsBetter: true, verdict: 'better' },
      { name: 'new', baseline: null, current: 5, delta: null, higherIsBetter: null, verdict: 'new' },
      { name: 'old', baseline: 1, current: null, delta: null, higherIsBetter: null, verdict: 'gone' },
    ]);
    expect(c.predictions[0]).toMatchObject({ name: 'late', baselineMean: expect.closeTo(0.495, 12), currentMean: expect.closeTo(0.795, 12), band: 'major' });
    expect(c.checks.map((k) => [k.label, k.before, k.now])).toEqual([
      ['rmse <= 2.5', true, false], ['auc >= 0.75', true, true], ['x', null, true],
    ]);
    expect(c.failingChecks).toBe(1);
    expect(c.exitCode).toBe(1);
    const text = comparisonText(c);
    expect(text).toMatch(/! km +PSI +\S+ +major +mean 49\.5 → 79\.5/);
    expect(text).toContain('column depot has new categories "e"');
    expect(text).toContain('[FAILS] rmse <= 2.5');
    expect(text).toContain('Exit code 1: a decision check fails.');
    expect(text).toMatch(/when +PSI .* mean 2025-01-1\d → 2025-03-1\d +\(date column: expected to move\)/);
  });

  it('finds no drift and exit code 0 for a run compared with itself', () => {
    const a = runRecord('A', { extracts: [boundExtract('p', { km })], metrics: [{ name: 'm', value: 1 }], decisions: [decision('d', [['c', true]])] });
    const c = compareRuns(a, a);
    expect(c.extracts[0].sameData).toBe(true);
    expect(c.extracts[0].schema).toEqual([]);
    expect(c.extracts[0].drift.every((d) => d.psi === 0)).toBe(true);
    expect(c.metrics[0].verdict).toBe('same');
    expect(c.exitCode).toBe(0);
  });

  it('gives exit code 2 when the current run failed', () => {
    const failed = runRecord('B', { status: 'failed', failure: { cell: 3, count: 2, kind: 'runtime', name: 'Error', message: 'boom', firstLine: 'x()' } });
    expect(runExitCode(failed)).toBe(2);
    const c = compareRuns(runRecord('A'), failed);
    expect(c.exitCode).toBe(2);
    expect(comparisonText(c)).toContain('Run failed at cell 2: Error: boom');
  });
});
