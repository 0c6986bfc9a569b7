/**
 * How many threads a bagged-tree fit uses when the caller does not say: one for small fits (starting a
 * worker thread and handing it the data costs more than it saves), else two or the number of cores if
 * fewer. Worker threads never change a model: each member depends only on (seed, index).
 */
import { availableParallelism } from 'node:os';
import { wholeNumber } from './options.js';

/** Rows × trees below which a fit stays in the calling thread (common practice: a few seconds of work). */
export const parallelThreshold = 2_000_000;

/**
 * The `workers` option of a fit of `size` trees on `n` rows, checked, or its default.
 * @example
 * treeWorkers(undefined, 100_000, 500); // 2 on a machine with two or more cores
 * treeWorkers(undefined, 1_000, 50);    // 1
 */
export function treeWorkers(given: unknown, n: number, size: number): number {
  if (given !== undefined) return wholeNumber('workers', given, 1);
  return n * size < parallelThreshold ? 1 : Math.max(1, Math.min(2, availableParallelism()));
}
