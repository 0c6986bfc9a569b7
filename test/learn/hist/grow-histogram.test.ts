import { describe, expect, it } from 'vitest';
import { defaultGrowSettings, type GrowSettings, type GrowTask } from '../../../src/learn/grow-task.js';
import { growExact } from '../../../src/learn/tree/grow-exact.js';
import { growHistogram } from '../../../src/learn/hist/grow-histogram.js';
import { growTree } from '../../../src/learn/grow.js';
import { leafOf, type FlatTree, type RowSource } from '../../../src/learn/flat-tree.js';
import type { Frame } from '../../../src/table/frame.js';
import { createRng } from '../../../src/util/rng.js';
import { cars, iris, penguins, playTennis, type ClassData, type ValueData } from './datasets.js';
import { makeFrame } from './make-frame.js';

// CHECKS.md, "Properties (common practice)": with bins at least as many as distinct values, a histogram
// split equals the exact split. Structure, thresholds and leaf assignment must be identical; sums are
// accumulated in a different order, so values, covers and gains are compared to 1e-9 relative.
const REL = 1e-9;

function classTask(d: ClassData, criterion: 'entropy' | 'gini' | 'gainRatio', s: Partial<GrowSettings> = {}): GrowTask {
  return {
    frame: d.frame, weights: d.weights, rng: createRng(3),
    response: { kind: 'class', codes: d.codes, nClasses: d.nClasses, criterion },
    settings: { ...defaultGrowSettings, categorical: 'subset', ...s },
  };
}

function valueTask(d: ValueData, leaf: 'mean' | 'median', s: Partial<GrowSettings> = {}): GrowTask {
  return {
    frame: d.frame, weights: d.weights, rng: createRng(3),
    response: { kind: 'value', values: d.values, leaf },
    settings: { ...defaultGrowSettings, categorical: 'subset', ...s },
  };
}

function close(a: Float64Array, b: Float64Array): void {
  expect(a.length).toBe(b.length);
  for (let i = 0; i < a.length; i++) expect(Math.abs(a[i] - b[i])).toBeLessThanOrEqual(REL * Math.max(1, Math.abs(b[i])));
}

function sameTree(task: GrowTask): FlatTree {
  const ex = growExact(task), hi = growHistogram(task);
  const a = hi.tree, b = ex.tree;
  expect(a.nNodes).toBe(b.nNodes);
  for (const k of ['kind', 'feature', 'threshold', 'left', 'right', 'missing', 'offset', 'width', 'catBits', 'count'] as const) {
    expect(Array.from(a[k] as ArrayLike<number>), k).toEqual(Array.from(b[k] as ArrayLike<number>));
  }
  close(a.value, b.value);
  close(a.cover, b.cover);
  close(a.gain, b.gain);
  expect(Array.from(hi.leafOfRow)).toEqual(Array.from(ex.leafOfRow));
  return a;
}

function source(frame: Frame): RowSource {
  return {
    numeric: frame.columns.map((c) => (c.kind === 'categorical' ? null : c.values)),
    codes: frame.columns.map((c) => (c.kind === 'categorical' ? c.codes : null)),
  };
}

describe('growHistogram(task) equals growExact(task) where bins cover every distinct value', () => {
  for (const criterion of ['entropy', 'gini', 'gainRatio'] as const) {
    it(`iris (Fisher 1936), ${criterion}`, () => {
      sameTree(classTask(iris(), criterion));
      sameTree(classTask(iris(), criterion, { depthLimit: 2 }));
      sameTree(classTask(iris(), criterion, { leafBudget: 4, leafRows: 3 }));
    });
    it(`penguins (Gorman et al. 2014; missing values, categorical subsets), ${criterion}`, () => {
      sameTree(classTask(penguins(), criterion));
      sameTree(classTask(penguins(), criterion, { leafRows: 5, leafBudget: 10 }));
    });
  }

  it('PlayTennis (Mitchell 1997, Table 3.2): all-categorical subset splits', () => {
    sameTree(classTask(playTennis(), 'entropy'));
    sameTree(classTask(playTennis(), 'gini', { depthLimit: 1 }));
  });

  it('cars (vega-datasets): regression with missing values, mean and median leaves', () => {
    sameTree(valueTask(cars(), 'mean'));
    sameTree(valueTask(cars(), 'mean', { leafRows: 10, minGain: 50 }));
    sameTree(valueTask(cars(), 'mean', { leafBudget: 12, leafWeight: 5 }));
    sameTree(valueTask(cars(), 'median', { depthLimit: 4 }));
  });

  it('iris depth 2: petal length at 2.45, then petal width at 1.75 (common worked example; from memory)', () => {
    const t = sameTree(classTask(iris(), 'gini', { depthLimit: 2 }));
    expect([t.feature[0], t.threshold[0]]).toEqual([2, 2.45]);
    expect([t.feature[2], t.threshold[2]]).toEqual([3, 1.75]);
  });
});

describe('growHistogram(task)', () => {
  it('routes every training row through the FlatTree on raw values to its leafOfRow', () => {
    const d = penguins();
    const { tree, leafOfRow } = growHistogram(classTask(d, 'entropy', { leafBudget: 16 }));
    const src = source(d.frame);
    for (let r = 0; r < d.frame.nRows; r++) expect(leafOf(tree, src, r)).toBe(d.weights[r] > 0 ? leafOfRow[r] : leafOf(tree, src, r));
    for (let r = 0; r < d.frame.nRows; r++) if (d.weights[r] === 0) expect(leafOfRow[r]).toBe(-1);
  });

  it('is what growTree(task, "histogram") runs', () => {
    const task = classTask(iris(), 'gini');
    expect(growTree(task, 'histogram').tree).toEqual(growHistogram(task).tree);
  });

  it('featuresPerSplit: same seed, same tree; trees differ from all-feature growth', () => {
    const d = penguins();
    const t = (seed: number) => growHistogram({ ...classTask(d, 'gini', { featuresPerSplit: 2 }), rng: createRng(seed) }).tree;
    expect(t(5)).toEqual(t(5));
    expect(t(5).nNodes).toBeGreaterThan(1);
  });

  it('one row, constant target, one class: a single leaf', () => {
    const f = makeFrame({ x: [1, 2, 3, 4] });
    const one = growHistogram({ frame: makeFrame({ x: [7] }), weights: Float64Array.of(1), rng: createRng(1),
      response: { kind: 'value', values: Float64Array.of(2.5), leaf: 'mean' }, settings: defaultGrowSettings });
    expect(one.tree.nNodes).toBe(1);
    expect(one.tree.value[0]).toBe(2.5);
    const flat = growHistogram({ frame: f, weights: new Float64Array(4).fill(1), rng: createRng(1),
      response: { kind: 'value', values: new Float64Array(4).fill(1e6 + 0.1), leaf: 'mean' }, settings: defaultGrowSettings });
    expect(flat.tree.nNodes).toBe(1);
    const oneClass = growHistogram({ frame: f, weights: new Float64Array(4).fill(1), rng: createRng(1),
      response: { kind: 'class', codes: new Int32Array(4), nClasses: 2, criterion: 'entropy' }, settings: defaultGrowSettings });
    expect(oneClass.tree.nNodes).toBe(1);
    expect(Array.from(oneClass.tree.value)).toEqual([1, 0]);
  });

  it('an all-missing feature is never split on; missing rows follow the learned side', () => {
    const f = makeFrame({ m: [null, null, null, null, null, null], x: [1, 2, 3, null, 5, 6] });
    const { tree } = growHistogram({ frame: f, weights: new Float64Array(6).fill(1), rng: createRng(1),
      response: { kind: 'value', values: Float64Array.of(0, 0, 0, 10, 10, 10), leaf: 'mean' }, settings: defaultGrowSettings });
    expect(tree.feature[0]).toBe(1);
    // the missing row (y = 10) is sent with the high side
    expect(tree.missing[0]).toBe(tree.right[0]);
  });

  it('rejects zero total weight, NaN targets, bad options (same messages as the exact grower)', () => {
    const f = makeFrame({ x: [1, 2] });
    const base = { frame: f, rng: createRng(1), settings: defaultGrowSettings };
    expect(() => growHistogram({ ...base, weights: new Float64Array(2), response: { kind: 'value', values: Float64Array.of(1, 2), leaf: 'mean' } })).toThrow(/No rows/);
    expect(() => growHistogram({ ...base, weights: Float64Array.of(1, 1), response: { kind: 'value', values: Float64Array.of(1, NaN), leaf: 'mean' } })).toThrow(/target/);
    expect(() => growHistogram({ ...base, settings: { ...defaultGrowSettings, leafRows: 0 }, weights: Float64Array.of(1, 1), response: { kind: 'value', values: Float64Array.of(1, 2), leaf: 'mean' } })).toThrow(/leafRows/);
  });
});
