/**
 * Pieces shared by the ensemble model-file codecs: tree lists, importance tables and curves.
 */
import { errors } from '../../errors.js';
import type { ColumnSchema } from '../../table/frame.js';
import type { FlatTree } from '../flat-tree.js';
import type { ModelHeader } from '../model.js';
import { decodeFlatTree, encodeFlatTree } from '../tree/flat-tree-json.js';
import { decodeNumber, encodeNumber, readArray, readObject, readString, type JsonValue } from '../tree/json-values.js';
import type { ImpurityImportanceRow } from './importance.js';

/** Outputs each tree of a model must have: K for class-probability trees, 1 for value trees. */
export function classOutputs(header: ModelHeader): number {
  return header.target.kind === 'class' ? Math.max(1, header.target.classes?.length ?? 0) : 1;
}

export function encodeTrees(trees: readonly FlatTree[]): JsonValue[] {
  return trees.map(encodeFlatTree);
}

/** Read a tree list, checking each tree's outputs. */
export function decodeTrees(v: unknown, path: string, features: readonly ColumnSchema[], nOutputs: number): FlatTree[] {
  return readArray(v, path).map((t, i) => {
    const tree = decodeFlatTree(t, `${path}[${i}]`, features);
    if (tree.nOutputs !== nOutputs) throw errors.badModel(`${path}[${i}].nOutputs should be ${nOutputs}`);
    return tree;
  });
}

export function encodeImportance(rows: readonly ImpurityImportanceRow[]): JsonValue[] {
  return rows.map((r) => ({ feature: r.feature, value: encodeNumber(r.value) }));
}

export function decodeImportance(v: unknown, path: string): ImpurityImportanceRow[] {
  return readArray(v, path).map((x, i) => {
    const o = readObject(x, `${path}[${i}]`);
    return { feature: readString(o.feature, `${path}[${i}].feature`), value: decodeNumber(o.value, `${path}[${i}].value`) };
  });
}

/** A list of numbers (non-finite allowed, tagged). */
export function encodeNumbers(a: readonly number[]): JsonValue[] {
  return a.map(encodeNumber);
}

export function decodeNumbers(v: unknown, path: string): number[] {
  return readArray(v, path).map((x, i) => decodeNumber(x, `${path}[${i}]`));
}
