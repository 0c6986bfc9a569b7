/**
 * Tidy tree layout after Reingold & Tilford (1981), "Tidier drawings of trees", IEEE Transactions on
 * Software Engineering SE-7(2):223–228: subtrees are laid out bottom-up, each next sibling subtree is
 * pushed right until its left contour clears the right contour of the siblings before it by at least
 * `separation` at every depth, and each parent sits centred over its first and last child. Contours are
 * arrays stored deepest level first with a lazy shift, so moving a subtree is O(1) and merging two
 * contours costs the height of the shorter one (the same bound the paper gets with threads).
 */

/** x (in units of `separation`) and depth of every node; nodes not reached from the root get NaN. */
export interface TreeLayout {
  readonly x: Float64Array;
  readonly depth: Int32Array;
  /** Width of the drawing: max x − min x (min x is 0). */
  readonly width: number;
}

/** Left and right contours of a subtree, deepest level first; true x = value + shift. */
interface Contour { left: number[]; leftShift: number; right: number[]; rightShift: number }

const at = (arr: number[], shift: number, d: number): number => arr[arr.length - 1 - d] + shift;

/** Merge `next` (already moved by `off`) to the right of `acc`; reuses the longer arrays. */
function mergeContours(acc: Contour, next: Contour, off: number): Contour {
  const hAcc = acc.left.length, hNext = next.left.length;
  const nextLeftShift = next.leftShift + off, nextRightShift = next.rightShift + off;
  if (hNext >= hAcc) {
    // Right side: all of next. Left side: acc on top, next below.
    const left = next.left;
    for (let d = 0; d < hAcc; d++) left[left.length - 1 - d] = at(acc.left, acc.leftShift, d) - nextLeftShift;
    return { left, leftShift: nextLeftShift, right: next.right, rightShift: nextRightShift };
  }
  // Left side: all of acc. Right side: next on top, acc below.
  const right = acc.right;
  for (let d = 0; d < hNext; d++) right[right.length - 1 - d] = at(next.right, nextRightShift, d) - acc.rightShift;
  return { left: acc.left, leftShift: acc.leftShift, right, rightShift: acc.rightShift };
}

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
    if (kids.length === 0) { contour[v] = { left: [0], leftShift: 0, right: [0], rightShift: 0 }; continue; }
    const offsets: number[] = [0];
    let acc = contour[kids[0]]!;
    contour[kids[0]] = undefined;
    for (let i = 1; i < kids.length; i++) {
      const cc = contour[kids[i]]!;
      contour[kids[i]] = undefined;
      let off = -Infinity;
      const common = Math.min(acc.right.length, cc.left.length);
      for (let d = 0; d < common; d++) off = Math.max(off, at(acc.right, acc.rightShift, d) - at(cc.left, cc.leftShift, d) + separation);
      offsets.push(off);
      acc = mergeContours(acc, cc, off);
    }
    const mid = (offsets[0] + offsets[offsets.length - 1]) / 2;
    kids.forEach((c, i) => { rel[c] = offsets[i] - mid; });
    acc.leftShift -= mid;
    acc.rightShift -= mid;
    acc.left.push(-acc.leftShift);
    acc.right.push(-acc.rightShift);
    contour[v] = acc;
  }
  const x = new Float64Array(n).fill(NaN);
  x[root] = 0;
  for (const v of order) for (const c of children[v]) x[c] = x[v] + rel[c];
  let min = Infinity, max = -Infinity;
  for (const v of order) { min = Math.min(min, x[v]); max = Math.max(max, x[v]); }
  for (const v of order) x[v] -= min;
  return { x, depth, width: max - min };
}
