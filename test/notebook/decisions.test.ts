import { beforeEach, describe, expect, it } from 'vitest';
import { recordDecision } from '../../src/notebook/decisions.js';
import { decisionHtml, decisionText, DECISION_MIME, decisionBundle } from '../../src/notebook/decision-card.js';
import { currentRunState, resetRunState } from '../../src/notebook/record-state.js';
import { noteMetric, noteShown, noteTable } from '../../src/notebook/record-notes.js';
import { installSink } from '../../src/notebook/display-sink.js';
import type { DisplayMessage } from '../../src/notebook/display-types.js';

describe('recordDecision(input)', () => {
  beforeEach(() => { resetRunState(); });

  it('evaluates checks, resolves evidence, stores the record and shows one card', () => {
    noteMetric('holdout auc', 0.81);
    noteTable('importance', [{ feature: 'distance_km', value: 2 }, { feature: 'weight', value: 1 }]);
    noteShown('learning curve', 'chart');
    const shown: DisplayMessage[] = [];
    const restore = installSink({ onDisplay: (m) => shown.push(m) });
    let d;
    try {
      d = recordDecision({
        title: 'Use the boosted model',
        reasoning: 'Best held-out score.',
        evidence: ['holdout auc', 'learning curve', 'never shown'],
        checks: ['holdout auc >= 0.8', 'weight in top 1 of importance'],
      });
    } finally { restore(); }
    expect(d.checks.map((c) => c.holds)).toEqual([true, false]);
    expect(d.holds).toBe(false);
    expect(d.evidence).toEqual([
      { name: 'holdout auc', found: true, kind: 'metric', value: 0.81 },
      { name: 'learning curve', found: true, kind: 'chart', value: null },
      { name: 'never shown', found: false, kind: null, value: null },
    ]);
    expect(currentRunState().decisions).toHaveLength(1);
    expect(shown).toHaveLength(1);
    expect(Object.keys(shown[0].data).sort()).toEqual([DECISION_MIME, 'text/html', 'text/plain'].sort());
    expect(typeof shown[0].data[DECISION_MIME]).toBe('object');
  });

  it('replaces a decision with the same title when the cell runs again', () => {
    recordDecision({ title: 'T', display: false });
    recordDecision({ title: 'T', checks: [{ label: 'ok', holds: true }], display: false });
    expect(currentRunState().decisions).toHaveLength(1);
    expect(currentRunState().decisions[0].checks).toHaveLength(1);
  });

  it('rejects a missing title, bad evidence and bad checks', () => {
    expect(() => recordDecision({ title: '  ' })).toThrow(/title/);
    expect(() => recordDecision({ title: 'x', evidence: 'auc' as unknown as string[] })).toThrow(/evidence/);
    expect(() => recordDecision({ title: 'x', checks: ['auc ~ 1'] })).toThrow(/check/i);
    expect(() => recordDecision(null as unknown as { title: string })).toThrow(/title/);
  });

  it('records uses affecting people', () => {
    recordDecision({ title: 'Price with it', affects: ['pricing'], display: false });
    expect([...currentRunState().affectsPeople]).toEqual(['pricing']);
  });
});

describe('decisionHtml(record)', () => {
  it('escapes every value from the notebook', () => {
    resetRunState();
    const d = recordDecision({
      title: '<script>alert(1)</script>', reasoning: 'a & b', evidence: ['<img src=x>'],
      checks: [{ label: '"<b>"', holds: false }], display: false,
    });
    const html = decisionHtml(d);
    expect(html).not.toContain('<script>');
    expect(html).not.toContain('<img');
    expect(html).toContain('&lt;script&gt;alert(1)&lt;/script&gt;');
    expect(html).toContain('a &amp; b');
    expect(decisionText(d)).toContain('[FAILS] "<b>"');
    expect(decisionBundle(d)['text/plain']).toBe(decisionText(d));
  });
});
