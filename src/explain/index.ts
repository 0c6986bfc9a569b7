/** The explain layer: permutation importance, partial dependence and ICE, TreeSHAP contributions, scoring, ONNX export. */
// --- the additive form every explanation and the ONNX export share ---
export { additiveModelOf } from './additive-model.js';
export type { AdditiveMember, AdditiveModel, OutputLink } from './additive-model.js';
export { predictModel, rawOutputsOf } from './predict-model.js';
// --- permutation importance ---
export { importanceByPermutation } from './permutation-importance.js';
export type { PermutationOptions, PermutationRow, PermutationTable } from './permutation-importance.js';
export { studentQuantile } from './student-t.js';
export { quantileSorted } from './quantile.js';
// --- partial dependence and ICE ---
export { dependenceOn } from './dependence.js';
export type { DependenceCurves, DependenceOnOptions } from './dependence.js';
export { dependenceOnPair } from './dependence-pair.js';
export type { DependenceSurface, PairOptions } from './dependence-pair.js';
export { gridOf } from './grid-values.js';
export type { FeatureGrid } from './grid-values.js';
// --- TreeSHAP contributions ---
export { contributionsOf } from './contributions.js';
export type { ShapOptions, Contributions } from './contributions.js';
export { contributionRow } from './contribution-row.js';
export type { ContributionWalk } from './contribution-row.js';
export { addTreeShap, prepareShapTree } from './tree-shap.js';
export type { ShapTree } from './tree-shap.js';
// --- scoring outside the notebook ---
export { scoreTable } from './score-table.js';
export type { RangeIssue, ScoredTable } from './score-table.js';
export { trainingRangesOf, withTrainingRanges } from './training-ranges.js';
export { scoreColumns, toCsvText, toJsonText } from './score-records.js';
export type { ScoreColumns } from './score-records.js';
// --- ONNX export ---
export { modelToOnnx } from './onnx-export.js';
export type { OnnxSummary } from './onnx-export.js';
