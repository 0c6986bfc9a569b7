/**
 * Progress reports of long fits, for progress displays: `onRound` (boosting, AdaBoost) is called after
 * every round, `onTree` (bagging, forests) after every tree is added. The reports are plain objects
 * built for the call; nothing the callback does to them reaches the model, so a fit with a callback
 * gives the same model as one without. An error thrown by the callback stops the fit and propagates.
 */
import { errors } from '../../errors.js';

/** After round `round` of `total`. */
export interface RoundInfo {
  /** Rounds done so far (1-based). */
  readonly round: number;
  /** Rounds asked for. */
  readonly total: number;
  /**
   * Training loss after this round: the boosting loss's weighted mean (log loss, squared error, ...), or
   * for AdaBoost the weighted training error (0–1 loss).
   */
  readonly trainLoss: number;
  /** Same on the watched set; NaN without one. */
  readonly watchLoss: number;
  /** Round with the lowest watched loss so far (0 = before any round), or `round` without a watched set. */
  readonly bestRound: number;
  /** True for the last report of the fit (all rounds done, early stop, or an AdaBoost stop rule). */
  readonly last: boolean;
}

/** After `done` trees of `total`. */
export interface TreeInfo {
  /** Trees added so far. */
  readonly done: number;
  /** Trees asked for. */
  readonly total: number;
  /** Out-of-bag error of the first `done` trees (as in `oobCurve`); NaN while no row has been out of bag. */
  readonly oobError: number;
}

/** Callback of `onRound`. */
export type RoundCallback = (info: RoundInfo) => void;
/** Callback of `onTree`. */
export type TreeCallback = (info: TreeInfo) => void;

/**
 * The callback given as option `name`, or null when absent; anything else than a function is an error.
 * @example
 * const report = callbackOption<RoundCallback>('onRound', options.onRound);
 */
export function callbackOption<T>(name: string, f: unknown): T | null {
  if (f === undefined || f === null) return null;
  if (typeof f !== 'function') throw errors.badOption(name, typeof f === 'object' ? 'an object' : f, 'a function');
  return f as T;
}
