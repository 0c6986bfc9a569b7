import { afterAll, describe, expect, it } from 'vitest';
import { defaultGrowSettings, type GrowTask } from '../../../src/learn/grow-task.js';
import { growHistogram } from '../../../src/learn/hist/grow-histogram.js';
import { useHistogramWorkers } from '../../../src/learn/parallel/hist-workers.js';
import { workerScriptUrl } from '../../../src/learn/parallel/package-root.js';
import { createRng } from '../../../src/util/rng.js';
import { makeFrame } from '../hist/make-frame.js';

// Synthetic data for a determinism check only (no published value is involved).
function task(): GrowTask {
  const rng = createRng(21), n = 30_000, cols: Record<string, number[]> = {};
  for (let f = 0; f < 12; f++) cols[`x${f}`] = Array.from({ length: n }, () => Math.round(rng.next() * 1000) / 10);
  const y = Float64Array.from({ length: n }, (_, i) => cols.x0[i] * 0.3 - (cols.x3[i] > 50 ? 5 : 0) + rng.normal());
  return {
    frame: makeFrame(cols), weights: new Float64Array(n).fill(1), rng: createRng(1),
    response: { kind: 'value', values: y, leaf: 'mean' },
    settings: { ...defaultGrowSettings, categorical: 'subset', leafBudget: 31 },
  };
}

afterAll(() => { useHistogramWorkers(1); });

describe('useHistogramWorkers(threads)', () => {
  it('a tree grown with histograms split across 2 threads is identical to one grown in-thread', () => {
    const t = task();
    useHistogramWorkers(1);
    const one = growHistogram(t);
    const used = useHistogramWorkers(2);
    const two = growHistogram(t);
    expect(used).toBe(workerScriptUrl('hist-worker.js') ? 2 : 1);
    expect(two.tree).toEqual(one.tree);
    expect(two.leafOfRow).toEqual(one.leafOfRow);
  });

  it('rejects a thread count below 1', () => {
    expect(() => useHistogramWorkers(0)).toThrow(/threads/);
  });
});
