/**
 * The one table mapping the fit magic's learner names and short setting names to coppice's public API:
 * the function each learner calls and the option each setting becomes. Adjust names here only.
 *
 * Every option of each learner (`TreeOptions`, `ForestOptions`, `BaggingOptions`, `AdaBoostOptions`,
 * `BoostingOptions`, `StackOptions`) has a setting; the option's own API name (e.g. `depthLimit`) is
 * accepted as well as the short setting name (`depth`).
 */

/** How a setting's text becomes a TypeScript value. */
export type MagicSettingKind =
  | 'int'      // a whole number (or Infinity)
  | 'number'   // any finite number
  | 'word'     // bare text, quoted as a string
  | 'words'    // comma-separated texts, an array of strings
  | 'names'    // comma-separated variable names, an object { a: a, b: b }; anything else is an expression
  | 'expr'     // a TypeScript expression, copied as written
  | 'bool';    // true / false / yes / no

export interface SettingRule {
  /** Option name in the learner's API. */
  readonly option: string;
  readonly value: MagicSettingKind;
}

export interface LearnerRule {
  /** The exported function called as `fn(dataset, options)`. */
  readonly fn: string;
  readonly settings: Readonly<Record<string, SettingRule>>;
  /** When any of these options is given, call this variant's `fn` instead (e.g. a tree that is pruned). */
  readonly variant?: { readonly when: readonly string[]; readonly fn: string };
  /**
   * The learner's progress callback option (see src/learn/ensemble/progress.ts), the unit it counts and
   * whether its training score is a loss or an error rate; `watchFit` feeds its progress display from it.
   */
  readonly progress?: { readonly option: 'onRound' | 'onTree'; readonly unit: string; readonly score: 'loss' | 'error' };
}

/** Settings of every tree: a single tree and the members of ensembles (`MemberTreeOptions`). */
const member = {
  criterion: { option: 'criterion', value: 'word' },
  depth: { option: 'depthLimit', value: 'int' },
  'leaf-rows': { option: 'leafRows', value: 'int' },
  'leaf-weight': { option: 'leafWeight', value: 'number' },
  'min-gain': { option: 'minGain', value: 'number' },
  categorical: { option: 'categorical', value: 'word' },
  leaves: { option: 'leafBudget', value: 'int' },
  engine: { option: 'engine', value: 'word' },
} as const satisfies Record<string, SettingRule>;

const seed = { seed: { option: 'seed', value: 'int' } } as const satisfies Record<string, SettingRule>;
const featuresPerSplit = { 'features-per-split': { option: 'featuresPerSplit', value: 'int' } } as const satisfies Record<string, SettingRule>;
const classWeights = { 'class-weights': { option: 'classWeights', value: 'expr' } } as const satisfies Record<string, SettingRule>;
const watch = { watch: { option: 'watch', value: 'expr' } } as const satisfies Record<string, SettingRule>;
const bagged = {
  trees: { option: 'size', value: 'int' },
  combine: { option: 'combine', value: 'word' },
  workers: { option: 'workers', value: 'int' },
} as const satisfies Record<string, SettingRule>;

/** Pruning a single tree after growth (see `fitPrunedTree`). */
const prune = {
  prune: { option: 'prune', value: 'word' },
  'prune-on': { option: 'pruneOn', value: 'expr' },
  'prune-folds': { option: 'pruneFolds', value: 'int' },
  'prune-rule': { option: 'pruneRule', value: 'word' },
} as const satisfies Record<string, SettingRule>;

/** Settings every learner takes: the data and how to read it (handled by `watchFit`). */
export const dataSettings: Readonly<Record<string, SettingRule>> = {
  data: { option: 'data', value: 'expr' },
  target: { option: 'target', value: 'word' },
  features: { option: 'features', value: 'words' },
  exclude: { option: 'exclude', value: 'words' },
  weight: { option: 'weight', value: 'word' },
  'missing-target': { option: 'missingTarget', value: 'word' },
};

/** Options whose value may be a table (rows, arquero table, Frame): `watchFit` reads them like the data. */
export const tableOptions: readonly string[] = ['watch', 'pruneOn'];

/** Learner name → function and settings. */
export const learnerTable: Readonly<Record<string, LearnerRule>> = {
  tree: {
    fn: 'fitTree',
    settings: { ...member, ...seed, ...featuresPerSplit, 'leaf-value': { option: 'leafValue', value: 'word' }, ...prune },
    variant: { when: Object.values(prune).map((r) => r.option), fn: 'fitPrunedTree' },
  },
  forest: {
    fn: 'fitForest',
    settings: { ...member, ...seed, ...bagged, ...featuresPerSplit, ...classWeights },
    progress: { option: 'onTree', unit: 'tree', score: 'error' },
  },
  bagging: {
    fn: 'fitBagging',
    settings: { ...member, ...seed, ...bagged, ...classWeights },
    progress: { option: 'onTree', unit: 'tree', score: 'error' },
  },
  adaboost: {
    fn: 'fitAdaBoost',
    settings: { ...member, ...seed, ...watch, ...classWeights, rounds: { option: 'rounds', value: 'int' }, sampling: { option: 'sampling', value: 'word' } },
    progress: { option: 'onRound', unit: 'round', score: 'error' },
  },
  boosting: {
    fn: 'fitBoosting',
    settings: {
      ...member, ...seed, ...watch, ...classWeights,
      loss: { option: 'loss', value: 'word' },
      rounds: { option: 'rounds', value: 'int' },
      rate: { option: 'learningRate', value: 'number' },
      'step-decay': { option: 'stepDecay', value: 'number' },
      'row-fraction': { option: 'rowFraction', value: 'number' },
      patience: { option: 'patience', value: 'int' },
      'huber-quantile': { option: 'huberQuantile', value: 'number' },
      'quantile-level': { option: 'quantileLevel', value: 'number' },
      'newton-trees': { option: 'newtonTrees', value: 'bool' },
    },
    progress: { option: 'onRound', unit: 'round', score: 'loss' },
  },
  stacking: {
    fn: 'fitStackWith',
    settings: {
      ...seed,
      members: { option: 'members', value: 'names' },
      folds: { option: 'folds', value: 'int' },
      'pass-through': { option: 'passThrough', value: 'words' },
      ridge: { option: 'ridge', value: 'number' },
    },
  },
};

/**
 * The rule for `key` among `rules`: by setting name, or by the option's own API name.
 * @example
 * findSetting(learnerTable.tree.settings, 'depthLimit'); // { option: 'depthLimit', value: 'int' }
 */
export function findSetting(rules: Readonly<Record<string, SettingRule>>, key: string): SettingRule | undefined {
  return Object.hasOwn(rules, key) ? rules[key] : Object.values(rules).find((r) => r.option === key);
}
