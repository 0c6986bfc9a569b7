/**
 * A FlatTree as JSON and back. Reading checks everything a prediction relies on, so a corrupted file
 * can never make routing loop or read out of bounds: array lengths, node kinds, feature indices and
 * their kinds, children strictly after their parent and inside the tree, bitset and branch ranges.
 */
import { errors } from '../../errors.js';
import type { ColumnSchema } from '../../table/frame.js';
import { LEAF, MULTIWAY, NUMERIC, SUBSET, type FlatTree } from '../flat-tree.js';
import type { JsonValue } from './json-values.js';
import { encodeFloats, readFloats, readInt, readInts, readObject } from './json-values.js';

const I32_MAX = 2147483647;

/**
 * Plain-JSON form of a tree (typed arrays as arrays; non-finite numbers tagged).
 * @example
 * const body = { trees: forest.trees.map(encodeFlatTree) };
 */
export function encodeFlatTree(t: FlatTree): { [key: string]: JsonValue } {
  return {
    nNodes: t.nNodes, nOutputs: t.nOutputs,
    kind: Array.from(t.kind), feature: Array.from(t.feature), threshold: encodeFloats(t.threshold),
    left: Array.from(t.left), right: Array.from(t.right), missing: Array.from(t.missing),
    offset: Array.from(t.offset), width: Array.from(t.width), branches: Array.from(t.branches),
    catBits: Array.from(t.catBits), value: encodeFloats(t.value), cover: encodeFloats(t.cover),
    count: encodeFloats(t.count), gain: encodeFloats(t.gain),
  };
}

/**
 * Read and check a tree written by `encodeFlatTree`. `features` is the model's feature schema: every
 * split must name a feature of the right kind.
 * @example
 * const tree = decodeFlatTree(body.tree, 'body.tree', header.features);
 */
export function decodeFlatTree(v: unknown, path: string, features: readonly ColumnSchema[]): FlatTree {
  const o = readObject(v, path);
  const nNodes = readInt(o.nNodes, `${path}.nNodes`, 1, I32_MAX);
  const nOutputs = readInt(o.nOutputs, `${path}.nOutputs`, 1, 1_000_000);
  const p = (k: string): string => `${path}.${k}`;
  const kind = Uint8Array.from(readInts(o.kind, p('kind'), nNodes, 0, 3));
  const feature = Int32Array.from(readInts(o.feature, p('feature'), nNodes, -1, features.length - 1));
  const threshold = readFloats(o.threshold, p('threshold'), nNodes, false);
  const left = Int32Array.from(readInts(o.left, p('left'), nNodes, -1, nNodes - 1));
  const right = Int32Array.from(readInts(o.right, p('right'), nNodes, -1, nNodes - 1));
  const missing = Int32Array.from(readInts(o.missing, p('missing'), nNodes, -1, nNodes - 1));
  const offset = Int32Array.from(readInts(o.offset, p('offset'), nNodes, 0, I32_MAX));
  const width = Int32Array.from(readInts(o.width, p('width'), nNodes, 0, I32_MAX));
  const branches = Int32Array.from(readInts(o.branches, p('branches'), undefined, -1, nNodes - 1));
  const catBits = Uint32Array.from(readInts(o.catBits, p('catBits'), undefined, 0, 4294967295));
  const value = readFloats(o.value, p('value'), nNodes * nOutputs);
  const cover = readFloats(o.cover, p('cover'), nNodes);
  const count = readFloats(o.count, p('count'), nNodes);
  const gain = readFloats(o.gain, p('gain'), nNodes);
  const child = (n: number, c: number, what: string): void => {
    if (!(c > n && c < nNodes)) throw errors.badModel(`${path}: node ${n} has ${what} ${c}, expected a node index in ${n + 1}..${nNodes - 1}`);
  };
  for (let n = 0; n < nNodes; n++) {
    const k = kind[n];
    if (k === LEAF) continue;
    const f = feature[n];
    if (f < 0) throw errors.badModel(`${path}: split node ${n} has no feature`);
    const isCat = features[f].kind === 'categorical';
    if ((k === NUMERIC) === isCat) {
      throw errors.badModel(`${path}: node ${n} splits feature ${JSON.stringify(features[f].name)} (${features[f].kind}) as ${k === NUMERIC ? 'numeric' : 'categorical'}`);
    }
    if (k === NUMERIC || k === SUBSET) {
      child(n, left[n], 'left child'); child(n, right[n], 'right child');
      if (missing[n] !== left[n] && missing[n] !== right[n]) throw errors.badModel(`${path}: node ${n} sends missing values to ${missing[n]}, not one of its children`);
      if (k === NUMERIC && Number.isNaN(threshold[n])) throw errors.badModel(`${path}: node ${n} has no threshold`);
      if (k === SUBSET && (width[n] < 1 || offset[n] + width[n] > catBits.length)) throw errors.badModel(`${path}: node ${n} has a category set outside catBits`);
    } else if (k === MULTIWAY) {
      if (width[n] < 1 || offset[n] + width[n] > branches.length) throw errors.badModel(`${path}: node ${n} has branches outside the branch table`);
      child(n, missing[n], 'missing-value child');
      for (let c = 0; c < width[n]; c++) {
        const b = branches[offset[n] + c];
        if (b !== -1) child(n, b, `branch ${c}`);
      }
    }
    if (cover[n] < 0 || count[n] < 0) throw errors.badModel(`${path}: node ${n} has a negative cover or count`);
  }
  return { nNodes, nOutputs, kind, feature, threshold, left, right, missing, offset, width, branches, catBits, value, cover, count, gain };
}
