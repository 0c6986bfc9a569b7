/**
 * growExact(task) and growTree(task, engine): splitting rules worked by hand, with sources named.
 */
import { describe, expect, it } from 'vitest';
import { LEAF, MULTIWAY, NUMERIC, SUBSET, leafOf } from '../../../src/learn/flat-tree.js';
import { defaultGrowSettings, type GrowSettings, type GrowTask, type Response } from '../../../src/learn/grow-task.js';
import { growTree } from '../../../src/learn/grow.js';
import { growExact } from '../../../src/learn/tree/grow-exact.js';
import { weightedImpurity, ENTROPY, GINI } from '../../../src/learn/tree/impurity.js';
import { rowSourceOf } from '../../../src/learn/tree/row-source.js';
import { predictTree } from '../../../src/learn/tree/predict-tree.js';
import type { Frame } from '../../../src/table/frame.js';
import { createRng } from '../../../src/util/rng.js';
import { frameOf, type RawColumn } from './fixtures.js';

function classTask(cols: Record<string, RawColumn>, codes: number[], nClasses: number, settings: Partial<GrowSettings> = {}, criterion: 'entropy' | 'gini' = 'gini', weights?: number[]): GrowTask {
  const frame = frameOf(cols);
  const response: Response = { kind: 'class', codes: Int32Array.from(codes), nClasses, criterion };
  return { frame, weights: weights ? Float64Array.from(weights) : new Float64Array(frame.nRows).fill(1), response, settings: { ...defaultGrowSettings, ...settings }, rng: createRng(0) };
}

function valueTask(cols: Record<string, RawColumn>, y: number[], settings: Partial<GrowSettings> = {}): GrowTask {
  const frame = frameOf(cols);
  return { frame, weights: new Float64Array(frame.nRows).fill(1), response: { kind: 'value', values: Float64Array.from(y), leaf: 'mean' }, settings: { ...defaultGrowSettings, ...settings }, rng: createRng(0) };
}

describe('growTree(task, engine)', () => {
  it("growTree(task) uses the exact engine by default and rejects unknown engines", () => {
    const task = classTask({ x: [1, 2, 3, 4] }, [0, 0, 1, 1], 2);
    expect(growTree(task).tree).toEqual(growExact(task).tree);
    expect(() => growTree(task, 'magic' as never)).toThrow(/Option engine = "magic"/);
  });
});

describe('growExact(task) results', () => {
  it('leafOfRow is the leaf each positive-weight row reaches, -1 for rows with weight 0', () => {
    const task = classTask({ x: [1, 2, 3, 4, 5, NaN], g: ['p', 'q', 'p', null, 'q', 'p'] }, [0, 1, 0, 1, 1, 0], 2, {}, 'gini', [1, 1, 1, 1, 0, 1]);
    const { tree, leafOfRow } = growExact(task);
    const src = rowSourceOf(task.frame);
    expect(leafOfRow[4]).toBe(-1);
    for (const i of [0, 1, 2, 3, 5]) expect(leafOfRow[i]).toBe(leafOf(tree, src, i));
    expect(tree.cover[0]).toBe(5);
    expect(tree.count[0]).toBe(5);
  });

  it('children always have larger indices than parents; counts and covers add up', () => {
    const task = classTask({ x: [1, 2, 3, 4, 5, 6, 7, 8], g: ['a', 'b', 'c', 'a', 'b', 'c', null, 'a'] }, [0, 1, 2, 0, 1, 1, 2, 0], 3, {}, 'entropy');
    const { tree } = growExact(task);
    for (let n = 0; n < tree.nNodes; n++) {
      if (tree.kind[n] === LEAF) continue;
      const kids = tree.kind[n] === MULTIWAY
        ? [...new Set(Array.from(tree.branches.subarray(tree.offset[n], tree.offset[n] + tree.width[n])).filter((b) => b >= 0))]
        : [tree.left[n], tree.right[n]];
      for (const c of kids) expect(c).toBeGreaterThan(n);
      expect(kids.reduce((s, c) => s + tree.count[c], 0)).toBe(tree.count[n]);
    }
  });
});

describe('missing values (DEVELOPERS.md "Missing values"; C4.5 scaling, Quinlan 1993 ch. 3)', () => {
  // x: 1 2 3 4 NaN NaN, class 0 0 1 1 1 1. Known rows split perfectly at 2.5. Missing rows (both class 1)
  // join the right child: gain = W·I(parent) − 0 − 0 = 6 − 20/6 = 2.6667 (Gini) versus joining the left:
  // left {0,0,1,1} = 2, right {1,1} = 0 → gain 0.6667. So missing → right.
  it('growExact sends missing rows to the child with the larger gain', () => {
    const task = classTask({ x: [1, 2, 3, 4, NaN, NaN] }, [0, 0, 1, 1, 1, 1], 2);
    const { tree } = growExact(task);
    expect(tree.kind[0]).toBe(NUMERIC);
    expect(tree.threshold[0]).toBe(2.5);
    expect(tree.missing[0]).toBe(tree.right[0]);
    expect(tree.gain[0]).toBeCloseTo(6 - 20 / 6, 12);
    expect(tree.count[tree.right[0]]).toBe(4);
  });

  it('the split score uses only known rows (gain scaled by the known fraction)', () => {
    // Gini on known rows {0,0,1,1}: W_known·I = 4 − 8/4 = 2, children 0 → score 2 = 6 · (2/4 gain per row) · 4/6.
    const task = classTask({ x: [1, 2, 3, 4, NaN, NaN], z: [1, 1, 1, 2, 2, 2] }, [0, 0, 1, 1, 1, 1], 2);
    // z splits all six rows: {0,0,1} | {1,1,1}: gain = 6 − 20/6 − (3 − 5/3) − 0 = 1.3333 < 2, so x is chosen.
    const { tree } = growExact(task);
    expect(tree.feature[0]).toBe(0);
    const parent = weightedImpurity(GINI, [2, 4], 0, 2);
    expect(parent).toBeCloseTo(6 - 20 / 6, 12);
  });

  it('with no missing rows in training, later missing values follow the heavier child', () => {
    // x <= 2.5 splits {0,0} | {1,1,1}: the right child is heavier (3 rows), so missing values go right.
    const { tree } = growExact(classTask({ x: [1, 2, 3, 4, 5] }, [0, 0, 1, 1, 1], 2));
    expect(tree.threshold[0]).toBe(2.5);
    expect(tree.missing[0]).toBe(tree.right[0]);
    const { tree: mirrored } = growExact(classTask({ x: [1, 2, 3, 4, 5] }, [0, 0, 0, 1, 1], 2));
    expect(mirrored.missing[0]).toBe(mirrored.left[0]);
  });

  it('missing rows go where the gain is larger, not simply to the heavier child (Gini, hand computation)', () => {
    // known: x = 1 (class 0, weight 3) | x = 3 (class 1, weight 1); missing rows: class 0 and class 1, weight 0.5 each.
    // join left:  {0: 3.5, 1: 0.5} → W·G = 4 − (3.5² + 0.5²)/4 = 0.875; right {1: 1} → 0; children 0.875
    // join right: left {0: 3} → 0; right {0: 0.5, 1: 1.5} → 2 − (0.25 + 2.25)/2 = 0.75; children 0.75
    // so the right (lighter) child gives the larger gain.
    const task = classTask({ x: [1, 3, NaN, NaN] }, [0, 1, 0, 1], 2, {}, 'gini', [3, 1, 0.5, 0.5]);
    const { tree } = growExact(task);
    expect(tree.missing[0]).toBe(tree.right[0]);
    expect(tree.gain[0]).toBeCloseTo(weightedImpurity(GINI, [3.5, 1.5], 0, 2) - 0.75, 12);
    // A tie: {0} | {1} with missing rows {0, 1} (unit weights) gives equal gains and equal weights → lower slot (left).
    const tie = growExact(classTask({ x: [1, 3, NaN, NaN] }, [0, 1, 0, 1], 2, {}, 'gini'));
    expect(tie.tree.missing[0]).toBe(tie.tree.left[0]);
  });
});

describe('categorical splits', () => {
  it('multiway: one branch per category seen; a feature used at most once per path', () => {
    const task = classTask({ g: ['a', 'b', 'c', 'a', 'b', 'c'], h: ['u', 'v', 'u', 'v', 'u', 'v'] }, [0, 1, 1, 0, 1, 0], 2, {}, 'entropy');
    const { tree } = growExact(task);
    expect(tree.kind[0]).toBe(MULTIWAY);
    expect(tree.width[0]).toBe(3);
    for (let n = 1; n < tree.nNodes; n++) if (tree.kind[n] !== LEAF) expect(tree.feature[n]).not.toBe(tree.feature[0]);
  });

  it('multiway: categories not seen at a node follow the missing-value child', () => {
    // category 'c' exists in the dictionary (fixed classes list) but only at one branch's subtree
    const task = classTask({ g: ['a', 'a', 'b', 'b', 'c'], x: [1, 2, 1, 2, 5] }, [0, 0, 1, 1, 1], 2, {}, 'entropy', [1, 1, 1, 1, 0]);
    const { tree } = growExact(task);
    expect(tree.kind[0]).toBe(MULTIWAY);
    expect(tree.branches[tree.offset[0] + 2]).toBe(-1); // c not seen (weight 0)
    const out = predictTree(tree, task.frame);
    expect(out[4 * 2 + 1]).toBe(tree.value[tree.missing[0] * 2 + 1]);
  });

  // Two classes: ordering categories by the proportion of class 1 and scanning gives the best of all
  // 2^(k−1) − 1 binary partitions (Breiman, Friedman, Olshen & Stone 1984, §4.2.2, Theorem 4.5); for
  // regression, ordering by mean response (§8.8; Fisher 1958). Checked against exhaustive search.
  const cats = ['a', 'b', 'c', 'd', 'e'];
  const rng = createRng(42);
  const g: string[] = [], y2: number[] = [], yv: number[] = [];
  for (let i = 0; i < 60; i++) {
    const c = rng.int(5);
    g.push(cats[c]);
    y2.push(rng.next() < [0.1, 0.8, 0.3, 0.6, 0.45][c] ? 1 : 0);
    yv.push([3, -1, 0.5, 2, 7][c] + rng.normal());
  }
  function bestByExhaustion(weightsOf: (inLeft: (c: number) => boolean) => number): number {
    let best = -Infinity;
    for (let mask = 0; mask < (1 << 4) - 1; mask++) best = Math.max(best, weightsOf((c) => c === 4 || ((mask >> c) & 1) === 1));
    return best;
  }
  for (const criterion of ['gini', 'entropy'] as const) {
    it(`subset (${criterion}, two classes): equals the best of all partitions`, () => {
      const task = classTask({ g }, y2, 2, { categorical: 'subset', depthLimit: 1 }, criterion);
      const { tree } = growExact(task);
      expect(tree.kind[0]).toBe(SUBSET);
      const code = (frameOf({ g }).columns[0] as { codes: Int32Array }).codes;
      const m = criterion === 'gini' ? GINI : ENTROPY;
      const best = bestByExhaustion((inLeft) => {
        const l = [0, 0], r = [0, 0];
        for (let i = 0; i < 60; i++) (inLeft(code[i]) ? l : r)[y2[i]]++;
        const p = [l[0] + r[0], l[1] + r[1]];
        return weightedImpurity(m, p, 0, 2) - weightedImpurity(m, l, 0, 2) - weightedImpurity(m, r, 0, 2);
      });
      expect(tree.gain[0]).toBeCloseTo(best, 10);
    });
  }
  it('subset (regression): equals the best of all partitions', () => {
    const { tree } = growExact(valueTask({ g }, yv, { categorical: 'subset', depthLimit: 1 }));
    const code = (frameOf({ g }).columns[0] as { codes: Int32Array }).codes;
    const sse = (v: number[]): number => { const m = v.reduce((a, b) => a + b, 0) / v.length; return v.reduce((a, b) => a + (b - m) ** 2, 0); };
    const best = bestByExhaustion((inLeft) => {
      const l: number[] = [], r: number[] = [];
      for (let i = 0; i < 60; i++) (inLeft(code[i]) ? l : r).push(yv[i]);
      return sse(yv) - sse(l) - sse(r);
    });
    expect(tree.gain[0]).toBeCloseTo(best, 8);
  });
});

describe('stop rules and feature sampling', () => {
  const x = [1, 2, 3, 4, 5, 6, 7, 8];
  it('leafWeight: every leaf holds at least that weight', () => {
    const { tree } = growExact(classTask({ x }, [0, 1, 0, 1, 0, 1, 0, 1], 2, { leafWeight: 3 }));
    for (let n = 0; n < tree.nNodes; n++) if (tree.kind[n] === LEAF) expect(tree.cover[n]).toBeGreaterThanOrEqual(3);
  });
  it('featuresPerSplit: only drawn features are tried (1 feature drawn from 1 useful + 3 constant ones)', () => {
    const frame: Frame = frameOf({ c1: x.map(() => 1), c2: x.map(() => 1), useful: x, c3: x.map(() => 1) });
    const y = [0, 0, 0, 0, 1, 1, 1, 1];
    let splitAtRoot = 0;
    for (let s = 0; s < 40; s++) {
      const task: GrowTask = { frame, weights: new Float64Array(8).fill(1), response: { kind: 'class', codes: Int32Array.from(y), nClasses: 2, criterion: 'gini' }, settings: { ...defaultGrowSettings, featuresPerSplit: 1 }, rng: createRng(s) };
      if (growExact(task).tree.nNodes > 1) splitAtRoot++;
    }
    // P(draw 'useful') = 1/4 per seed; 40 seeds → expect about 10 (binomial sd ≈ 2.7). Common practice bounds.
    expect(splitAtRoot).toBeGreaterThan(2);
    expect(splitAtRoot).toBeLessThan(20);
  });
  it('rejects invalid settings', () => {
    expect(() => growExact(classTask({ x }, [0, 1, 0, 1, 0, 1, 0, 1], 2, { leafRows: 0 }))).toThrow(/leafRows = 0/);
    expect(() => growExact(classTask({ x }, [0, 1, 0, 1, 0, 1, 0, 1], 2, { categorical: 'bits' as never }))).toThrow(/categorical/);
    expect(() => growExact(classTask({ x }, [0, 1, 0, 5, 0, 1, 0, 1], 2))).toThrow(/row 3: value 5/);
    expect(() => growExact(classTask({ x }, [0, 1, 0, 1, 0, 1, 0, 1], 2, {}, 'gini', [0, 0, 0, 0, 0, 0, 0, 0]))).toThrow(/No rows/);
  });
});
