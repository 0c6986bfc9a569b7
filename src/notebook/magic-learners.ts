/**
 * The one table mapping the fit magic's learner names and short setting names to coppice's public API:
 * the function each learner calls and the option each setting becomes. Adjust names here only.
 */

/** How a setting's text becomes a TypeScript value. */
export type MagicSettingKind =
  | 'int'      // a whole number (or Infinity)
  | 'number'   // any finite number
  | 'word'     // bare text, quoted as a string
  | 'words'    // comma-separated texts, an array of strings
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
}

const tree = {
  criterion: { option: 'criterion', value: 'word' },
  depth: { option: 'depthLimit', value: 'int' },
  'leaf-rows': { option: 'leafRows', value: 'int' },
  'leaf-weight': { option: 'leafWeight', value: 'number' },
  'min-gain': { option: 'minGain', value: 'number' },
  categorical: { option: 'categorical', value: 'word' },
  leaves: { option: 'leafBudget', value: 'int' },
} as const satisfies Record<string, SettingRule>;

const seed = { seed: { option: 'seed', value: 'int' } } as const satisfies Record<string, SettingRule>;

/** Settings every learner takes: the data and how to read it (handled by `watchFit`). */
export const dataSettings: Readonly<Record<string, SettingRule>> = {
  data: { option: 'data', value: 'expr' },
  target: { option: 'target', value: 'word' },
  features: { option: 'features', value: 'words' },
  exclude: { option: 'exclude', value: 'words' },
  weight: { option: 'weight', value: 'word' },
  'missing-target': { option: 'missingTarget', value: 'word' },
};

/** Learner name → function and settings. */
export const learnerTable: Readonly<Record<string, LearnerRule>> = {
  tree: {
    fn: 'fitTree',
    settings: { ...tree, ...seed, 'leaf-value': { option: 'leafValue', value: 'word' }, 'features-per-split': { option: 'featuresPerSplit', value: 'int' } },
  },
  forest: {
    fn: 'fitForest',
    settings: { ...tree, ...seed, trees: { option: 'size', value: 'int' }, 'features-per-split': { option: 'featuresPerSplit', value: 'int' }, combine: { option: 'combine', value: 'word' } },
  },
  bagging: {
    fn: 'fitBagging',
    settings: { ...tree, ...seed, trees: { option: 'size', value: 'int' }, combine: { option: 'combine', value: 'word' } },
  },
  adaboost: {
    fn: 'fitAdaBoost',
    settings: { criterion: tree.criterion, depth: tree.depth, ...seed, rounds: { option: 'rounds', value: 'int' }, sampling: { option: 'sampling', value: 'word' }, watch: { option: 'watch', value: 'expr' } },
  },
  boosting: {
    fn: 'fitBoosting',
    settings: {
      ...tree, ...seed,
      rounds: { option: 'rounds', value: 'int' },
      rate: { option: 'learningRate', value: 'number' },
      loss: { option: 'loss', value: 'word' },
      'row-share': { option: 'rowShare', value: 'number' },
      watch: { option: 'watch', value: 'expr' },
      patience: { option: 'patience', value: 'int' },
    },
  },
  stacking: {
    fn: 'fitStack',
    settings: { ...seed, members: { option: 'members', value: 'expr' }, folds: { option: 'folds', value: 'int' } },
  },
};
