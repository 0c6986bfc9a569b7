/**
 * TreeSHAP against the Shapley value by its definition (Shapley, L.S. (1953) "A value for n-person
 * games", Contributions to the Theory of Games II, eq. for φ_i): φ_j = Σ_{S ⊆ F∖{j}} |S|!(p−|S|−1)!/p! ·
 * (v(S ∪ {j}) − v(S)), with v(S) the tree's conditional expectation used by TreeSHAP (Lundberg, Erion &
 * Lee 2018, arXiv:1802.03888, Algorithm 1, EXPVALUE): features in S follow the row, the others are
 * integrated out by each child's share of the training cover. The brute force here is written apart
 * from src/ (its own child lists), over all 2^p subsets.
 */
import { describe, expect, it } from 'vitest';
import { childOf, LEAF, MULTIWAY, NUMERIC, SUBSET, type FlatTree, type RowSource } from '../../src/learn/flat-tree.js';
import { fitTree } from '../../src/learn/tree/fit-tree.js';
import { rowSourceOf } from '../../src/learn/tree/row-source.js';
import { addTreeShap, prepareShapTree } from '../../src/explain/tree-shap.js';
import { orchard } from './fixtures.js';

/** Tolerance: both sides are sums of a few hundred double products; 1e-12 absolute (common practice). */
const TOL = 1e-12;

function kids(t: FlatTree, n: number): number[] {
  const s: number[] = [];
  const add = (c: number): void => { if (c >= 0 && !s.includes(c)) s.push(c); };
  if (t.kind[n] === MULTIWAY) for (let j = 0; j < t.width[n]; j++) add(t.branches[t.offset[n] + j]);
  else { add(t.left[n]); add(t.right[n]); }
  add(t.missing[n]);
  return s;
}

/** v(S) for output k: Lundberg et al. 2018 Algorithm 1 (EXPVALUE), generalised to any number of children. */
function condExpect(t: FlatTree, src: RowSource, row: number, inS: (f: number) => boolean, k: number, n = 0): number {
  const K = t.nOutputs;
  if (t.kind[n] === LEAF) return t.value[n * K + k];
  if (inS(t.feature[n])) return condExpect(t, src, row, inS, k, childOf(t, n, src, row));
  const cs = kids(t, n);
  const total = cs.reduce((a, c) => a + t.cover[c], 0);
  return cs.reduce((a, c) => a + (total > 0 ? t.cover[c] / total : 1 / cs.length) * condExpect(t, src, row, inS, k, c), 0);
}

function factorial(m: number): number { let f = 1; for (let i = 2; i <= m; i++) f *= i; return f; }

function bruteShapley(t: FlatTree, src: RowSource, row: number, p: number, k: number): number[] {
  const phi = new Array<number>(p).fill(0);
  for (let mask = 0; mask < 1 << p; mask++) {
    const vS = condExpect(t, src, row, (f) => ((mask >> f) & 1) === 1, k);
    const size = bitCount(mask);
    for (let j = 0; j < p; j++) {
      if ((mask >> j) & 1) continue;
      const vSj = condExpect(t, src, row, (f) => f === j || ((mask >> f) & 1) === 1, k);
      phi[j] += (factorial(size) * factorial(p - size - 1) / factorial(p)) * (vSj - vS);
    }
  }
  return phi;
}

function bitCount(m: number): number { let c = 0; while (m) { c += m & 1; m >>= 1; } return c; }

function fastShapley(t: FlatTree, src: RowSource, row: number, p: number): Float64Array {
  const st = prepareShapTree(t, t.value, t.nOutputs);
  const phi = new Float64Array(p * t.nOutputs);
  addTreeShap(st, src, row, phi, t.nOutputs, 0);
  return phi;
}

/** Largest |fast − brute| over rows, features and outputs; throws if every φ is ~0 (a vacuous check). */
function compareAllRows(t: FlatTree, src: RowSource, nRows: number, p: number): number {
  let worst = 0, largest = 0;
  for (let row = 0; row < nRows; row++) {
    const fast = fastShapley(t, src, row, p);
    for (let k = 0; k < t.nOutputs; k++) {
      const slow = bruteShapley(t, src, row, p, k);
      for (let j = 0; j < p; j++) {
        worst = Math.max(worst, Math.abs(fast[j * t.nOutputs + k] - slow[j]));
        largest = Math.max(largest, Math.abs(slow[j]));
      }
    }
  }
  expect(largest).toBeGreaterThan(0.01);
  return worst;
}

function kindsIn(t: FlatTree): Set<number> { return new Set(Array.from(t.kind)); }

describe('addTreeShap(tree, src, row, phi, stride, at) equals brute-force Shapley values (Shapley 1953)', () => {
  it('on a regression tree with a multiway categorical split and missing values (4 features, all 60 rows)', () => {
    const data = orchard(60, 11, 'number');
    const model = fitTree(data, { depthLimit: 4, categorical: 'multiway' });
    expect(kindsIn(model.tree).has(MULTIWAY)).toBe(true);
    const worst = compareAllRows(model.tree, rowSourceOf(data.features), data.features.nRows, 4);
    expect(worst).toBeLessThan(TOL);
  });

  it('on a 3-class tree with category-subset splits (every class output)', () => {
    const data = orchard(80, 5, 'class');
    const model = fitTree(data, { depthLimit: 5, categorical: 'subset', criterion: 'gini' });
    expect(kindsIn(model.tree).has(SUBSET)).toBe(true);
    expect(kindsIn(model.tree).has(NUMERIC)).toBe(true);
    const worst = compareAllRows(model.tree, rowSourceOf(data.features), data.features.nRows, 4);
    expect(worst).toBeLessThan(TOL);
  });

  it('on a hand-built tree where one feature splits twice on a path and a child has no cover', () => {
    // node 0: x0 <= 0.5 ? 1 : 2 (missing → 2); node 1: x1 <= 0 ? 3 : 4; node 2: x0 <= 0.8 ? 5 : 6;
    // node 5: x2 <= 1 ? 7 : 8 with node 8 never reached in training (cover 0).
    const N = 9, L = -1;
    const kind = Uint8Array.from([NUMERIC, NUMERIC, NUMERIC, LEAF, LEAF, NUMERIC, LEAF, LEAF, LEAF]);
    const tree: FlatTree = {
      nNodes: N, nOutputs: 1, kind,
      feature: Int32Array.from([0, 1, 0, L, L, 2, L, L, L]),
      threshold: Float64Array.from([0.5, 0, 0.8, 0, 0, 1, 0, 0, 0]),
      left: Int32Array.from([1, 3, 5, L, L, 7, L, L, L]),
      right: Int32Array.from([2, 4, 6, L, L, 8, L, L, L]),
      missing: Int32Array.from([2, 3, 6, L, L, 7, L, L, L]),
      offset: new Int32Array(N), width: new Int32Array(N), branches: new Int32Array(0), catBits: new Uint32Array(0),
      value: Float64Array.from([0, 0, 0, 1, -2, 0, 5, 3, 100]),
      cover: Float64Array.from([10, 4, 6, 1, 3, 2, 4, 2, 0]),
      count: Float64Array.from([10, 4, 6, 1, 3, 2, 4, 2, 0]),
      gain: new Float64Array(N),
    };
    const xs = [[0.2, -1, 0], [0.7, 3, 0.5], [0.7, 3, 2], [0.9, 0, 0], [NaN, 1, 5], [0.6, NaN, NaN]];
    const src: RowSource = { numeric: [0, 1, 2].map((j) => Float64Array.from(xs, (r) => r[j])), codes: [null, null, null] };
    const worst = compareAllRows(tree, src, xs.length, 3);
    expect(worst).toBeLessThan(TOL);
    // additivity: expected value (cover-weighted leaf mean) + Σ φ = leaf value; row 2 reaches the zero-cover leaf
    const st = prepareShapTree(tree, tree.value, 1);
    expect(st.expected[0]).toBeCloseTo(0.4 * (0.25 * 1 + 0.75 * -2) + 0.6 * ((2 / 6) * 3 + (4 / 6) * 5), 12);
    const phi = fastShapley(tree, src, 2, 3);
    expect(st.expected[0] + phi[0] + phi[1] + phi[2]).toBeCloseTo(100, 9);
  });
});
