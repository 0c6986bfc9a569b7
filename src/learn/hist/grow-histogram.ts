/**
 * The histogram tree grower: features binned once (src/table/bin-frame.ts, at most 255 bins plus a
 * missing bin, cached per frame), per-node histograms of channel sums built by the kernels
 * (src/kernels/), and the subtraction trick — build the smaller child's histogram, get the larger one as
 * parent minus smaller. Split rules, stop rules, missing-value routing, node values and numbering follow
 * the exact grower (src/learn/tree/grow-exact.ts), so where bins hold single distinct values both give
 * the same tree. Differences: categorical features always get subset splits (never multiway); more than
 * 255 categories share bins (see bin-frame.ts); a value-response node is treated as constant when its
 * weighted sum of squares is within rounding (2^-52) of Σw·y².
 *
 * Growth: best-first by gain with a finite `leafBudget`, else depth-first with the nodes renumbered
 * breadth-first at the end (only the pending siblings on the path keep a histogram). With
 * `featuresPerSplit` below half the features, each node builds histograms for its own drawn features
 * only (no subtraction). Response channels: class weights per class, or for values the weight W and
 * Σw·y — boosting passes -g/h with weights h, so these are Σh and -Σg.
 */
import { engine } from '../../kernels/engine.js';
import { BINS, MISSING } from '../../kernels/layout.js';
import { viewsOf } from '../../kernels/views.js';
import { NUMERIC, SUBSET } from '../flat-tree.js';
import type { GrowResult, GrowTask } from '../grow-task.js';
import { ENTROPY, GINI, VARIANCE, weightedImpurity, type ImpurityCode } from '../tree/impurity.js';
import { MaxHeap } from '../tree/max-heap.js';
import { weightedMedian } from '../tree/node-value.js';
import { sampleFeatures } from '../tree/sample-features.js';
import { midpoint } from '../../table/bin-edges.js';
import { binnedForGrowth, histBuilder } from './hist-build.js';
import { checkHistTask } from './hist-check.js';
import { breadthFirst, emitTree, type NodeRecord } from './hist-emit.js';
import { finishChoice, pickChoice, type FinishedHistSplit } from './hist-finish.js';
import { scanFeature, type HistChoice } from './hist-scan.js';
import { buildSparse, clearSparse, occupiedRegion, sparseFits, type OccupiedBins } from './hist-sparse.js';
import { openWorkspace, type HistWorkspace } from './hist-workspace.js';

const REL_TOL = 1e-12;
const ROUNDING = 2 ** -52;

interface Open {
  readonly id: number;
  readonly start: number;
  readonly count: number;
  readonly depth: number;
  /** [rows, W, S, Q] (values) or [rows, class weights...]. */
  readonly stats: Float64Array;
  hist: number;
  readonly split: FinishedHistSplit | null;
}

interface Run {
  readonly task: GrowTask;
  readonly ws: HistWorkspace;
  readonly measure: ImpurityCode;
  readonly nCh: number;
  readonly gainRatio: boolean;
  readonly sampled: boolean;
  readonly all: number[];
  readonly nodes: NodeRecord[];
  /** A histogram slot kept all-zero between sparse builds (hist-sparse.ts); -1 until first needed. */
  clean: number;
  /** Occupied-bin lists of the current sparse build (allocated with the clean slot). */
  occ: OccupiedBins | null;
}

/**
 * Grow one tree on binned features (see the file comment for every rule).
 * @example
 * const { tree, leafOfRow } = growHistogram({ frame, weights, response, settings: { ...defaultGrowSettings, categorical: 'subset', leafBudget: 31 }, rng: createRng(1) });
 */
export function growHistogram(task: GrowTask): GrowResult {
  const base = checkHistTask(task);
  const binned = binnedForGrowth(task.frame);
  const ws = openWorkspace(engine(), binned, task, base);
  try {
    return grow(task, ws, base.length);
  } finally {
    ws.release();
  }
}

function grow(task: GrowTask, ws: HistWorkspace, nPos: number): GrowResult {
  const r = task.response;
  const measure: ImpurityCode = r.kind === 'value' ? VARIANCE : r.criterion === 'gini' ? GINI : ENTROPY;
  const k = task.settings.featuresPerSplit;
  const run: Run = {
    task, ws, measure, nCh: r.kind === 'class' ? r.nClasses : 2, gainRatio: r.kind === 'class' && r.criterion === 'gainRatio',
    sampled: k > 0 && 2 * k < ws.nFeat, all: Array.from({ length: ws.nFeat }, (_, f) => f), nodes: [], clean: -1, occ: null,
  };
  const rootStats = gather(run, 0, nPos);
  let rootHist = -1;
  if (!run.sampled && eligible(run, rootStats, 0)) { rootHist = ws.takeSlot(); buildHist(run, 0, nPos, run.all, rootHist); }
  const root = openNode(run, 0, nPos, 0, rootStats, rootHist);
  const expansions: number[] = [];
  const leaves: Open[] = [];
  const budget = task.settings.leafBudget;
  if (Number.isFinite(budget)) {
    const heap = new MaxHeap<Open>((a, b) => (a.split as FinishedHistSplit).gain - (b.split as FinishedHistSplit).gain || b.id - a.id);
    const push = (n: Open): void => { if (n.split) heap.push(n); else leaves.push(n); };
    push(root);
    let nLeaves = 1;
    while (heap.size > 0) {
      const node = heap.pop() as Open;
      if (nLeaves + 1 > budget) { ws.giveSlot(node.hist); node.hist = -1; leaves.push(node); continue; }
      nLeaves++;
      expansions.push(node.id);
      for (const child of expand(run, node)) push(child);
    }
  } else {
    const stack: Open[] = [root];
    while (stack.length) {
      const node = stack.pop() as Open;
      if (!node.split) { leaves.push(node); continue; }
      const [left, right] = expand(run, node);
      stack.push(right, left);
    }
  }
  if (r.kind === 'value' && r.leaf === 'median') medianValues(run, nPos);
  const order = Number.isFinite(budget) ? run.nodes.map((_, i) => i) : breadthFirst(run.nodes);
  const exp = Number.isFinite(budget) ? expansions : order.filter((i) => run.nodes[i].split);
  const { tree, finalId } = emitTree(run.nodes, order, exp, r.kind === 'class' ? r.nClasses : 1);
  const leafOfRow = new Int32Array(task.frame.nRows).fill(-1);
  const rows = ws.engine.arena.i32(ws.rowsPtr, nPos);
  for (const leaf of leaves) {
    const id = finalId[leaf.id];
    for (let i = leaf.start; i < leaf.start + leaf.count; i++) leafOfRow[rows[i]] = id;
  }
  return { tree, leafOfRow };
}

/** Gather the rows of [start, start+count) and return the node's stats. */
function gather(run: Run, start: number, count: number): Float64Array {
  const { ws } = run;
  const { kernels, arena } = ws.engine;
  const rowsPtr = ws.rowsPtr + start * 4;
  if (ws.nClasses === 0) {
    kernels.gatherValue(rowsPtr, count, ws.wPtr, ws.yPtr, ws.gwPtr, ws.gxPtr, ws.statsPtr);
    const s = arena.f64(ws.statsPtr, 3);
    return Float64Array.of(count, s[0], s[1], s[2]);
  }
  kernels.gatherClass(rowsPtr, count, ws.wPtr, ws.yPtr, ws.gwPtr, ws.gxPtr, ws.nClasses, ws.statsPtr);
  const out = new Float64Array(1 + ws.nClasses);
  out[0] = count;
  out.set(arena.f64(ws.statsPtr, ws.nClasses), 1);
  return out;
}

/** Build histograms of `feats` for the rows just gathered ([start, start+count)). */
function buildHist(run: Run, start: number, count: number, feats: readonly number[], hist: number): void {
  const { ws } = run;
  const featsPtr = feats === run.all ? ws.allFeatsPtr : ws.featsPtr;
  if (featsPtr === ws.featsPtr) ws.engine.arena.i32(ws.featsPtr, feats.length).set(feats);
  histBuilder(ws.engine.kernels).build({
    codesPtr: ws.codesPtr, nRows: ws.nRows, rowsPtr: ws.rowsPtr + start * 4, count, gwPtr: ws.gwPtr, gxPtr: ws.gxPtr,
    nClasses: ws.nClasses, featsPtr, nFeats: feats.length, histPtr: hist,
  });
}

/** Weight, impurity and purity of a node from its stats. */
function summary(run: Run, st: Float64Array): { weight: number; impurity: number; pure: boolean; mean: number } {
  if (run.ws.nClasses === 0) {
    const w = st[1], s = st[2], q = st[3];
    const mean = s / w;
    const sse = Math.max(0, q - s * mean);
    return { weight: w, impurity: Math.max(sse, q * ROUNDING), pure: sse <= q * ROUNDING, mean };
  }
  let w = 0, nonZero = 0;
  for (let c = 1; c < st.length; c++) { w += st[c]; if (st[c] > 0) nonZero++; }
  return { weight: w, impurity: weightedImpurity(run.measure, st, 1, run.nCh), pure: nonZero <= 1, mean: 0 };
}

function eligible(run: Run, st: Float64Array, depth: number): boolean {
  const s = run.task.settings, sm = summary(run, st);
  return !sm.pure && depth < s.depthLimit && st[0] >= 2 * s.leafRows && sm.weight >= 2 * s.leafWeight;
}

/** Channels of the whole node in the exact grower's convention. */
function nodeChannels(run: Run, st: Float64Array, mean: number): Float64Array {
  return run.ws.nClasses === 0 ? Float64Array.of(st[1], st[2] - mean * st[1]) : st.slice(1);
}

function openNode(run: Run, start: number, count: number, depth: number, stats: Float64Array, hist: number): Open {
  const { ws, task } = run;
  const sm = summary(run, stats);
  const id = run.nodes.length;
  const value = ws.nClasses === 0 ? Float64Array.of(sm.mean) : stats.slice(1).map((c) => c / sm.weight);
  run.nodes.push({ value, cover: sm.weight, count, start, size: count, split: null });
  let split: FinishedHistSplit | null = null;
  if (eligible(run, stats, depth)) {
    const features = sampleFeatures(run.all, task.settings.featuresPerSplit, task.rng);
    let occ: OccupiedBins | null = null;
    if (run.sampled && sparseFits(count)) {
      hist = cleanSlot(run);
      occ = run.occ as OccupiedBins;
      ws.engine.arena.i32(ws.featsPtr, features.length).set(features);
      buildSparse(ws, start, count, features, hist, occ);
    }
    else if (run.sampled) { hist = ws.takeSlot(); buildHist(run, start, count, features, hist); }
    const tol = REL_TOL * sm.impurity;
    const s = task.settings;
    const scan = { ws, measure: run.measure, nCh: run.nCh, histPtr: hist, mean: sm.mean, leafRows: s.leafRows, leafWeight: s.leafWeight, tol, occupied: occ };
    const cands: HistChoice[] = [];
    // pickChoice keeps the first candidate and then each one beating the kept one by more than tol; without
    // gain ratio only such candidates can matter, so the others are not built (same choice)
    let floor = tol;
    for (const f of features) {
      const c = scanFeature(scan, f, floor);
      if (c !== null && c.score > tol) { cands.push(c); if (!run.gainRatio) floor = c.score + tol; }
    }
    const choice = pickChoice(cands, run.measure, run.nCh, run.gainRatio, sm.weight, tol);
    if (choice) {
      const done = finishChoice(choice, run.measure, run.nCh, nodeChannels(run, stats, sm.mean), tol);
      if (done.gain > tol && done.gain >= s.minGain) { split = done; recordSplit(run, id, done, hist); }
    }
    if (occ) clearSparse(ws, hist, occ);
    else if (run.sampled) ws.giveSlot(hist);
    if (run.sampled) hist = -1;
  }
  if (!split && hist >= 0) { ws.giveSlot(hist); hist = -1; }
  return { id, start, count, depth, stats, hist, split };
}

/** The run's all-zero slot for sparse builds (allocated and cleared once per run). */
function cleanSlot(run: Run): number {
  if (run.clean < 0) {
    run.clean = run.ws.takeSlot();
    run.ws.engine.arena.f64(run.clean, Math.max(1, run.ws.nFeat) * BINS * run.ws.stride).fill(0);
    run.occ = occupiedRegion(run.ws);
  }
  return run.clean;
}

/** Write the split's threshold or category set into the node record (children filled in by expand). */
function recordSplit(run: Run, id: number, s: FinishedHistSplit, hist: number): void {
  const feat = run.ws.binned.features[s.feature];
  const f64 = viewsOf(run.ws.engine.arena.buffer).f64;
  const h = (hist >> 3) + s.feature * BINS * run.ws.stride;
  const seen = (b: number): boolean => f64[h + b * run.ws.stride] > 0;
  let threshold = 0, inLeft: Uint8Array | null = null;
  if (s.kind === NUMERIC) {
    let hi = s.bin + 1;
    while (hi < feat.nBins && !seen(hi)) hi++;
    threshold = feat.binValues ? midpoint(feat.binValues[s.bin], feat.binValues[hi]) : feat.upper[s.bin];
  } else {
    const map = feat.binOfCode as Uint8Array;
    inLeft = new Uint8Array(map.length);
    for (let c = 0; c < map.length; c++) inLeft[c] = seen(map[c]) ? (s.leftBins as Uint8Array)[map[c]] : s.missingSlot === 0 ? 1 : 0;
  }
  run.nodes[id].split = { kind: s.kind === NUMERIC ? NUMERIC : SUBSET, feature: s.feature, threshold, inLeft, left: -1, right: -1, missingSlot: s.missingSlot, gain: s.gain };
}

/** Partition the node's rows, build the children's histograms (subtraction trick), open the children. */
function expand(run: Run, node: Open): [Open, Open] {
  const { ws } = run;
  const { kernels, arena } = ws.engine;
  const split = node.split as FinishedHistSplit;
  const lut = arena.u8(ws.lutPtr, BINS);
  if (split.kind === NUMERIC) for (let b = 0; b < BINS; b++) lut[b] = b <= split.bin ? 1 : 0;
  else lut.set(split.leftBins as Uint8Array);
  lut[MISSING] = split.missingSlot === 0 ? 1 : 0;
  const builder = histBuilder(kernels);
  const nl = builder.partition
    ? builder.partition(ws.codesPtr + split.feature * ws.nRows, ws.rowsPtr + node.start * 4, node.count, ws.lutPtr, ws.scratchPtr)
    : kernels.partitionRows(ws.codesPtr + split.feature * ws.nRows, ws.rowsPtr + node.start * 4, node.count, ws.lutPtr, ws.scratchPtr);
  const ls = node.start, lc = nl, rs = node.start + nl, rc = node.count - nl;
  const depth = node.depth + 1;
  let lStats: Float64Array, rStats: Float64Array, lHist = -1, rHist = -1;
  if (run.sampled) {
    // each child builds its own histograms from the gathered arrays, so gather one child, open it, then the other
    const left = openNode(run, ls, lc, depth, gather(run, ls, lc), -1);
    const right = openNode(run, rs, rc, depth, gather(run, rs, rc), -1);
    return link(run, node, left, right);
  } else {
    const leftSmall = lc <= rc;
    const [ss, sc] = leftSmall ? [ls, lc] : [rs, rc];
    const small = gather(run, ss, sc);
    const large = node.stats.map((v, i) => v - small[i]);
    const eSmall = eligible(run, small, depth), eLarge = eligible(run, large, depth);
    let smallHist = -1, largeHist = -1;
    if (eSmall || eLarge) {
      smallHist = ws.takeSlot();
      buildHist(run, ss, sc, run.all, smallHist);
      if (eLarge) {
        kernels.histSubtract(node.hist, smallHist, node.hist, ws.allFeatsPtr, ws.nFeat, ws.stride);
        largeHist = node.hist;
      } else ws.giveSlot(node.hist);
      if (!eSmall) { ws.giveSlot(smallHist); smallHist = -1; }
    } else ws.giveSlot(node.hist);
    node.hist = -1;
    [lStats, rStats] = leftSmall ? [small, large] : [large, small];
    [lHist, rHist] = leftSmall ? [smallHist, largeHist] : [largeHist, smallHist];
  }
  return link(run, node, openNode(run, ls, lc, depth, lStats, lHist), openNode(run, rs, rc, depth, rStats, rHist));
}

/** Record the children of an expanded node. */
function link(run: Run, node: Open, left: Open, right: Open): [Open, Open] {
  const rec = run.nodes[node.id].split as NonNullable<NodeRecord['split']>;
  rec.left = left.id;
  rec.right = right.id;
  return [left, right];
}

/** Replace every node's value by the weighted median of the responses reaching it. */
function medianValues(run: Run, nPos: number): void {
  const { task, ws } = run;
  if (task.response.kind !== 'value') return;
  const y = task.response.values, w = task.weights;
  const rows = ws.engine.arena.i32(ws.rowsPtr, nPos);
  for (const n of run.nodes) {
    const vals = new Float64Array(n.size), ws2 = new Float64Array(n.size);
    for (let i = 0; i < n.size; i++) { const r = rows[n.start + i]; vals[i] = y[r]; ws2[i] = w[r]; }
    n.value = Float64Array.of(weightedMedian(vals, ws2));
  }
}
