/**
 * Out-of-bag predictions and error (Breiman, L. (1996) "Out-of-bag estimation", technical report;
 * Breiman 2001, "Random forests", §3.1): each row is predicted only by the trees whose bootstrap sample
 * left it out. The error after t trees is taken over the rows with at least one such tree so far:
 * weighted misclassification rate for classes, weighted mean squared error for numbers.
 */
import type { FlatTree, RowSource } from '../flat-tree.js';
import { leafOf } from '../flat-tree.js';
import { argmaxAt } from './tree-sum.js';

/** One point of an out-of-bag curve: error of the first `size` members. */
export interface OobPoint {
  readonly size: number;
  /** Misclassification rate (classes) or mean squared error (numbers); NaN while no row is out-of-bag. */
  readonly error: number;
}

/** Accumulates out-of-bag predictions member by member. */
export class OobTally {
  /** Per row: summed class scores (n × K) or summed values (n). */
  readonly sums: Float64Array;
  /** Per row: members for which the row was out-of-bag. */
  readonly hits: Int32Array;
  readonly curve: OobPoint[] = [];

  constructor(
    private readonly n: number,
    /** Classes (0 for numbers). */
    private readonly K: number,
    /** Class codes or target values. */
    private readonly y: Int32Array | Float64Array,
    private readonly w: Float64Array,
    private readonly vote: boolean,
  ) {
    this.sums = new Float64Array(n * Math.max(1, K));
    this.hits = new Int32Array(n);
  }

  /** Add member `tree` (bootstrap `counts`) via its leaf values, and record the error so far. */
  addTree(tree: FlatTree, src: RowSource, counts: Float64Array): number {
    const K = this.K, v = tree.value;
    for (let i = 0; i < this.n; i++) {
      if (counts[i] > 0 || !(this.w[i] > 0)) continue;
      const leaf = leafOf(tree, src, i);
      if (K === 0) this.sums[i] += v[leaf];
      else if (this.vote) this.sums[i * K + argmaxAt(v, leaf * K, K)] += 1;
      else for (let k = 0; k < K; k++) this.sums[i * K + k] += v[leaf * K + k];
      this.hits[i]++;
    }
    return this.record();
  }

  /**
   * Add member `tree` given the leaf each out-of-bag row reaches (`oobLeaf[i]`, −1 for in-bag rows), and
   * record the error so far; the same sums as `addTree` when `oobLeaf` was routed from the same counts.
   */
  addLeaves(tree: FlatTree, oobLeaf: Int32Array): number {
    const K = this.K, v = tree.value;
    for (let i = 0; i < this.n; i++) {
      const leaf = oobLeaf[i];
      if (leaf < 0 || !(this.w[i] > 0)) continue;
      if (K === 0) this.sums[i] += v[leaf];
      else if (this.vote) this.sums[i * K + argmaxAt(v, leaf * K, K)] += 1;
      else for (let k = 0; k < K; k++) this.sums[i * K + k] += v[leaf * K + k];
      this.hits[i]++;
    }
    return this.record();
  }

  /** Add one member's out-of-bag predictions given directly (generic bagging): `pred[i]` is a class code or value. */
  addPredictions(pred: Float64Array, proba: Float64Array | null, counts: Float64Array): number {
    const K = this.K;
    for (let i = 0; i < this.n; i++) {
      if (counts[i] > 0 || !(this.w[i] > 0)) continue;
      if (K === 0) this.sums[i] += pred[i];
      else if (this.vote || !proba) this.sums[i * K + pred[i]] += 1;
      else for (let k = 0; k < K; k++) this.sums[i * K + k] += proba[i * K + k];
      this.hits[i]++;
    }
    return this.record();
  }

  private record(): number {
    const error = this.error();
    this.curve.push({ size: this.curve.length + 1, error });
    return error;
  }

  /** Current out-of-bag error (NaN when no row has been out-of-bag yet). */
  error(): number {
    let loss = 0, sw = 0;
    for (let i = 0; i < this.n; i++) {
      if (this.hits[i] === 0) continue;
      const wi = this.w[i];
      if (this.K === 0) loss += wi * (this.sums[i] / this.hits[i] - this.y[i]) ** 2;
      else if (argmaxAt(this.sums, i * this.K, this.K) !== this.y[i]) loss += wi;
      sw += wi;
    }
    return sw > 0 ? loss / sw : NaN;
  }
}
