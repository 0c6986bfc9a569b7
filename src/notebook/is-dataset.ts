/**
 * Telling a ready `Dataset` apart from a table that still has to be read (rows, arquero table, Frame).
 */
import type { Dataset } from '../table/frame.js';

/**
 * True when `x` has the shape of a coppice `Dataset` (features, target and weights).
 * @example
 * isDataset(toDataset(rows, { target: 'y' })); // true
 * isDataset(rows);                            // false
 */
export function isDataset(x: unknown): x is Dataset {
  const d = x as Partial<Dataset> | null;
  return d != null && typeof d === 'object' && d.features != null && d.target != null && 'weights' in d;
}
