/**
 * A growable tree: nodes appended one at a time into plain arrays, frozen into a `FlatTree` at the end.
 * Growers append a node when it is created (so children always get larger indices than parents) and
 * turn it into a split later.
 */
import { LEAF, MULTIWAY, NUMERIC, SUBSET, type FlatTree } from '../flat-tree.js';

export class TreeBuilder {
  readonly nOutputs: number;
  private kind: number[] = [];
  private feature: number[] = [];
  private threshold: number[] = [];
  private left: number[] = [];
  private right: number[] = [];
  private missing: number[] = [];
  private offset: number[] = [];
  private width: number[] = [];
  private branches: number[] = [];
  private catBits: number[] = [];
  private value: number[] = [];
  private cover: number[] = [];
  private count: number[] = [];
  private gain: number[] = [];

  constructor(nOutputs: number) {
    this.nOutputs = nOutputs;
  }

  get size(): number {
    return this.kind.length;
  }

  /** Append a leaf with its prediction `value` (length nOutputs); returns its index. */
  addLeaf(value: ArrayLike<number>, cover: number, count: number): number {
    const id = this.kind.length;
    this.kind.push(LEAF); this.feature.push(-1); this.threshold.push(0);
    this.left.push(-1); this.right.push(-1); this.missing.push(-1);
    this.offset.push(0); this.width.push(0);
    for (let k = 0; k < this.nOutputs; k++) this.value.push(value[k]);
    this.cover.push(cover); this.count.push(count); this.gain.push(0);
    return id;
  }

  /** Make node `id` a numeric split: x <= threshold goes to `left`. */
  setNumeric(id: number, feature: number, threshold: number, left: number, right: number, missing: number, gain: number): void {
    this.kind[id] = NUMERIC; this.feature[id] = feature; this.threshold[id] = threshold;
    this.left[id] = left; this.right[id] = right; this.missing[id] = missing; this.gain[id] = gain;
  }

  /** Make node `id` a category-subset split: codes with their flag set in `inLeft` go to `left`. */
  setSubset(id: number, feature: number, inLeft: ArrayLike<number>, left: number, right: number, missing: number, gain: number): void {
    const words = Math.max(1, Math.ceil(inLeft.length / 32));
    const off = this.catBits.length;
    for (let w = 0; w < words; w++) this.catBits.push(0);
    for (let c = 0; c < inLeft.length; c++) {
      if (inLeft[c]) this.catBits[off + (c >>> 5)] = (this.catBits[off + (c >>> 5)] | (1 << (c & 31))) >>> 0;
    }
    this.kind[id] = SUBSET; this.feature[id] = feature; this.offset[id] = off; this.width[id] = words;
    this.left[id] = left; this.right[id] = right; this.missing[id] = missing; this.gain[id] = gain;
  }

  /** Make node `id` a multiway split: code c goes to `branchOf[c]` (-1: the missing child). */
  setMultiway(id: number, feature: number, branchOf: ArrayLike<number>, missing: number, gain: number): void {
    const off = this.branches.length;
    for (let c = 0; c < branchOf.length; c++) this.branches.push(branchOf[c]);
    this.kind[id] = MULTIWAY; this.feature[id] = feature; this.offset[id] = off; this.width[id] = branchOf.length;
    this.missing[id] = missing; this.gain[id] = gain;
  }

  /** Freeze into typed arrays. */
  finish(): FlatTree {
    return {
      nNodes: this.kind.length,
      nOutputs: this.nOutputs,
      kind: Uint8Array.from(this.kind),
      feature: Int32Array.from(this.feature),
      threshold: Float64Array.from(this.threshold),
      left: Int32Array.from(this.left),
      right: Int32Array.from(this.right),
      missing: Int32Array.from(this.missing),
      offset: Int32Array.from(this.offset),
      width: Int32Array.from(this.width),
      branches: Int32Array.from(this.branches),
      catBits: Uint32Array.from(this.catBits),
      value: Float64Array.from(this.value),
      cover: Float64Array.from(this.cover),
      count: Float64Array.from(this.count),
      gain: Float64Array.from(this.gain),
    };
  }
}
