/**
 * Options of `fitTree`: names, defaults and validation.
 */
import { errors } from '../../errors.js';
import type { ClassCriterion, GrowSettings } from '../grow-task.js';
import type { GrowEngine } from '../grow.js';

export type TreeCriterion = ClassCriterion | 'variance';

export interface TreeOptions {
  /**
   * Split criterion: `'entropy'` (information gain), `'gainRatio'` (C4.5) or `'gini'` for classes;
   * `'variance'` (weighted variance reduction) for numbers. __Default:__ `'entropy'` for classes,
   * `'variance'` for numbers.
   */
  readonly criterion?: TreeCriterion;
  /** Regression leaves: weighted `'mean'` or weighted `'median'`. __Default:__ `'mean'`. */
  readonly leafValue?: 'mean' | 'median';
  /** Maximum depth (the root has depth 0). __Default:__ Infinity. */
  readonly depthLimit?: number;
  /** Minimum training rows in every leaf. __Default:__ 1. */
  readonly leafRows?: number;
  /** Minimum training weight in every leaf. __Default:__ 0. */
  readonly leafWeight?: number;
  /** Minimum weighted impurity decrease (node weight × gain) for a split to be kept. __Default:__ 0. */
  readonly minGain?: number;
  /** Categorical features: one branch per category (`'multiway'`) or two groups (`'subset'`). __Default:__ `'multiway'`. */
  readonly categorical?: 'multiway' | 'subset';
  /** Maximum number of leaves; when finite the tree grows best-first. __Default:__ Infinity. */
  readonly leafBudget?: number;
  /** Features drawn at random at each split; 0 means all. __Default:__ 0. */
  readonly featuresPerSplit?: number;
  /** Seed for the random feature draws. __Default:__ 0. */
  readonly seed?: number;
  /** Split-finding engine. __Default:__ `'exact'`. */
  readonly engine?: GrowEngine;
}

/** Every option filled in. */
export type TreeSettings = Required<TreeOptions>;

export const TREE_OPTION_NAMES = ['criterion', 'leafValue', 'depthLimit', 'leafRows', 'leafWeight', 'minGain', 'categorical',
  'leafBudget', 'featuresPerSplit', 'seed', 'engine'] as const;

function oneOf<T extends string>(name: string, v: unknown, allowed: readonly T[]): T {
  if (typeof v !== 'string' || !(allowed as readonly string[]).includes(v)) {
    throw errors.badOption(name, v, allowed.map((a) => `'${a}'`).join(' or '));
  }
  return v as T;
}

function count(name: string, v: unknown, min: number, allowInfinity: boolean): number {
  if (typeof v !== 'number' || !(v >= min) || (v === Infinity ? !allowInfinity : !Number.isInteger(v))) {
    throw errors.badOption(name, v, `an integer >= ${min}${allowInfinity ? ' or Infinity' : ''}`);
  }
  return v;
}

function amount(name: string, v: unknown): number {
  if (typeof v !== 'number' || !(v >= 0) || v === Infinity) throw errors.badOption(name, v, 'a finite number >= 0');
  return v;
}

/** Validate `options` for a target of kind `target` and fill in defaults. */
export function resolveTreeOptions(options: TreeOptions, target: 'class' | 'number'): TreeSettings {
  for (const key of Object.keys(options)) {
    if (!(TREE_OPTION_NAMES as readonly string[]).includes(key)) throw errors.unknownOption(key, TREE_OPTION_NAMES);
  }
  const o = options as Record<string, unknown>;
  const criterion = target === 'class'
    ? oneOf<TreeCriterion>('criterion', o.criterion ?? 'entropy', ['entropy', 'gainRatio', 'gini'])
    : oneOf<TreeCriterion>('criterion', o.criterion ?? 'variance', ['variance']);
  const seed = o.seed ?? 0;
  if (typeof seed !== 'number' || !Number.isInteger(seed)) throw errors.badOption('seed', seed, 'an integer');
  return {
    criterion,
    leafValue: oneOf('leafValue', o.leafValue ?? 'mean', ['mean', 'median']),
    depthLimit: count('depthLimit', o.depthLimit ?? Infinity, 0, true),
    leafRows: count('leafRows', o.leafRows ?? 1, 1, false),
    leafWeight: amount('leafWeight', o.leafWeight ?? 0),
    minGain: amount('minGain', o.minGain ?? 0),
    categorical: oneOf('categorical', o.categorical ?? 'multiway', ['multiway', 'subset']),
    leafBudget: count('leafBudget', o.leafBudget ?? Infinity, 2, true),
    featuresPerSplit: count('featuresPerSplit', o.featuresPerSplit ?? 0, 0, false),
    seed,
    engine: oneOf('engine', o.engine ?? 'exact', ['exact', 'histogram']),
  };
}

/** The grower settings part of the tree settings. */
export function growSettingsOf(s: TreeSettings): GrowSettings {
  return {
    depthLimit: s.depthLimit, leafRows: s.leafRows, leafWeight: s.leafWeight, minGain: s.minGain,
    featuresPerSplit: s.featuresPerSplit, categorical: s.categorical, leafBudget: s.leafBudget,
  };
}
