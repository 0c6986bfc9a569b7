/**
 * One entry point for growing a tree, whatever the engine: single trees, bagging, forests, AdaBoost and
 * boosting all call `growTree`.
 */
import { errors } from '../errors.js';
import type { GrowResult, GrowTask } from './grow-task.js';
import { growExact } from './tree/grow-exact.js';
import { growHistogram } from './hist/grow-histogram.js';

/** Split-finding engines: exact (sorting; the reference) or histogram (binned; fast). */
export type GrowEngine = 'exact' | 'histogram';

/**
 * Grow one tree for `task` with the chosen engine.
 *
 * @param engine `'exact'` sorts every feature and tries every threshold; `'histogram'` works on binned
 *   features. __Default:__ `'exact'`.
 * @example
 * const { tree } = growTree({ frame, weights, response, settings: defaultGrowSettings, rng: createRng(0) });
 */
export function growTree(task: GrowTask, engine: GrowEngine = 'exact'): GrowResult {
  switch (engine) {
    case 'exact':
      return growExact(task);
    case 'histogram':
      return growHistogram(task);
    default:
      throw errors.badOption('engine', engine, "'exact' or 'histogram'");
  }
}
