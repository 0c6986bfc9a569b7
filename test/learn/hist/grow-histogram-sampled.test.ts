import { describe, expect, it } from 'vitest';
import { childOf, LEAF, type FlatTree, type RowSource } from '../../../src/learn/flat-tree.js';
import { defaultGrowSettings, type GrowSettings, type GrowTask } from '../../../src/learn/grow-task.js';
import { growHistogram } from '../../../src/learn/hist/grow-histogram.js';
import { setSparseRowLimit } from '../../../src/learn/hist/hist-sparse.js';
import type { Frame } from '../../../src/table/frame.js';
import { createRng } from '../../../src/util/rng.js';
import { cars, penguins, type ValueData } from './datasets.js';

// Cars (vega-datasets cars.json): miles per gallon. Each split's recorded gain must equal the decrease
// of the weighted sum of squares Σw·(y - mean)² computed directly from the rows routed to the node and
// its children (definition of the variance criterion; Breiman, Friedman, Olshen & Stone 1984, §8.3).
// Sums are accumulated in a different order, so the check is to 1e-9 relative of the node's sum of squares.
const REL = 1e-9;

function task(d: ValueData, s: Partial<GrowSettings>, seed: number): GrowTask {
  return {
    frame: d.frame, weights: d.weights, rng: createRng(seed),
    response: { kind: 'value', values: d.values, leaf: 'mean' },
    settings: { ...defaultGrowSettings, categorical: 'subset', ...s },
  };
}

function source(frame: Frame): RowSource {
  return {
    numeric: frame.columns.map((c) => (c.kind === 'categorical' ? null : c.values)),
    codes: frame.columns.map((c) => (c.kind === 'categorical' ? c.codes : null)),
  };
}

/** Per node [Σw, Σw·y, Σw·y²] of the rows reaching it. */
function nodeSums(tree: FlatTree, d: ValueData): Float64Array {
  const src = source(d.frame), out = new Float64Array(tree.nNodes * 3);
  for (let r = 0; r < d.frame.nRows; r++) {
    const w = d.weights[r], y = d.values[r];
    if (!(w > 0)) continue;
    for (let n = 0; ; n = childOf(tree, n, src, r)) {
      out[3 * n] += w; out[3 * n + 1] += w * y; out[3 * n + 2] += w * y * y;
      if (tree.kind[n] === LEAF) break;
    }
  }
  return out;
}

function checkGains(tree: FlatTree, d: ValueData): number {
  const s = nodeSums(tree, d);
  const sse = (n: number): number => s[3 * n + 2] - (s[3 * n + 1] * s[3 * n + 1]) / s[3 * n];
  let splits = 0;
  for (let n = 0; n < tree.nNodes; n++) {
    if (tree.kind[n] === LEAF) continue;
    splits++;
    const want = sse(n) - sse(tree.left[n]) - sse(tree.right[n]);
    expect(Math.abs(tree.gain[n] - want), `node ${n}`).toBeLessThanOrEqual(REL * Math.max(1, sse(n)));
  }
  return splits;
}

describe('growHistogram(task) with featuresPerSplit drawn per node', () => {
  it('every split gain equals the sum-of-squares decrease of the rows routed there (cars, 2 of 6 features)', () => {
    const d = cars();
    for (const seed of [1, 2, 3]) {
      const { tree } = growHistogram(task(d, { featuresPerSplit: 2, leafRows: 3 }, seed));
      expect(checkGains(tree, d)).toBeGreaterThan(10);
    }
  });

  it('small nodes built over occupied bins only give the same tree as dense histograms', () => {
    const d = cars();
    const grow = (limit: number, s: Partial<GrowSettings>, seed: number): FlatTree => {
      const before = setSparseRowLimit(limit);
      try { return growHistogram(task(d, s, seed)).tree; } finally { setSparseRowLimit(before); }
    };
    for (const s of [{ featuresPerSplit: 2, leafRows: 1 }, { featuresPerSplit: 1, leafRows: 4, leafBudget: 40 }]) {
      for (const seed of [1, 5]) {
        const dense = grow(0, s, seed), sparse = grow(1000, s, seed);
        for (const k of ['kind', 'feature', 'threshold', 'left', 'right', 'missing', 'offset', 'catBits', 'count', 'value', 'cover', 'gain'] as const) {
          expect(Array.from(sparse[k] as ArrayLike<number>), k).toEqual(Array.from(dense[k] as ArrayLike<number>));
        }
        checkGains(sparse, d);
      }
    }
  });

  it('class responses: sparse small nodes give the same tree as dense histograms (penguins, vega-datasets; 2 of 6 features)', () => {
    const d = penguins();
    for (const criterion of ['gini', 'entropy'] as const) {
      const grow = (limit: number): FlatTree => {
        const before = setSparseRowLimit(limit);
        try {
          return growHistogram({
            frame: d.frame, weights: d.weights, rng: createRng(9), response: { kind: 'class', codes: d.codes, nClasses: d.nClasses, criterion },
            settings: { ...defaultGrowSettings, categorical: 'subset', featuresPerSplit: 2 },
          }).tree;
        } finally { setSparseRowLimit(before); }
      };
      const dense = grow(0), sparse = grow(1000);
      expect(dense.nNodes).toBeGreaterThan(5);
      for (const k of ['kind', 'feature', 'threshold', 'left', 'right', 'missing', 'offset', 'catBits', 'count', 'value', 'cover', 'gain'] as const) {
        expect(Array.from(sparse[k] as ArrayLike<number>), k).toEqual(Array.from(dense[k] as ArrayLike<number>));
      }
    }
  });
});
