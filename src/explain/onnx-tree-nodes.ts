/**
 * Flat trees as the node and leaf tuples of the ONNX-ML tree-ensemble regressor (ai.onnx.ml
 * TreeEnsembleRegressor, opset 3): numeric splits become BRANCH_LEQ nodes; category-subset and multiway
 * splits become chains of BRANCH_EQ nodes on the category code; missing values follow
 * `nodes_missing_value_tracks_true`.
 *
 * Routing kept exactly:
 * - NUMERIC x ≤ t: BRANCH_LEQ with the largest float32 not above t (inputs are float32, so for any
 *   float32 x, x ≤ t ⇔ x ≤ that value); NaN goes to the true branch when `missing[n]` is the left child.
 * - SUBSET: if missing values go right, one EQ test per category in the set (true → left), the chain
 *   ending on the right child; if they go left, one EQ test per category of the dictionary outside the set
 *   (true → right), ending on the left child. Missing (NaN) and unknown codes match no test, so they end
 *   on the missing child, as in coppice.
 * - MULTIWAY: one EQ test per category whose branch is not the missing child, ending on the missing child.
 * A child reached from several tests (a subset's side) is written once and referenced by each test.
 */
import { errors } from '../errors.js';
import { LEAF, MULTIWAY, NUMERIC, SUBSET, type FlatTree } from '../learn/flat-tree.js';
import type { ColumnSchema } from '../table/frame.js';
import type { AdditiveMember } from './additive-model.js';

/** The regressor's node and target attributes, one entry per node or per leaf weight. */
export interface EnsembleTuples {
  readonly treeIds: number[];
  readonly nodeIds: number[];
  readonly featureIds: number[];
  readonly modes: string[];
  readonly values: number[];
  readonly trueIds: number[];
  readonly falseIds: number[];
  readonly missingTrue: number[];
  readonly targetTreeIds: number[];
  readonly targetNodeIds: number[];
  readonly targetIds: number[];
  readonly targetWeights: number[];
}

const f32 = new Float32Array(1);
const i32 = new Int32Array(f32.buffer);

/**
 * The largest float32 value not above `t` (±Infinity kept).
 * @example
 * float32AtMost(0.1); // 0.09999999403953552
 */
export function float32AtMost(t: number): number {
  const f = Math.fround(t);
  if (f <= t || !Number.isFinite(t)) return f;
  f32[0] = f;
  if (f > 0) i32[0] -= 1;
  else if (f === 0) { f32[0] = -0; i32[0] = (0x80000000 | 1) | 0; }
  else i32[0] += 1;
  return f32[0];
}

interface NodeRow { id: number; feature: number; mode: string; value: number; t: number; f: number; miss: number }

/** Append tree `treeId` (member `m`) to `out`. */
function addTree(m: AdditiveMember, treeId: number, features: readonly ColumnSchema[], out: EnsembleTuples): void {
  const tree: FlatTree = m.tree;
  const rows: NodeRow[] = [];
  const done = new Map<number, number>();
  let next = 0;
  const branch = (feature: number, mode: string, value: number, miss: number): NodeRow => {
    const r = { id: next++, feature, mode, value, t: -1, f: -1, miss };
    rows.push(r);
    return r;
  };
  const emit = (n: number): number => {
    const seen = done.get(n);
    if (seen !== undefined) return seen;
    let id: number;
    const kind = tree.kind[n], feat = tree.feature[n];
    if (kind === LEAF) {
      id = next++;
      rows.push({ id, feature: 0, mode: 'LEAF', value: 0, t: 0, f: 0, miss: 0 });
      for (let k = 0; k < m.width; k++) {
        const w = m.values[n * m.width + k];
        if (w === 0) continue;
        out.targetTreeIds.push(treeId); out.targetNodeIds.push(id); out.targetIds.push(m.at + k); out.targetWeights.push(w);
      }
    } else if (kind === NUMERIC) {
      const miss = tree.missing[n];
      if (miss !== tree.left[n] && miss !== tree.right[n]) throw errors.onnxExport(`node ${n} sends missing values to neither child`);
      const r = branch(feat, 'BRANCH_LEQ', float32AtMost(tree.threshold[n]), miss === tree.left[n] ? 1 : 0);
      id = r.id;
      r.t = emit(tree.left[n]);
      r.f = emit(tree.right[n]);
    } else if (kind === SUBSET || kind === MULTIWAY) {
      const { tests, otherwise } = equalityTests(tree, n, features[feat]);
      if (tests.length === 0) return emitAs(n, otherwise);
      const chain = tests.map(([code]) => branch(feat, 'BRANCH_EQ', code, 0));
      id = chain[0].id;
      chain.forEach((r, i) => { r.t = emit(tests[i][1]); });
      const last = emit(otherwise);
      chain.forEach((r, i) => { r.f = i + 1 < chain.length ? chain[i + 1].id : last; });
    } else {
      throw errors.onnxExport(`node ${n} has an unknown kind ${kind}`);
    }
    done.set(n, id);
    return id;
  };
  const emitAs = (n: number, child: number): number => {
    const id = emit(child);
    done.set(n, id);
    return id;
  };
  emit(0);
  rows.sort((a, b) => a.id - b.id);
  for (const r of rows) {
    out.treeIds.push(treeId); out.nodeIds.push(r.id); out.featureIds.push(r.feature); out.modes.push(r.mode);
    out.values.push(r.value); out.trueIds.push(r.t); out.falseIds.push(r.f); out.missingTrue.push(r.miss);
  }
}

/** EQ tests (code → child) for a categorical node, and the child every other code (and NaN) reaches. */
function equalityTests(tree: FlatTree, n: number, schema: ColumnSchema | undefined): { tests: [number, number][]; otherwise: number } {
  const miss = tree.missing[n];
  const tests: [number, number][] = [];
  if (tree.kind[n] === MULTIWAY) {
    for (let c = 0; c < tree.width[n]; c++) {
      const child = tree.branches[tree.offset[n] + c];
      if (child >= 0 && child !== miss) tests.push([c, child]);
    }
    return { tests, otherwise: miss };
  }
  const left = tree.left[n], right = tree.right[n];
  const isSet = (c: number): boolean => c < tree.width[n] * 32 && ((tree.catBits[tree.offset[n] + (c >>> 5)] >>> (c & 31)) & 1) === 1;
  if (miss === right) {
    for (let c = 0; c < tree.width[n] * 32; c++) if (isSet(c)) tests.push([c, left]);
    return { tests, otherwise: right };
  }
  if (miss !== left) throw errors.onnxExport(`node ${n} sends missing values to neither child`);
  const K = schema?.categories?.length ?? tree.width[n] * 32;
  for (let c = 0; c < K; c++) if (!isSet(c)) tests.push([c, right]);
  return { tests, otherwise: left };
}

/**
 * Node and target tuples for every member of an additive model (tree ids in member order).
 * @example
 * const tuples = ensembleTuples(additiveModelOf(model));
 */
export function ensembleTuples(members: readonly AdditiveMember[], features: readonly ColumnSchema[]): EnsembleTuples {
  const out: EnsembleTuples = {
    treeIds: [], nodeIds: [], featureIds: [], modes: [], values: [], trueIds: [], falseIds: [], missingTrue: [],
    targetTreeIds: [], targetNodeIds: [], targetIds: [], targetWeights: [],
  };
  members.forEach((m, t) => addTree(m, t, features, out));
  return out;
}
