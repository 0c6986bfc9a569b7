/**
 * Validation of `GrowSettings`, shared by the exact and histogram growers so both reject the same bad
 * settings with the same messages.
 */
import { errors } from '../errors.js';
import type { GrowSettings } from './grow-task.js';

/**
 * Throw a clear error naming the first invalid setting.
 * @example
 * checkGrowSettings({ ...defaultGrowSettings, leafRows: 0 }); // throws: Option leafRows = 0 is invalid ...
 */
export function checkGrowSettings(s: GrowSettings): void {
  const nonNeg = (name: string, v: number, int: boolean): void => {
    if (!(v >= 0) || (int && v !== Infinity && !Number.isInteger(v))) throw errors.badOption(name, v, int ? 'a non-negative integer' : 'a non-negative number');
  };
  nonNeg('depthLimit', s.depthLimit, true);
  nonNeg('leafWeight', s.leafWeight, false);
  nonNeg('minGain', s.minGain, false);
  nonNeg('featuresPerSplit', s.featuresPerSplit, true);
  if (!(s.leafRows >= 1) || !Number.isInteger(s.leafRows)) throw errors.badOption('leafRows', s.leafRows, 'an integer >= 1');
  if (!(s.leafBudget >= 2) || (s.leafBudget !== Infinity && !Number.isInteger(s.leafBudget))) {
    throw errors.badOption('leafBudget', s.leafBudget, 'an integer >= 2 or Infinity');
  }
  if (s.categorical !== 'multiway' && s.categorical !== 'subset') throw errors.badOption('categorical', s.categorical, "'multiway' or 'subset'");
}
