/**
 * Two-feature partial dependence (Friedman 2001, "Greedy function approximation", §8.2): the average
 * prediction with two features set to every pair of grid values.
 */
import { errors } from '../errors.js';
import type { ModelHeader } from '../learn/model.js';
import type { Frame } from '../table/frame.js';
import { featureIndex } from './dependence.js';
import { followedOutput } from './dependence-output.js';
import { constantColumn, withColumn } from './frame-edit.js';
import { gridOf } from './grid-values.js';

/** Partial dependence on a pair, in the shape `chartDependenceGrid` draws. */
export interface DependenceSurface {
  readonly x: { readonly name: string };
  readonly y: { readonly name: string };
  readonly output: string;
  /** One cell per pair of grid values (x varies fastest). */
  readonly cells: readonly { readonly x: number | string; readonly y: number | string; readonly average: number }[];
}

/** Options for `dependenceOnPair`. */
export interface PairOptions {
  /** Grid points per numeric feature. __Default:__ 10. */
  readonly gridSize?: number;
  /** Class whose probability is followed. __Default:__ the second of two classes, else the first. */
  readonly output?: string;
}

/**
 * Average prediction over the rows of `frame` with features `xName` and `yName` set to each grid pair.
 * @param options `gridSize` (10), `output`.
 * @example
 * chartDependenceGrid(dependenceOnPair(model, frame, 'storage_hours', 'variety'));
 */
export function dependenceOnPair(model: ModelHeader, frame: Frame, xName: string, yName: string, options: PairOptions = {}): DependenceSurface {
  if (xName === yName) throw errors.badOption('features', [xName, yName], 'two different features');
  const jx = featureIndex(model, frame, xName), jy = featureIndex(model, frame, yName);
  if (frame.nRows === 0) throw errors.emptyData('compute partial dependence');
  const size = options.gridSize ?? 10;
  const gx = gridOf(frame.columns[jx], size), gy = gridOf(frame.columns[jy], size);
  const out = followedOutput(model, options.output);
  const cells: { x: number | string; y: number | string; average: number }[] = [];
  gy.set.forEach((vy, b) => {
    const fy = withColumn(frame, jy, constantColumn(frame.columns[jy], frame.nRows, vy));
    gx.set.forEach((vx, a) => {
      const pred = out.of(withColumn(fy, jx, constantColumn(frame.columns[jx], frame.nRows, vx)));
      let sum = 0;
      for (let i = 0; i < pred.length; i++) sum += pred[i];
      cells.push({ x: gx.shown[a], y: gy.shown[b], average: sum / pred.length });
    });
  });
  return { x: { name: xName }, y: { name: yName }, output: out.name, cells };
}
