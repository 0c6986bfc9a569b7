/**
 * The contract between tree growers and the learners that call them. Two growers satisfy it:
 * the exact grower (`src/learn/tree/`, sorting, textbook criteria, multiway categorical splits; the test
 * oracle) and the histogram grower (`src/learn/hist/`, binned features, the fast default for ensembles).
 * Single trees, bagging, forests, AdaBoost and boosting all build a `GrowTask` and call `growTree`.
 */
import type { Frame } from '../table/frame.js';
import type { Rng } from '../util/rng.js';
import type { FlatTree } from './flat-tree.js';

export type ClassCriterion = 'entropy' | 'gainRatio' | 'gini';

/** What the tree is fitted to. */
export type Response =
  /** Class codes 0..nClasses-1 (-1 never appears: rows with a missing target are dropped before). */
  | { readonly kind: 'class'; readonly codes: Int32Array; readonly nClasses: number; readonly criterion: ClassCriterion }
  /**
   * Numbers, split by weighted variance reduction. Leaves take the weighted mean, or the weighted median
   * (absolute error). Boosting passes pseudo-residuals here, or -g/h with weights h for a Newton step.
   */
  | { readonly kind: 'value'; readonly values: Float64Array; readonly leaf: 'mean' | 'median' };

export interface GrowSettings {
  /** Maximum depth (root = depth 0). __Default:__ Infinity. */
  readonly depthLimit: number;
  /** Minimum training rows in each leaf. __Default:__ 1. */
  readonly leafRows: number;
  /** Minimum training weight (sum of weights, or of hessians in boosting) in each leaf. __Default:__ 0. */
  readonly leafWeight: number;
  /** Minimum weighted impurity decrease for a split to be kept. __Default:__ 0 (any positive gain). */
  readonly minGain: number;
  /** Features drawn at random at each split (random forests); 0 means all. __Default:__ 0. */
  readonly featuresPerSplit: number;
  /** Categorical splits: one branch per category, or a binary category subset. __Default:__ 'multiway' (exact), 'subset' (histogram). */
  readonly categorical: 'multiway' | 'subset';
  /** Maximum number of leaves; growth is best-first when finite. __Default:__ Infinity. */
  readonly leafBudget: number;
}

export interface GrowTask {
  /** Features; tree `feature` indices refer to `frame.columns`. */
  readonly frame: Frame;
  /** Per-row weights, length `frame.nRows`; a 0 weight leaves the row out (bootstrap counts are weights). */
  readonly weights: Float64Array;
  readonly response: Response;
  readonly settings: GrowSettings;
  /** Source of every random choice the grower makes (feature sampling). */
  readonly rng: Rng;
}

export interface GrowResult {
  readonly tree: FlatTree;
  /** Leaf reached by each training row with positive weight, -1 for rows left out. */
  readonly leafOfRow: Int32Array;
}

export const defaultGrowSettings: GrowSettings = {
  depthLimit: Infinity,
  leafRows: 1,
  leafWeight: 0,
  minGain: 0,
  featuresPerSplit: 0,
  categorical: 'multiway',
  leafBudget: Infinity,
};
