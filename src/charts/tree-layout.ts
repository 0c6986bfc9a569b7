/**
 * Tidy tree layout after Reingold & Tilford (1981), "Tidier drawings of trees", IEEE Transactions on
 * Software Engineering SE-7(2):223–228: subtrees are laid out bottom-up, each next sibling subtree is
 * pushed right until its left contour clears the right contour of the siblings before it by at least
 * `separation` at every depth, and each parent sits centred over its first and last child. Contours are
 * kept as plain arrays per depth (O(n · height) rather than the paper's threaded O(n); trees drawn here
 * are capped at a few levels).
 */

/** x (in units of `separation`) and depth of every node; nodes not reached from the root get NaN. */
export interface TreeLayout {
  readonly x: Float64Array;
  readonly depth: Int32Array;
  /** Width of the drawing: max x − min x (min x is 0). */
  readonly width: number;
}

interface Contour { left: number[]; right: number[] }

/**
 * Lay out a tree given each node's children (node ids; `children[n]` empty for a leaf).
 *
 * @param children   Children of every node, left to right.
 * @param root       Root node id. __Default:__ 0.
 * @param separation Least horizontal distance between nodes at the same depth. __Default:__ 1.
 * @example
 * layoutTidyTree([[1, 2], [], []]).x; // Float64Array [0.5, 0, 1]
 */
export function layoutTidyTree(children: readonly (readonly number[])[], root = 0, separation = 1): TreeLayout {
  const n = children.length;
  const rel = new Float64Array(n);
  const depth = new Int32Array(n).fill(-1);
  // Post-order without recursion (deep trees must not overflow the stack).
  const order: number[] = [];
  const stack = [root];
  depth[root] = 0;
  while (stack.length > 0) {
    const v = stack.pop()!;
    order.push(v);
    for (const c of children[v]) { depth[c] = depth[v] + 1; stack.push(c); }
  }
  const contour: (Contour | undefined)[] = new Array(n);
  for (let k = order.length - 1; k >= 0; k--) {
    const v = order[k];
    const kids = children[v];
    if (kids.length === 0) { contour[v] = { left: [0], right: [0] }; continue; }
    const offsets: number[] = [];
    const accLeft: number[] = [], accRight: number[] = [];
    kids.forEach((c, i) => {
      const cc = contour[c]!;
      let off = 0;
      if (i > 0) {
        off = -Infinity;
        const common = Math.min(accRight.length, cc.left.length);
        for (let d = 0; d < common; d++) off = Math.max(off, accRight[d] - cc.left[d] + separation);
      }
      offsets.push(off);
      for (let d = 0; d < cc.left.length; d++) {
        if (d >= accLeft.length) accLeft.push(cc.left[d] + off);
        if (d < accRight.length) accRight[d] = cc.right[d] + off; else accRight.push(cc.right[d] + off);
      }
      contour[c] = undefined;
    });
    const mid = (offsets[0] + offsets[offsets.length - 1]) / 2;
    kids.forEach((c, i) => { rel[c] = offsets[i] - mid; });
    contour[v] = { left: [0, ...accLeft.map((x) => x - mid)], right: [0, ...accRight.map((x) => x - mid)] };
  }
  const x = new Float64Array(n).fill(NaN);
  x[root] = 0;
  for (const v of order) for (const c of children[v]) x[c] = x[v] + rel[c];
  let min = Infinity, max = -Infinity;
  for (const v of order) { min = Math.min(min, x[v]); max = Math.max(max, x[v]); }
  for (const v of order) x[v] -= min;
  return { x, depth, width: max - min };
}
