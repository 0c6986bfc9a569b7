/**
 * PlayTennis worked example: Mitchell, T. (1997) Machine Learning, McGraw-Hill, ch. 3, Table 3.2 and
 * §3.4.1–3.4.2 (data after Quinlan 1986). Exact values recomputed in /work/shared/CHECKS.md; compared at 1e-6.
 * SplitInfo/GainRatio: Quinlan (1993) C4.5: Programs for Machine Learning, ch. 2, as tabulated in CHECKS.md.
 */
import { describe, expect, it } from 'vitest';
import { candidateSplits } from '../../../src/learn/tree/candidate-splits.js';
import { entropyBits } from '../../../src/learn/tree/impurity.js';
import { fitTree } from '../../../src/learn/tree/fit-tree.js';
import { defaultGrowSettings, type GrowTask } from '../../../src/learn/grow-task.js';
import { LEAF, MULTIWAY, type FlatTree } from '../../../src/learn/flat-tree.js';
import { createRng } from '../../../src/util/rng.js';
import { takeDataset } from '../../../src/table/dataset.js';
import type { Dataset } from '../../../src/table/frame.js';
import type { ClassCriterion } from '../../../src/learn/grow-task.js';
import { classTarget, datasetOf, playTennisData } from './fixtures.js';

const TOL = 1e-6; // CHECKS.md: exact recomputed values compared at 1e-6

function taskOf(data: Dataset, criterion: ClassCriterion = 'entropy'): GrowTask {
  const t = data.target;
  if (t.kind !== 'class') throw new Error('class target expected');
  return {
    frame: data.features, weights: new Float64Array(data.features.nRows).fill(1),
    response: { kind: 'class', codes: t.codes, nClasses: t.classes.length, criterion },
    settings: defaultGrowSettings, rng: createRng(0),
  };
}

function gains(data: Dataset): Record<string, number> {
  return Object.fromEntries(candidateSplits(taskOf(data)).map((c) => [c.name, c.gain]));
}

describe('PlayTennis (Mitchell 1997, Table 3.2)', () => {
  const data = playTennisData();

  it('entropyBits([9, 5]) = Entropy(S) = 0.940286', () => {
    expect(entropyBits([9, 5])).toBeCloseTo(0.940286, 6);
  });

  it('candidateSplits(task) gives the four root gains (Mitchell 1997, §3.4.1–3.4.2)', () => {
    const g = gains(data);
    expect(Math.abs(g.Outlook - 0.24675)).toBeLessThan(TOL);
    expect(Math.abs(g.Humidity - 0.151836)).toBeLessThan(TOL);
    expect(Math.abs(g.Wind - 0.048127)).toBeLessThan(TOL);
    expect(Math.abs(g.Temperature - 0.029223)).toBeLessThan(TOL);
  });

  it('candidateSplits(task) on S_sunny gives the sunny-branch gains (Mitchell 1997, §3.4.2)', () => {
    const outlook = data.features.columns[0];
    if (outlook.kind !== 'categorical') throw new Error('categorical expected');
    const sunny = outlook.categories.indexOf('sunny');
    const rows = [...outlook.codes.keys()].filter((i) => outlook.codes[i] === sunny);
    expect(rows).toEqual([0, 1, 7, 8, 10]); // D1, D2, D8, D9, D11
    const g = gains(takeDataset(data, rows));
    expect(Math.abs(g.Humidity - 0.970951)).toBeLessThan(TOL);
    expect(Math.abs(g.Temperature - 0.570951)).toBeLessThan(TOL);
    expect(Math.abs(g.Wind - 0.019973)).toBeLessThan(TOL);
  });

  it('candidateSplits(task) gives SplitInfo(Outlook) = 1.577406 and GainRatio(Outlook) = 0.156428', () => {
    const o = candidateSplits(taskOf(data, 'gainRatio')).find((c) => c.name === 'Outlook')!;
    expect(Math.abs(o.splitInfo - 1.577406)).toBeLessThan(TOL);
    expect(Math.abs(o.gainRatio - 0.156428)).toBeLessThan(TOL);
    // printed values (Quinlan 1993 rounding) at 2e-3 as CHECKS.md allows
    expect(Math.abs(o.splitInfo - 1.577)).toBeLessThan(2e-3);
  });

  it('fitTree(data) stores the root gain as node weight × Gain(S, Outlook)', () => {
    const { tree } = fitTree(data);
    expect(tree.cover[0]).toBe(14);
    expect(Math.abs(tree.gain[0] / tree.cover[0] - 0.24675)).toBeLessThan(TOL);
  });

  /** Text form of a multiway tree: feature(category -> subtree, ...) or the leaf's majority label. */
  function describeTree(tree: FlatTree, d: Dataset, n = 0): string {
    const t = d.target;
    if (t.kind !== 'class') throw new Error('class');
    if (tree.kind[n] === LEAF) {
      const p = tree.value.subarray(n * tree.nOutputs, (n + 1) * tree.nOutputs);
      return t.classes[p.indexOf(Math.max(...p))];
    }
    expect(tree.kind[n]).toBe(MULTIWAY);
    const col = d.features.columns[tree.feature[n]];
    if (col.kind !== 'categorical') throw new Error('categorical');
    const parts = col.categories.map((c, k) => `${c}->${describeTree(tree, d, tree.branches[tree.offset[n] + k])}`);
    return `${col.name}(${parts.join(', ')})`;
  }

  it('fitTree(data) grows the ID3 tree of Mitchell 1997, Figure 3.1', () => {
    const model = fitTree(data);
    expect(describeTree(model.tree, data)).toBe(
      'Outlook(overcast->yes, rain->Wind(strong->no, weak->yes), sunny->Humidity(high->no, normal->yes))',
    );
    expect(model.tree.nNodes).toBe(8);
  });

  it('fitTree(data, { criterion: "gainRatio" }) picks Outlook at the root and grows the same tree', () => {
    // Root candidates with at least average gain (0.119): Outlook (ratio 0.156) and Humidity (0.152/1 = 0.152),
    // so gain ratio also picks Outlook; in the sunny and rain branches the perfect split (Humidity,
    // Wind: gain = split info = 0.971, ratio 1) also has the largest ratio (hand computation).
    const model = fitTree(data, { criterion: 'gainRatio' });
    expect(describeTree(model.tree, data)).toBe(
      'Outlook(overcast->yes, rain->Wind(strong->no, weak->yes), sunny->Humidity(high->no, normal->yes))',
    );
  });
});

describe('candidateSplits(task) with missing values (Quinlan 1993, C4.5, ch. 3: unknown attribute values)', () => {
  it('scales the gain by the known fraction and counts unknowns as a branch of the split information', () => {
    // g = a a b ?, class 0 0 1 1. Known rows {a: 0 0, b: 1}: H(2/3, 1/3) = 0.918296 bits, both branches pure.
    // gain = F · 0.918296 with F = 3/4 → 0.688722; split info = H(2/4, 1/4, 1/4) = 1.5; ratio = 0.459148.
    const data = datasetOf({ g: ['a', 'a', 'b', null] }, classTarget('y', ['n', 'n', 'y', 'y']));
    const [c] = candidateSplits(taskOf(data, 'gainRatio'));
    const h = entropyBits([2, 1]);
    expect(h).toBeCloseTo(0.918296, 6);
    expect(c.gain).toBeCloseTo(0.75 * h, 12);
    expect(c.splitInfo).toBeCloseTo(1.5, 12);
    expect(c.gainRatio).toBeCloseTo((0.75 * h) / 1.5, 12);
  });
});
