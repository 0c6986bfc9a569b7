/**
 * fitTree: options, degenerate inputs, regression leaves. Expected values computed by hand (arithmetic
 * in comments); behaviour for bad input follows DESIGN.md "Reliability" (common practice).
 */
import { describe, expect, it } from 'vitest';
import { CoppiceError } from '../../../src/errors.js';
import { LEAF, NUMERIC } from '../../../src/learn/flat-tree.js';
import { predictFrame } from '../../../src/learn/predict.js';
import { fitTree } from '../../../src/learn/tree/fit-tree.js';
import { classTarget, datasetOf, numberTarget } from './fixtures.js';

function code(f: () => unknown): string {
  try { f(); } catch (e) { if (e instanceof CoppiceError) return `${e.code}: ${e.message}`; throw e; }
  return 'no error';
}

describe('fitTree(data, options) options', () => {
  const d = datasetOf({ x: [1, 2, 3, 4] }, classTarget('y', ['a', 'a', 'b', 'b']));
  it('rejects unknown options and bad values, naming the option and value', () => {
    expect(code(() => fitTree(d, { depth: 2 } as never))).toMatch(/unknown-option: Unknown option "depth"/);
    expect(code(() => fitTree(d, { depthLimit: -1 }))).toMatch(/bad-option: Option depthLimit = -1/);
    expect(code(() => fitTree(d, { leafRows: 0 }))).toMatch(/leafRows = 0/);
    expect(code(() => fitTree(d, { leafBudget: 1 }))).toMatch(/leafBudget = 1/);
    expect(code(() => fitTree(d, { criterion: 'variance' }))).toMatch(/criterion = "variance"/);
    expect(code(() => fitTree(d, { minGain: NaN }))).toMatch(/minGain = NaN/);
    expect(code(() => fitTree(d, { engine: 'fast' as never }))).toMatch(/Option engine = "fast"/);
  });
  it('records every setting with defaults filled in', () => {
    expect(fitTree(d).settings).toEqual({
      criterion: 'entropy', leafValue: 'mean', depthLimit: Infinity, leafRows: 1, leafWeight: 0, minGain: 0,
      categorical: 'multiway', leafBudget: Infinity, featuresPerSplit: 0, seed: 0, engine: 'exact',
    });
  });
  it('splits x at the midpoint 2.5 between the classes', () => {
    const t = fitTree(d).tree;
    expect(t.kind[0]).toBe(NUMERIC);
    expect(t.threshold[0]).toBe(2.5);
  });
});

describe('fitTree(data) degenerate inputs', () => {
  it('an empty table is a clear error', () => {
    expect(code(() => fitTree(datasetOf({ x: [] }, classTarget('y', []))))).toMatch(/empty-data: No rows to fit a tree/);
  });
  it('one row gives a single leaf', () => {
    const m = fitTree(datasetOf({ x: [3] }, numberTarget('y', [7])));
    expect(m.tree.nNodes).toBe(1);
    expect(m.tree.value[0]).toBe(7);
  });
  it('one class gives a single leaf with probability 1', () => {
    const m = fitTree(datasetOf({ x: [1, 2, 3] }, classTarget('y', ['a', 'a', 'a'])));
    expect(m.tree.nNodes).toBe(1);
    expect(Array.from(m.tree.value)).toEqual([1]);
  });
  it('a constant target gives a single leaf', () => {
    const m = fitTree(datasetOf({ x: [1, 2, 3], g: ['p', 'q', 'p'] }, numberTarget('y', [0.1, 0.1, 0.1])));
    expect(m.tree.nNodes).toBe(1);
  });
  it('an all-missing feature is never split on', () => {
    const m = fitTree(datasetOf({ empty: [null, null, null, null], g: [null, null, null, null], x: [1, 2, 3, 4] }, numberTarget('y', [1, 1, 5, 5])));
    expect(m.tree.feature[0]).toBe(2);
    for (let n = 0; n < m.tree.nNodes; n++) if (m.tree.kind[n] !== LEAF) expect(m.tree.feature[n]).toBe(2);
  });
  it('NaN features are missing; Infinity is rejected naming the column', () => {
    const m = fitTree(datasetOf({ x: [1, NaN, 3, 4] }, numberTarget('y', [1, 1, 5, 5])));
    expect(m.trainingRows).toBe(4);
    expect(code(() => fitTree(datasetOf({ x: [1, Infinity, 3] }, numberTarget('y', [1, 2, 3]))))).toMatch(/bad-value: Column "x", row 1: value Infinity/);
    expect(code(() => fitTree(datasetOf({ x: [1, 2, 3] }, numberTarget('y', [1, -Infinity, 3]))))).toMatch(/Column "y", row 1/);
  });
  it('rows with a missing target are left out and counted', () => {
    const m = fitTree(datasetOf({ x: [1, 2, 3, 4, 5] }, classTarget('y', ['a', null, 'b', 'b', null])));
    expect(m.trainingRows).toBe(3);
    expect(m.droppedRows).toBe(2);
    expect(m.tree.cover[0]).toBe(3);
    const r = fitTree(datasetOf({ x: [1, 2, 3] }, numberTarget('y', [1, NaN, 3])));
    expect(r.droppedRows).toBe(1);
    expect(r.tree.value[0]).toBe(2); // mean of 1 and 3
    expect(code(() => fitTree(datasetOf({ x: [1, 2] }, classTarget('y', [null, null], ['a']))))).toMatch(/empty-data/);
  });
  it('negative or NaN weights are rejected', () => {
    expect(code(() => fitTree(datasetOf({ x: [1, 2] }, numberTarget('y', [1, 2]), [1, -1])))).toMatch(/Column "weights", row 1: value -1/);
    expect(code(() => fitTree(datasetOf({ x: [1, 2] }, numberTarget('y', [1, 2]), [NaN, 1])))).toMatch(/weights", row 0/);
  });
});

describe('fitTree(data) regression', () => {
  // y = 1, 2, 3 | 10, 11, 14 at x = 1..6 (hand computation): total SSE = Σy² − (Σy)²/6 = 431 − 41²/6 = 150.8333;
  // at x <= 3.5: left SSE = 14 − 36/3 = 2, right SSE = 417 − 35²/3 = 8.6667, gain = 841/6 = 140.1667 — the largest
  // (x <= 4.5 gives 150.8333 − 50 − 4.5 = 96.33). Left mean 2, right mean 35/3.
  const d = datasetOf({ x: [1, 2, 3, 4, 5, 6] }, numberTarget('y', [1, 2, 3, 10, 11, 14]));
  it('splits at 3.5 with gain 841/6 (hand computation) and leaves the weighted mean', () => {
    const m = fitTree(d, { depthLimit: 1 });
    expect(m.tree.threshold[0]).toBe(3.5);
    expect(m.tree.gain[0]).toBeCloseTo(841 / 6, 9);
    expect(m.tree.value[m.tree.left[0]]).toBeCloseTo(2, 12);
    expect(m.tree.value[m.tree.right[0]]).toBeCloseTo(35 / 3, 12);
  });
  it("leafValue 'median' gives medians (11 on the right)", () => {
    const m = fitTree(d, { depthLimit: 1, leafValue: 'median' });
    expect(m.tree.value[m.tree.right[0]]).toBe(11);
    expect(m.tree.value[0]).toBe(6.5); // median of the six: (3 + 10) / 2
  });
  it('weights act as row counts (weight 2 = the row twice)', () => {
    const w = fitTree(datasetOf({ x: [1, 2, 3] }, numberTarget('y', [0, 0, 6]), [1, 2, 1]));
    const dup = fitTree(datasetOf({ x: [1, 2, 2, 3] }, numberTarget('y', [0, 0, 0, 6])));
    expect(Array.from(w.tree.value)).toEqual(Array.from(dup.tree.value));
    expect(Array.from(w.tree.threshold)).toEqual(Array.from(dup.tree.threshold));
  });
  it('leafRows, depthLimit, minGain and leafBudget stop growth', () => {
    expect(fitTree(d, { leafRows: 3 }).tree.nNodes).toBe(3);
    expect(fitTree(d, { depthLimit: 0 }).tree.nNodes).toBe(1);
    expect(fitTree(d, { minGain: 141 }).tree.nNodes).toBe(1);
    expect(fitTree(d, { minGain: 140 }).tree.nNodes).toBeGreaterThan(1);
    const b = fitTree(d, { leafBudget: 3 });
    let leaves = 0;
    for (let n = 0; n < b.tree.nNodes; n++) if (b.tree.kind[n] === LEAF) leaves++;
    expect(leaves).toBe(3);
    // best-first: the right node's split (x <= 5.5: gain 8.6667 − 0.5 = 8.1667) beats the left's (1.5)
    expect(b.tree.kind[b.tree.right[0]]).toBe(NUMERIC);
    expect(b.tree.kind[b.tree.left[0]]).toBe(LEAF);
    expect(b.tree.threshold[b.tree.right[0]]).toBe(5.5);
  });
  it('predictFrame(model, frame) routes missing values to the learned child', () => {
    const m = fitTree(d, { depthLimit: 1 });
    const p = predictFrame(m, datasetOf({ x: [NaN, 0, 100] }, numberTarget('y', [0, 0, 0])).features);
    const miss = m.tree.missing[0];
    expect(p.value[0]).toBe(m.tree.value[miss]);
    expect(p.value[1]).toBeCloseTo(2, 12);
    expect(p.value[2]).toBeCloseTo(35 / 3, 12);
  });
});
