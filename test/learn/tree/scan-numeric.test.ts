/**
 * scanNumeric via growExact(task) at depth 1 against exhaustive search over every cut between distinct
 * values (the definition of the exact method). Checks that skipping cuts inside one-class runs (Fayyad &
 * Irani 1992, Machine Learning 8:87–102) never changes the chosen cut, also under leaf minimums.
 */
import { describe, expect, it } from 'vitest';
import { defaultGrowSettings, type GrowTask } from '../../../src/learn/grow-task.js';
import { growExact } from '../../../src/learn/tree/grow-exact.js';
import { ENTROPY, GINI, weightedImpurity } from '../../../src/learn/tree/impurity.js';
import { midpoint } from '../../../src/learn/tree/scan-numeric.js';
import { createRng } from '../../../src/util/rng.js';
import { frameOf } from './fixtures.js';

function bruteForce(x: number[], y: number[], w: number[], K: number, measure: 0 | 1, leafRows: number, leafWeight: number) {
  const order = x.map((_, i) => i).sort((a, b) => x[a] - x[b] || a - b);
  const total = new Array(K).fill(0);
  order.forEach((i) => { total[y[i]] += w[i]; });
  const parent = weightedImpurity(measure, total, 0, K);
  const W = total.reduce((a, b) => a + b, 0);
  let best = -Infinity, threshold = NaN;
  const left = new Array(K).fill(0);
  let wl = 0;
  for (let p = 0; p < order.length - 1; p++) {
    left[y[order[p]]] += w[order[p]]; wl += w[order[p]];
    const a = x[order[p]], b = x[order[p + 1]];
    if (a === b) continue;
    if (p + 1 < leafRows || order.length - p - 1 < leafRows || wl < leafWeight || W - wl < leafWeight) continue;
    const right = total.map((t, k) => t - left[k]);
    const score = parent - weightedImpurity(measure, left, 0, K) - weightedImpurity(measure, right, 0, K);
    if (score > best + 1e-12 * parent) { best = score; threshold = midpoint(a, b); }
  }
  return { best, threshold };
}

describe('scanNumeric(ctx, f, ...) equals exhaustive search', () => {
  const rng = createRng(2024);
  it('finds the best allowed cut inside a one-class run when leaf minimums cut the run (hand example)', () => {
    // y = 0×8 then 1×2 at x = 1..10; the unconstrained best cut is x <= 8.5, but leafRows 3 allows only
    // 3..7 rows on the left: the best allowed cut is x <= 7.5, inside the run of class 0.
    const x = [1, 2, 3, 4, 5, 6, 7, 8, 9, 10], y = [0, 0, 0, 0, 0, 0, 0, 0, 1, 1];
    const task: GrowTask = {
      frame: frameOf({ x }), weights: new Float64Array(10).fill(1),
      response: { kind: 'class', codes: Int32Array.from(y), nClasses: 2, criterion: 'entropy' },
      settings: { ...defaultGrowSettings, depthLimit: 1, leafRows: 3 }, rng: createRng(0),
    };
    expect(growExact(task).tree.threshold[0]).toBe(7.5);
    const reversed: GrowTask = { ...task, response: { kind: 'class', codes: Int32Array.from(y.slice().reverse()), nClasses: 2, criterion: 'gini' } };
    expect(growExact(reversed).tree.threshold[0]).toBe(3.5);
  });

  for (let trial = 0; trial < 80; trial++) {
    const n = 5 + rng.int(60), K = 2 + rng.int(2);
    const distinct = 2 + rng.int(12);
    const x = Array.from({ length: n }, () => rng.int(distinct));
    // runs of one class are common: class mostly follows x
    const y = x.map((v) => (rng.next() < 0.8 ? Math.min(K - 1, Math.floor((v * K) / distinct)) : rng.int(K)));
    const w = trial % 2 ? x.map(() => 0.5 + rng.int(3)) : x.map(() => 1);
    const leafRows = 1 + rng.int(trial % 4 === 1 ? Math.max(1, Math.floor(n / 3)) : 4), leafWeight = trial % 3 === 0 ? rng.int(5) : 0;
    const measure = trial % 2 ? GINI : ENTROPY;
    it(`trial ${trial}: n=${n}, K=${K}, leafRows=${leafRows}, leafWeight=${leafWeight}, ${measure === GINI ? 'gini' : 'entropy'}`, () => {
      const task: GrowTask = {
        frame: frameOf({ x }), weights: Float64Array.from(w),
        response: { kind: 'class', codes: Int32Array.from(y), nClasses: K, criterion: measure === GINI ? 'gini' : 'entropy' },
        settings: { ...defaultGrowSettings, depthLimit: 1, leafRows, leafWeight }, rng: createRng(0),
      };
      const { tree } = growExact(task);
      const want = bruteForce(x, y, w, K, measure, leafRows, leafWeight);
      const pure = new Set(y).size === 1;
      if (pure || !(want.best > 1e-12)) { expect(tree.nNodes).toBe(1); return; }
      expect(tree.threshold[0]).toBe(want.threshold);
      expect(tree.gain[0]).toBeCloseTo(want.best, 9);
    });
  }
});
