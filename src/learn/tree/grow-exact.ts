/**
 * The exact tree grower: every candidate threshold of every numeric feature (presorted once) and every
 * categorical split, scored by entropy (information gain), gain ratio, Gini or variance. The textbook
 * method and the test oracle for the histogram grower.
 *
 * Stop rules at a node: it is pure (one class, or constant response), depth reached `depthLimit`, it
 * cannot give two children with `leafRows` rows and `leafWeight` weight, no feature gives a split with
 * a positive score, or the split's gain is below `minGain`. A split must reduce weighted impurity by
 * more than 1e-12 of the node's own weighted impurity (so rounding noise never splits a node).
 * With a finite `leafBudget`, nodes are split best-first by gain (ties: lower node index) until the
 * budget is used; a split that would exceed it is skipped. Otherwise nodes are split breadth-first.
 * A categorical feature is used at most once per path in multiway mode.
 */
import { checkGrowSettings } from '../check-grow-settings.js';
import { errors } from '../../errors.js';
import type { GrowResult, GrowTask } from '../grow-task.js';
import { MULTIWAY, NUMERIC, SUBSET } from '../flat-tree.js';
import { addRow, createGrowContext, type GrowContext } from './grow-context.js';
import { VARIANCE, weightedImpurity } from './impurity.js';
import { findSplit } from './find-split.js';
import { nodeValue } from './node-value.js';
import { partitionRange } from './partition.js';
import { sampleFeatures } from './sample-features.js';
import { finishSplit, type FinishedSplit } from './split-choice.js';
import { TreeBuilder } from './tree-builder.js';
import { MaxHeap } from './max-heap.js';

/** Relative tolerance for ties and for "positive" gains. */
const REL_TOL = 1e-12;

interface OpenNode {
  readonly id: number;
  readonly start: number;
  readonly end: number;
  readonly depth: number;
  /** Features already used by a multiway split on the path (1) or null. */
  readonly used: Uint8Array | null;
  readonly split: FinishedSplit | null;
}

/**
 * Grow one tree by exhaustive search over splits (see the file comment for every rule).
 * @example
 * const { tree, leafOfRow } = growExact({ frame, weights, response, settings: defaultGrowSettings, rng: createRng(1) });
 */
export function growExact(task: GrowTask): GrowResult {
  checkSettings(task);
  const ctx = createGrowContext(task);
  const builder = new TreeBuilder(ctx.measure === VARIANCE ? 1 : ctx.nCh);
  const leaves: OpenNode[] = [];
  const root = openNode(ctx, task, builder, 0, ctx.base.length, 0, null);
  const budget = task.settings.leafBudget;
  let nLeaves = 1;
  if (Number.isFinite(budget)) {
    const heap = new MaxHeap<OpenNode>((a, b) => (a.split as FinishedSplit).gain - (b.split as FinishedSplit).gain || b.id - a.id);
    const push = (n: OpenNode): void => { if (n.split) heap.push(n); else leaves.push(n); };
    push(root);
    while (heap.size > 0) {
      const node = heap.pop() as OpenNode;
      const split = node.split as FinishedSplit;
      if (nLeaves + split.nSlots - 1 > budget) { leaves.push(node); continue; }
      nLeaves += split.nSlots - 1;
      for (const child of expand(ctx, task, builder, node)) push(child);
    }
  } else {
    const queue: OpenNode[] = [root];
    for (let q = 0; q < queue.length; q++) {
      const node = queue[q];
      if (!node.split) { leaves.push(node); continue; }
      for (const child of expand(ctx, task, builder, node)) queue.push(child);
    }
  }
  const leafOfRow = new Int32Array(task.frame.nRows).fill(-1);
  for (const leaf of leaves) for (let i = leaf.start; i < leaf.end; i++) leafOfRow[ctx.base[i]] = leaf.id;
  return { tree: builder.finish(), leafOfRow };
}

function checkSettings(task: GrowTask): void {
  checkGrowSettings(task.settings);
}

/** Create the node owning `base[start, end)`: its value, and the split it would take (or null). */
function openNode(ctx: GrowContext, task: GrowTask, builder: TreeBuilder, start: number, end: number, depth: number, used: Uint8Array | null): OpenNode {
  const nCh = ctx.nCh;
  const stats = new Float64Array(nCh);
  let mean = 0, impurity: number, pure: boolean;
  if (ctx.y !== null) {
    let w = 0, s = 0, lo = Infinity, hi = -Infinity;
    for (let i = start; i < end; i++) {
      const r = ctx.base[i], v = ctx.y[r];
      w += ctx.w[r]; s += ctx.w[r] * v;
      if (v < lo) lo = v;
      if (v > hi) hi = v;
    }
    mean = s / w;
    let sse = 0;
    for (let i = start; i < end; i++) {
      const r = ctx.base[i];
      const d = ctx.y[r] - mean;
      ctx.yc[r] = d;
      sse += ctx.w[r] * d * d;
    }
    for (let i = start; i < end; i++) addRow(ctx, stats, 0, ctx.base[i]);
    impurity = sse;
    pure = lo === hi;
  } else {
    for (let i = start; i < end; i++) addRow(ctx, stats, 0, ctx.base[i]);
    let nonZero = 0;
    for (let k = 0; k < nCh; k++) if (stats[k] > 0) nonZero++;
    impurity = weightedImpurity(ctx.measure, stats, 0, nCh);
    pure = nonZero <= 1;
  }
  const weight = ctx.y !== null ? stats[0] : stats.reduce((a, b) => a + b, 0);
  const id = builder.addLeaf(nodeValue(ctx, start, end, stats, mean), weight, end - start);
  const s = task.settings;
  let split: FinishedSplit | null = null;
  if (!pure && depth < s.depthLimit && end - start >= 2 * s.leafRows && weight >= 2 * s.leafWeight) {
    const eligible: number[] = [];
    for (let f = 0; f < ctx.nFeatures; f++) if (!(used && used[f])) eligible.push(f);
    const features = sampleFeatures(eligible, s.featuresPerSplit, task.rng);
    const tol = REL_TOL * impurity;
    const choice = findSplit(ctx, features, start, end, stats, weight, tol);
    if (choice) {
      const done = finishSplit(ctx, choice, stats, tol);
      if (done.gain > tol && done.gain >= s.minGain) split = done;
    }
  }
  return { id, start, end, depth, used, split };
}

/** Route the node's rows to its children, partition the ranges, open the children, record the split. */
function expand(ctx: GrowContext, task: GrowTask, builder: TreeBuilder, node: OpenNode): OpenNode[] {
  const split = node.split as FinishedSplit;
  const f = split.feature;
  const slot = ctx.slot;
  const base = ctx.base, end = node.end, missingSlot = split.missingSlot;
  if (split.kind === NUMERIC) {
    const vals = ctx.numeric[f] as Float64Array, threshold = split.threshold;
    for (let i = node.start; i < end; i++) {
      const r = base[i], x = vals[r];
      slot[r] = x !== x ? missingSlot : x <= threshold ? 0 : 1;
    }
  } else {
    const codes = ctx.cats[f] as Int32Array;
    const map = split.kind === MULTIWAY ? (split.branchOf as Int32Array) : null;
    const inLeft = split.inLeft;
    for (let i = node.start; i < end; i++) {
      const r = base[i], c = codes[r];
      if (c < 0) slot[r] = missingSlot;
      else if (map) slot[r] = map[c];
      else slot[r] = (inLeft as Uint8Array)[c] ? 0 : 1;
    }
  }
  const bounds = partitionRange(ctx, node.start, node.end, split.nSlots);
  let used = node.used;
  if (split.kind === MULTIWAY) {
    used = used ? used.slice() : new Uint8Array(ctx.nFeatures);
    used[f] = 1;
  }
  const children: OpenNode[] = [];
  for (let j = 0; j < split.nSlots; j++) {
    children.push(openNode(ctx, task, builder, bounds[j], bounds[j + 1], node.depth + 1, used));
  }
  const ids = children.map((c) => c.id);
  const missingChild = ids[split.missingSlot];
  if (split.kind === NUMERIC) {
    builder.setNumeric(node.id, f, split.threshold, ids[0], ids[1], missingChild, split.gain);
  } else if (split.kind === SUBSET) {
    const inLeft = (split.inLeft as Uint8Array).slice();
    // categories not seen at this node follow the missing-value child
    const seen = new Uint8Array(inLeft.length);
    const codes = ctx.cats[f] as Int32Array;
    for (let i = node.start; i < node.end; i++) { const c = codes[ctx.base[i]]; if (c >= 0) seen[c] = 1; }
    for (let c = 0; c < inLeft.length; c++) if (!seen[c]) inLeft[c] = split.missingSlot === 0 ? 1 : 0;
    builder.setSubset(node.id, f, inLeft, ids[0], ids[1], missingChild, split.gain);
  } else {
    const branchOf = (split.branchOf as Int32Array).map((j) => (j < 0 ? -1 : ids[j]));
    builder.setMultiway(node.id, f, branchOf, missingChild, split.gain);
  }
  return children;
}
