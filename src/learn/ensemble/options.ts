/**
 * Option checking shared by the ensemble learners: unknown keys, counts, fractions, and the settings of
 * member trees (the `GrowSettings` of src/learn/grow-task.ts under the same names).
 */
import { errors } from '../../errors.js';
import { defaultGrowSettings, type ClassCriterion, type GrowSettings } from '../grow-task.js';
import type { GrowEngine } from '../grow.js';
import { defaultEnsembleEngine } from './engine.js';

/** Settings of each member tree (names as in `GrowSettings`). */
export interface MemberTreeOptions {
  /** Class split criterion. __Default:__ depends on the learner (see its options). */
  readonly criterion?: ClassCriterion;
  /** Maximum depth of each tree (root = 0). __Default:__ depends on the learner. */
  readonly depthLimit?: number;
  /** Minimum training rows per leaf. __Default:__ depends on the learner. */
  readonly leafRows?: number;
  /** Minimum training weight per leaf. __Default:__ 0. */
  readonly leafWeight?: number;
  /** Minimum weighted impurity decrease for a split. __Default:__ 0. */
  readonly minGain?: number;
  /** Categorical splits: 'multiway' or 'subset'. __Default:__ 'subset' (two-way splits suit ensembles; common practice). */
  readonly categorical?: 'multiway' | 'subset';
  /** Maximum leaves per tree (best-first growth when finite). __Default:__ Infinity. */
  readonly leafBudget?: number;
  /** Split-finding engine. __Default:__ `defaultEnsembleEngine`. */
  readonly engine?: GrowEngine;
}

export const memberTreeKeys = ['criterion', 'depthLimit', 'leafRows', 'leafWeight', 'minGain', 'categorical', 'leafBudget', 'engine'] as const;

/** Throw on any key of `options` not in `known`. */
export function checkKnown(options: object, known: readonly string[]): void {
  for (const key of Object.keys(options)) if (!known.includes(key)) throw errors.unknownOption(key, known);
}

/** An integer >= min (Infinity allowed when `inf`). */
export function wholeNumber(name: string, v: unknown, min: number, inf = false): number {
  if (typeof v !== 'number' || !(v >= min) || (v === Infinity ? !inf : !Number.isInteger(v))) {
    throw errors.badOption(name, v, `an integer >= ${min}${inf ? ' or Infinity' : ''}`);
  }
  return v;
}

/** A finite number in [lo, hi] (open at lo when `openLo`). */
export function numberIn(name: string, v: unknown, lo: number, hi: number, openLo = false): number {
  if (typeof v !== 'number' || !(openLo ? v > lo : v >= lo) || !(v <= hi) || !Number.isFinite(v)) {
    throw errors.badOption(name, v, `a number in ${openLo ? '(' : '['}${lo}, ${hi}]`);
  }
  return v;
}

/** One of `allowed`. */
export function oneOf<T extends string>(name: string, v: unknown, allowed: readonly T[]): T {
  if (typeof v !== 'string' || !(allowed as readonly string[]).includes(v)) {
    throw errors.badOption(name, v, allowed.map((a) => `'${a}'`).join(' or '));
  }
  return v as T;
}

/** Resolved member-tree settings. */
export interface MemberTree {
  readonly criterion: ClassCriterion;
  readonly engine: GrowEngine;
  readonly grow: GrowSettings;
}

/**
 * Validate member-tree options, filling gaps from `defaults`.
 * @example
 * resolveMemberTree({ depthLimit: 3 }, { criterion: 'gini', depthLimit: Infinity, leafRows: 1 });
 */
export function resolveMemberTree(
  o: MemberTreeOptions, defaults: { criterion: ClassCriterion; depthLimit: number; leafRows: number },
): MemberTree {
  const leafWeight = o.leafWeight ?? 0;
  if (typeof leafWeight !== 'number' || !(leafWeight >= 0) || !Number.isFinite(leafWeight)) throw errors.badOption('leafWeight', leafWeight, 'a finite number >= 0');
  const minGain = o.minGain ?? 0;
  if (typeof minGain !== 'number' || !(minGain >= 0) || !Number.isFinite(minGain)) throw errors.badOption('minGain', minGain, 'a finite number >= 0');
  return {
    criterion: oneOf('criterion', o.criterion ?? defaults.criterion, ['entropy', 'gainRatio', 'gini']),
    engine: oneOf('engine', o.engine ?? defaultEnsembleEngine, ['exact', 'histogram']),
    grow: {
      ...defaultGrowSettings,
      depthLimit: wholeNumber('depthLimit', o.depthLimit ?? defaults.depthLimit, 0, true),
      leafRows: wholeNumber('leafRows', o.leafRows ?? defaults.leafRows, 1),
      leafWeight,
      minGain,
      categorical: oneOf('categorical', o.categorical ?? 'subset', ['multiway', 'subset']),
      leafBudget: wholeNumber('leafBudget', o.leafBudget ?? Infinity, 2, true),
    },
  };
}

/** The member-tree part of a resolved settings record (for the model header). */
export function memberTreeRecord(m: MemberTree): Record<string, unknown> {
  const { depthLimit, leafRows, leafWeight, minGain, categorical, leafBudget } = m.grow;
  return { criterion: m.criterion, depthLimit, leafRows, leafWeight, minGain, categorical, leafBudget, engine: m.engine };
}
