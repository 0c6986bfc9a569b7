import { describe, expect, it } from 'vitest';
import { progressLine, startProgress } from '../../src/notebook/progress.js';
import { installSink } from '../../src/notebook/display-sink.js';
import type { DisplayMessage } from '../../src/notebook/display-types.js';

describe('progressLine(label, unit, done, total, scores, elapsed)', () => {
  it('states step of total, scores, elapsed and a linear estimate to finish', () => {
    expect(progressLine('forest', 'tree', 40, 200, { oob: 0.12 }, 2000)).toBe('forest: tree 40 of 200 · oob 0.12 · 2.0 s elapsed · about 8.0 s left');
    expect(progressLine('search', 'fold', 3, undefined, {}, 75_000)).toBe('search: fold 3 · 1 min 15 s elapsed');
  });
});

describe('startProgress(label, options)', () => {
  it('updates ONE display in place and ends with the summary', () => {
    const seen: { m: DisplayMessage; update: boolean }[] = [];
    let t = 0;
    const restore = installSink({ onDisplay: (m, update) => seen.push({ m, update }) });
    try {
      const p = startProgress('boosting', { total: 4, unit: 'round', interval: 100, now: () => t });
      t = 50; p.step(1, { train: 0.5 }); // within the interval: skipped
      t = 150; p.step(2, { train: 0.4 });
      t = 160; p.step(4, { train: 0.3 }); // the last step is always sent
      p.finish({ 'text/plain': 'summary' });
      p.step(5);
    } finally {
      restore();
    }
    expect(seen.map((s) => s.update)).toEqual([false, true, true, true]);
    const ids = new Set(seen.map((s) => s.m.transient.display_id));
    expect(ids.size).toBe(1);
    expect([...ids][0]).toMatch(/^[0-9a-f-]{36}$/);
    expect(seen[1].m.data['text/plain']).toBe('boosting: round 2 of 4 · train 0.4 · 0.1 s elapsed · about 0.1 s left');
    expect(seen[3].m.data).toEqual({ 'text/plain': 'summary' });
  });

  it('writes a progress line on stderr without a notebook', () => {
    const streams: string[] = [];
    const restore = installSink({ onStream: (name, text) => streams.push(`${name}:${text}`) });
    try {
      const p = startProgress('forest', { total: 2, unit: 'tree', interval: 0, now: () => 0 });
      p.step(2);
      p.fail('out of memory');
    } finally {
      restore();
    }
    expect(streams).toEqual([
      'stderr:\rforest: tree 0 of 2 · 0.0 s elapsed',
      'stderr:\rforest: tree 2 of 2 · 0.0 s elapsed',
      'stderr:\rforest: tree 2 of 2 · 0.0 s elapsed · stopped: out of memory\n',
    ]);
  });
});
