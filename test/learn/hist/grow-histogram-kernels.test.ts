import { describe, expect, it } from 'vitest';
import { defaultGrowSettings, type GrowTask } from '../../../src/learn/grow-task.js';
import { createRng } from '../../../src/util/rng.js';
import { cars, penguins } from './datasets.js';

// The same trees whichever kernel set runs: the TypeScript twins are forced with COPPICE_KERNELS=ts
// (read when a thread's engine is first created; vitest runs each test file in its own process).
process.env.COPPICE_KERNELS = 'ts';
const { engine } = await import('../../../src/kernels/engine.js');
const { createEngine } = await import('../../../src/kernels/engine.js');
const { growHistogram } = await import('../../../src/learn/hist/grow-histogram.js');
const { growExact } = await import('../../../src/learn/tree/grow-exact.js');

describe('growHistogram(task) on the TypeScript kernels', () => {
  it('runs the twins when COPPICE_KERNELS=ts', () => {
    expect(engine().kernels.name).toBe('ts');
    expect(createEngine('ts').kernels.name).toBe('ts');
  });

  it('still equals growExact on penguins and cars (CHECKS.md open data)', () => {
    const p = penguins(), c = cars();
    const tasks: GrowTask[] = [
      { frame: p.frame, weights: p.weights, rng: createRng(1), response: { kind: 'class', codes: p.codes, nClasses: p.nClasses, criterion: 'entropy' }, settings: { ...defaultGrowSettings, categorical: 'subset' } },
      { frame: c.frame, weights: c.weights, rng: createRng(1), response: { kind: 'value', values: c.values, leaf: 'mean' }, settings: { ...defaultGrowSettings, categorical: 'subset', leafBudget: 20 } },
    ];
    for (const t of tasks) {
      const a = growHistogram(t), b = growExact(t);
      expect(Array.from(a.tree.feature)).toEqual(Array.from(b.tree.feature));
      expect(Array.from(a.tree.threshold)).toEqual(Array.from(b.tree.threshold));
      expect(Array.from(a.leafOfRow)).toEqual(Array.from(b.leafOfRow));
    }
  });
});
