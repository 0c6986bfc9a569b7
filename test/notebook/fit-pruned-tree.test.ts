/**
 * fitPrunedTree: growth then pruning in one call. The worked example is the one of
 * test/learn/prune/prune.test.ts (hand computation from Quinlan 1987's definition of reduced-error
 * pruning); cost-complexity results are compared with pruneCostComplexity called directly.
 */
import { describe, expect, it } from 'vitest';
import { fitPrunedTree } from '../../src/notebook/fit-pruned-tree.js';
import { fitTree } from '../../src/learn/tree/fit-tree.js';
import { pruneCostComplexity } from '../../src/learn/prune/cost-complexity.js';
import { classTarget, datasetOf } from '../learn/tree/fixtures.js';

// x = 1..8, y = a a a a b b a b; the gini tree splits at 4.5, 6.5, 7.5 (7 nodes).
const train = datasetOf({ x: [1, 2, 3, 4, 5, 6, 7, 8] }, classTarget('y', ['a', 'a', 'a', 'a', 'b', 'b', 'a', 'b']));
// Held out x = 2 (a), 5 (b), 7 (b), 8 (b): node 2 (x > 4.5) is pruned to a leaf, the root kept → 3 nodes.
const heldOut = datasetOf({ x: [2, 5, 7, 8] }, classTarget('y', ['a', 'b', 'b', 'b'], ['a', 'b']));

describe('fitPrunedTree(data, options)', () => {
  it('prunes by reduced error on pruneOn (hand-worked: 7 nodes → 3)', () => {
    const m = fitPrunedTree(train, { criterion: 'gini', prune: 'reduced-error', pruneOn: heldOut });
    expect(fitTree(train, { criterion: 'gini' }).tree.nNodes).toBe(7);
    expect(m.tree.nNodes).toBe(3);
    expect(Array.from(m.tree.threshold.subarray(0, 1))).toEqual([4.5]);
    expect(m.settings).toMatchObject({ criterion: 'gini', pruning: { method: 'reducedError', heldOutRows: 4 } });
  });

  it('defaults to reduced error when only pruneOn is given, and accepts the API spelling', () => {
    expect(fitPrunedTree(train, { criterion: 'gini', pruneOn: heldOut }).tree.nNodes).toBe(3);
    expect(fitPrunedTree(train, { criterion: 'gini', prune: 'reducedError', pruneOn: heldOut }).tree.nNodes).toBe(3);
  });

  it('prunes by cost complexity exactly as pruneCostComplexity does', () => {
    const direct = pruneCostComplexity(fitTree(train, { criterion: 'gini' }), train, { folds: 4, rule: 'minimum' }).model;
    const m = fitPrunedTree(train, { criterion: 'gini', prune: 'cost-complexity', pruneFolds: 4, pruneRule: 'minimum' });
    expect(m.settings.pruning).toEqual(direct.settings.pruning);
    expect(Array.from(m.tree.kind)).toEqual(Array.from(direct.tree.kind));
    expect(fitPrunedTree(train, { criterion: 'gini', pruneFolds: 4, pruneRule: 'minimum' }).settings.pruning).toEqual(direct.settings.pruning);
  });

  it('prunes by cost complexity on held-out rows', () => {
    const m = fitPrunedTree(train, { criterion: 'gini', prune: 'cost-complexity', pruneOn: heldOut });
    expect(m.settings.pruning).toMatchObject({ method: 'costComplexity', evaluation: 'heldOut' });
  });

  it('names the option at fault', () => {
    expect(() => fitPrunedTree(train, { prune: 'reduced-error' })).toThrow('Option pruneOn = undefined is invalid: expected held-out rows for reduced-error pruning.');
    expect(() => fitPrunedTree(train, { prune: 'pessimistic', pruneOn: heldOut })).toThrow("Option prune = \"pessimistic\" is invalid: expected 'reduced-error' or 'cost-complexity'.");
    expect(() => fitPrunedTree(train, { prune: 'reduced-error', pruneOn: heldOut, pruneFolds: 3 })).toThrow('Option pruneFolds = 3 is invalid');
    expect(() => fitPrunedTree(train, { prune: 'cost-complexity', pruneOn: heldOut, pruneFolds: 3 })).toThrow('Option pruneFolds = 3 is invalid');
    expect(() => fitPrunedTree(train, { pruneOn: [{ x: 1 }] as never })).toThrow('Option pruneOn = [{"x":1}] is invalid');
    expect(() => fitPrunedTree(train, { prune: 'cost-complexity', pruneFolds: 1 })).toThrow('Option folds = 1 is invalid');
  });

  it('a one-class target gives a single leaf, pruned or not', () => {
    const one = datasetOf({ x: [1, 2, 3] }, classTarget('y', ['a', 'a', 'a']));
    expect(fitPrunedTree(one, { pruneOn: one }).tree.nNodes).toBe(1);
    expect(fitPrunedTree(one, { prune: 'cost-complexity', pruneFolds: 3 }).tree.nNodes).toBe(1);
  });
});
