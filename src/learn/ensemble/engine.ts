/**
 * The tree engine ensembles use. Every ensemble grows its trees through `growEnsembleTree`, so moving
 * ensembles to the histogram engine is the one-line change of `defaultEnsembleEngine`.
 */
import { growTree, type GrowEngine } from '../grow.js';
import type { GrowResult, GrowTask } from '../grow-task.js';

/** Engine used when a fit does not name one (the histogram engine: binned features, the fast path). */
export const defaultEnsembleEngine: GrowEngine = 'histogram';

/**
 * Grow one ensemble member.
 * @example
 * const { tree, leafOfRow } = growEnsembleTree(task, 'exact');
 */
export function growEnsembleTree(task: GrowTask, engine: GrowEngine = defaultEnsembleEngine): GrowResult {
  return growTree(task, engine);
}
