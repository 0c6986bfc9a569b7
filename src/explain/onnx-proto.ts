/**
 * ONNX model messages written with `ProtoWriter`, field numbers as in the open standard's schema
 * (onnx/onnx.proto: ModelProto, GraphProto, NodeProto, AttributeProto, ValueInfoProto, TypeProto,
 * TensorShapeProto, TensorProto, OperatorSetIdProto, StringStringEntryProto).
 */
import { ProtoWriter } from './protobuf.js';

/** TensorProto.DataType values used here. */
export const ONNX_FLOAT = 1;
export const ONNX_INT64 = 7;
export const ONNX_DOUBLE = 11;

export type OnnxAttribute =
  | { readonly name: string; readonly type: 'float'; readonly value: number }
  | { readonly name: string; readonly type: 'int'; readonly value: number }
  | { readonly name: string; readonly type: 'string'; readonly value: string }
  | { readonly name: string; readonly type: 'floats'; readonly values: ArrayLike<number> }
  | { readonly name: string; readonly type: 'ints'; readonly values: ArrayLike<number> }
  | { readonly name: string; readonly type: 'strings'; readonly values: readonly string[] }
  | { readonly name: string; readonly type: 'tensor'; readonly tensor: OnnxTensor };

export interface OnnxTensor {
  readonly name?: string;
  readonly dims: readonly number[];
  readonly dataType: typeof ONNX_FLOAT | typeof ONNX_DOUBLE | typeof ONNX_INT64;
  readonly values: ArrayLike<number>;
}

export interface OnnxNode {
  readonly opType: string;
  readonly domain?: string;
  readonly name: string;
  readonly inputs: readonly string[];
  readonly outputs: readonly string[];
  readonly attributes: readonly OnnxAttribute[];
}

/** A graph input or output: a tensor of an element type and shape (a string names a free dimension). */
export interface OnnxValueInfo {
  readonly name: string;
  readonly elemType: number;
  readonly dims: readonly (number | string)[];
  readonly doc?: string;
}

export interface OnnxGraph {
  readonly name: string;
  readonly nodes: readonly OnnxNode[];
  readonly inputs: readonly OnnxValueInfo[];
  readonly outputs: readonly OnnxValueInfo[];
  readonly initializers: readonly OnnxTensor[];
  readonly doc?: string;
}

export interface OnnxModel {
  readonly irVersion: number;
  readonly opsets: readonly { readonly domain: string; readonly version: number }[];
  readonly producerName: string;
  readonly producerVersion: string;
  readonly doc?: string;
  readonly graph: OnnxGraph;
  readonly metadata: Readonly<Record<string, string>>;
}

const ATTR_TYPE = { float: 1, int: 2, string: 3, tensor: 4, floats: 6, ints: 7, strings: 8 } as const;

function writeTensor(w: ProtoWriter, t: OnnxTensor): void {
  for (const d of t.dims) w.int(1, d);
  w.int(2, t.dataType);
  if (t.dataType === ONNX_FLOAT) w.packedFloats(4, t.values);
  else if (t.dataType === ONNX_INT64) w.packedInts(7, t.values);
  else w.packedDoubles(10, t.values);
  if (t.name !== undefined) w.string(8, t.name);
}

function writeAttribute(w: ProtoWriter, a: OnnxAttribute): void {
  w.string(1, a.name);
  w.int(20, ATTR_TYPE[a.type]);
  switch (a.type) {
    case 'float': w.float(2, a.value); break;
    case 'int': w.int(3, a.value); break;
    case 'string': w.string(4, a.value); break;
    case 'tensor': w.message(5, (t) => writeTensor(t, a.tensor)); break;
    case 'floats': w.packedFloats(7, a.values); break;
    case 'ints': w.packedInts(8, a.values); break;
    case 'strings': for (const s of a.values) w.string(9, s); break;
  }
}

function writeNode(w: ProtoWriter, n: OnnxNode): void {
  for (const i of n.inputs) w.string(1, i);
  for (const o of n.outputs) w.string(2, o);
  w.string(3, n.name);
  w.string(4, n.opType);
  for (const a of n.attributes) w.message(5, (m) => writeAttribute(m, a));
  if (n.domain) w.string(7, n.domain);
}

function writeValueInfo(w: ProtoWriter, v: OnnxValueInfo): void {
  w.string(1, v.name);
  w.message(2, (type) => type.message(1, (tensor) => {
    tensor.int(1, v.elemType);
    tensor.message(2, (shape) => {
      for (const d of v.dims) shape.message(1, (dim) => (typeof d === 'number' ? dim.int(1, d) : dim.string(2, d)));
    });
  }));
  if (v.doc) w.string(3, v.doc);
}

function writeGraph(w: ProtoWriter, g: OnnxGraph): void {
  for (const n of g.nodes) w.message(1, (m) => writeNode(m, n));
  w.string(2, g.name);
  for (const t of g.initializers) w.message(5, (m) => writeTensor(m, t));
  if (g.doc) w.string(10, g.doc);
  for (const v of g.inputs) w.message(11, (m) => writeValueInfo(m, v));
  for (const v of g.outputs) w.message(12, (m) => writeValueInfo(m, v));
}

/**
 * Serialise an ONNX model (ModelProto) to bytes.
 * @example
 * const bytes = encodeOnnxModel({ irVersion: 8, opsets: [{ domain: '', version: 13 }], ... });
 */
export function encodeOnnxModel(m: OnnxModel): Uint8Array {
  const w = new ProtoWriter();
  w.int(1, m.irVersion);
  w.string(2, m.producerName);
  w.string(3, m.producerVersion);
  if (m.doc) w.string(6, m.doc);
  w.message(7, (g) => writeGraph(g, m.graph));
  for (const o of m.opsets) w.message(8, (s) => { s.string(1, o.domain); s.int(2, o.version); });
  for (const [key, value] of Object.entries(m.metadata)) w.message(14, (e) => { e.string(1, key); e.string(2, value); });
  return w.finish();
}
