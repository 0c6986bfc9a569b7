/**
 * Words for a drawn tree: the children of a node with the condition on each edge, and node captions.
 */
import { LEAF, MULTIWAY, NUMERIC, SUBSET, type FlatTree } from '../learn/flat-tree.js';

/** A child of a node and the condition that leads to it. */
export interface TreeEdge {
  readonly child: number;
  readonly condition: string;
  /** Missing values (and unseen categories) follow this edge. */
  readonly takesMissing: boolean;
}

/** Name and categories of a feature, as in a column schema. */
export interface TreeFeature {
  readonly name: string;
  readonly categories?: readonly string[];
}

/** A threshold with enough digits that no training value lands on the wrong side of the label. */
export function formatThreshold(t: number): string {
  if (!Number.isFinite(t)) return String(t);
  return String(Number(t.toPrecision(6))).replace('-', '−');
}

function categoryName(f: TreeFeature | undefined, code: number): string {
  return f?.categories?.[code] ?? `#${code}`;
}

function joinCategories(names: readonly string[]): string {
  return names.length === 0 ? '(none)' : names.join(', ');
}

/** The children of internal node `n`, left to right, each with its edge condition. Empty for a leaf. */
export function treeEdges(tree: FlatTree, n: number, features: readonly TreeFeature[]): TreeEdge[] {
  const f = features[tree.feature[n]];
  const miss = tree.missing[n];
  switch (tree.kind[n]) {
    case NUMERIC: {
      const t = formatThreshold(tree.threshold[n]);
      return [
        { child: tree.left[n], condition: `≤ ${t}`, takesMissing: miss === tree.left[n] },
        { child: tree.right[n], condition: `> ${t}`, takesMissing: miss === tree.right[n] },
      ];
    }
    case SUBSET: {
      const nCats = f?.categories?.length ?? tree.width[n] * 32;
      const inLeft: string[] = [], inRight: string[] = [];
      for (let c = 0; c < nCats; c++) {
        const word = tree.catBits[tree.offset[n] + (c >>> 5)] ?? 0;
        ((word >>> (c & 31)) & 1 ? inLeft : inRight).push(categoryName(f, c));
      }
      return [
        { child: tree.left[n], condition: joinCategories(inLeft), takesMissing: miss === tree.left[n] },
        { child: tree.right[n], condition: joinCategories(inRight), takesMissing: miss === tree.right[n] },
      ];
    }
    case MULTIWAY: {
      const byChild = new Map<number, string[]>();
      for (let c = 0; c < tree.width[n]; c++) {
        const child = tree.branches[tree.offset[n] + c];
        if (child < 0) continue;
        const list = byChild.get(child) ?? [];
        list.push(categoryName(f, c));
        byChild.set(child, list);
      }
      if (miss >= 0 && !byChild.has(miss)) byChild.set(miss, []);
      return [...byChild].map(([child, names]) => ({ child, condition: names.length ? joinCategories(names) : 'other', takesMissing: miss === child }));
    }
    default:
      return [];
  }
}

/** Number of nodes in the subtree below `n` (excluding `n`). */
export function countBelow(tree: FlatTree, n: number, features: readonly TreeFeature[]): number {
  let total = 0;
  const stack = [n];
  while (stack.length > 0) {
    const v = stack.pop()!;
    if (tree.kind[v] === LEAF) continue;
    for (const e of treeEdges(tree, v, features)) { total++; stack.push(e.child); }
  }
  return total;
}
