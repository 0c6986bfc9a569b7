/**
 * A mergeable quantile sketch for columns too large to sort, or read in chunks.
 *
 * Algorithm: the KLL sketch of Karnin, Lang & Liberty (2016), "Optimal quantile approximation in
 * streams", FOCS 2016, Section 3: a stack of compactors; compactor h holds items of weight 2^h and has
 * capacity about k·(2/3)^(H-1-h) (H = number of compactors, at least 2 items). When the sketch is full,
 * the lowest full compactor is sorted and every other item (a random start, 0 or 1) moves up one level
 * with double weight. Merging two sketches concatenates compactors level by level and compacts again
 * (Section 4 of the paper). Rank error is O(1/k) of the count with high probability.
 *
 * The coin flips come from the seeded generator in util/rng.ts, so a sketch fed the same values in the
 * same order always gives the same answers.
 */
import { errors } from '../errors.js';
import { createRng, type Rng } from '../util/rng.js';

const SHRINK = 2 / 3;

/** Sorted items with their weights (how many inserted values each stands for). */
export interface SketchItems {
  readonly values: Float64Array;
  readonly weights: Float64Array;
}

export class QuantileSketch {
  /** Accuracy parameter (items in the top compactor). */
  readonly k: number;
  private levels: Float64Array[] = [new Float64Array(8)];
  private lengths: number[] = [0];
  private size = 0;
  private limit = 0;
  private total = 0;
  private readonly rng: Rng;

  /**
   * @param k accuracy: larger keeps more items (about 3k) and gives smaller rank error. __Default:__ 800.
   * @param seed seed of the coin flips. __Default:__ 1.
   * @example
   * const s = new QuantileSketch();
   * for (let i = 0; i < 1e6; i++) s.update(i);
   * s.quantile(0.5); // ≈ 500000
   */
  constructor(k = 800, seed = 1) {
    if (!(Number.isInteger(k) && k >= 8)) throw errors.badOption('sketchK', k, 'an integer >= 8');
    this.k = k;
    this.rng = createRng(seed);
    this.limit = this.capacityTotal();
  }

  /** Number of values inserted (NaN is skipped). */
  get count(): number {
    return this.total;
  }

  /** Insert one value; NaN is ignored. */
  update(x: number): void {
    if (x !== x) return;
    this.push(0, x);
    this.total++;
    if (++this.size >= this.limit) this.compress();
  }

  /** Insert every non-NaN value of `values`. */
  updateAll(values: ArrayLike<number>): void {
    for (let i = 0; i < values.length; i++) this.update(values[i]);
  }

  /** Fold `other` into this sketch (other is left unchanged). */
  merge(other: QuantileSketch): void {
    for (let h = 0; h < other.levels.length; h++) {
      const src = other.levels[h], n = other.lengths[h];
      while (this.levels.length <= h) this.addLevel();
      for (let i = 0; i < n; i++) this.push(h, src[i]);
      this.size += n;
    }
    this.total += other.total;
    this.limit = this.capacityTotal();
    while (this.size >= this.limit) this.compress();
  }

  /** The retained items, sorted by value, each with its weight. */
  items(): SketchItems {
    const n = this.size;
    const order = new Float64Array(n);
    const pairs: [number, number][] = new Array(n);
    let j = 0;
    for (let h = 0; h < this.levels.length; h++) {
      const w = 2 ** h, lv = this.levels[h];
      for (let i = 0; i < this.lengths[h]; i++) pairs[j++] = [lv[i], w];
    }
    pairs.sort((a, b) => a[0] - b[0]);
    const weights = new Float64Array(n);
    for (let i = 0; i < n; i++) { order[i] = pairs[i][0]; weights[i] = pairs[i][1]; }
    return { values: order, weights };
  }

  /** Approximate q-quantile (0 <= q <= 1): the smallest retained value whose cumulative weight reaches q·count. */
  quantile(q: number): number {
    if (this.total === 0) return NaN;
    const { values, weights } = this.items();
    const goal = q * this.total;
    let acc = 0;
    for (let i = 0; i < values.length; i++) {
      acc += weights[i];
      if (acc >= goal) return values[i];
    }
    return values[values.length - 1];
  }

  /** Approximate number of inserted values <= x. */
  rank(x: number): number {
    let r = 0;
    for (let h = 0; h < this.levels.length; h++) {
      const lv = this.levels[h], w = 2 ** h;
      for (let i = 0; i < this.lengths[h]; i++) if (lv[i] <= x) r += w;
    }
    return r;
  }

  private capacity(h: number): number {
    const depth = this.levels.length - 1 - h;
    return Math.max(2, Math.floor(this.k * SHRINK ** depth));
  }

  private capacityTotal(): number {
    let s = 0;
    for (let h = 0; h < this.levels.length; h++) s += this.capacity(h);
    return s;
  }

  private addLevel(): void {
    this.levels.push(new Float64Array(8));
    this.lengths.push(0);
  }

  private push(h: number, x: number): void {
    let lv = this.levels[h];
    const n = this.lengths[h];
    if (n === lv.length) {
      const grown = new Float64Array(lv.length * 2);
      grown.set(lv);
      this.levels[h] = lv = grown;
    }
    lv[n] = x;
    this.lengths[h] = n + 1;
  }

  /** Compact the lowest full compactor (adding a level on top when needed). */
  private compress(): void {
    for (let h = 0; h < this.levels.length; h++) {
      const n = this.lengths[h];
      if (n < this.capacity(h)) continue;
      if (h + 1 === this.levels.length) this.addLevel();
      const lv = this.levels[h].subarray(0, n).sort();
      const pairs = n >> 1;
      const start = this.rng.nextU32() & 1;
      for (let i = 0; i < pairs; i++) this.push(h + 1, lv[2 * i + start]);
      // an odd item (the largest) stays behind
      if (n & 1) lv[0] = lv[n - 1];
      this.lengths[h] = n & 1;
      this.size -= pairs;
      this.limit = this.capacityTotal();
      return;
    }
  }
}
