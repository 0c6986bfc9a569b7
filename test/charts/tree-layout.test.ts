import { describe, expect, it } from 'vitest';
import { layoutTidyTree } from '../../src/charts/tree-layout.js';
import { createRng } from '../../src/util/rng.js';

/** A random tree of n nodes, each node's parent chosen among earlier nodes (seeded). */
function randomTree(n: number, seed: number, maxKids = 3): number[][] {
  const rng = createRng(seed);
  const children: number[][] = [[]];
  for (let v = 1; v < n; v++) {
    let p: number;
    do p = rng.int(v); while (children[p].length >= maxKids);
    children[p].push(v);
    children.push([]);
  }
  return children;
}

describe('layoutTidyTree(children)', () => {
  it('centres a parent over two leaves one separation apart', () => {
    const l = layoutTidyTree([[1, 2], [], []]);
    expect(Array.from(l.x)).toEqual([0.5, 0, 1]);
    expect(Array.from(l.depth)).toEqual([0, 1, 1]);
    expect(l.width).toBe(1);
  });

  it('pushes a sibling subtree clear of its neighbour at every depth, not only at the top (Reingold & Tilford 1981)', () => {
    // 0 → 1, 2; 1 → 3, 4; 2 → 5, 6: the inner grandchildren 4 and 5 must stay one unit apart.
    const l = layoutTidyTree([[1, 2], [3, 4], [5, 6], [], [], [], []]);
    expect(l.x[5] - l.x[4]).toBeCloseTo(1, 12);
    expect(l.x[0]).toBeCloseTo((l.x[1] + l.x[2]) / 2, 12);
    expect(l.width).toBe(3);
  });

  for (const seed of [1, 2, 3, 4, 5]) {
    it(`random tree (seed ${seed}): nodes at one depth keep the separation, parents sit mid-children, min x is 0`, () => {
      const children = randomTree(60, seed);
      const l = layoutTidyTree(children, 0, 1.5);
      const byDepth = new Map<number, number[]>();
      children.forEach((_, v) => byDepth.set(l.depth[v], [...(byDepth.get(l.depth[v]) ?? []), l.x[v]]));
      for (const xs of byDepth.values()) {
        xs.sort((a, b) => a - b);
        for (let i = 1; i < xs.length; i++) expect(xs[i] - xs[i - 1]).toBeGreaterThanOrEqual(1.5 - 1e-9);
      }
      children.forEach((kids, v) => {
        if (kids.length > 0) expect(l.x[v]).toBeCloseTo((l.x[kids[0]] + l.x[kids[kids.length - 1]]) / 2, 9);
        for (let i = 1; i < kids.length; i++) expect(l.x[kids[i]]).toBeGreaterThan(l.x[kids[i - 1]]);
      });
      expect(Math.min(...l.x)).toBe(0);
    });
  }

  it('lays out a single node and a 20,000-node chain without deep recursion', () => {
    expect(Array.from(layoutTidyTree([[]]).x)).toEqual([0]);
    const chain = Array.from({ length: 20_000 }, (_, i) => (i + 1 < 20_000 ? [i + 1] : []));
    const l = layoutTidyTree(chain);
    expect(l.width).toBe(0);
    expect(l.depth[19_999]).toBe(19_999);
  });

  it('leaves nodes not reached from the root at NaN', () => {
    const l = layoutTidyTree([[1], [], []]);
    expect(Number.isNaN(l.x[2])).toBe(true);
  });
});
