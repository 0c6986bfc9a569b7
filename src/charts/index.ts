/**
 * Charts: pure functions from results to vega-lite v5 specs (plain JSON), the house look, and
 * rendering to SVG and PNG in Node.
 */
export type { ChartOptions, ChartSpec } from './spec.js';
export { VEGA_LITE_SCHEMA } from './spec.js';
export { BAND_COLOURS, FONT, ROLE, SEQUENTIAL_RAMP, SERIES_COLOURS, houseConfig } from './theme.js';
export { chartEmpty } from './empty-chart.js';
export { renderSvg, renderSvgWithWarnings } from './render-svg.js';
export type { RenderOptions, RenderedSvg } from './render-svg.js';
export { renderPng } from './render-png.js';
export type { PngOptions } from './render-png.js';

export { chartLearningCurve } from './learning-curve.js';
export type { LearningCurveOptions, LearningCurveRow } from './learning-curve.js';
export { chartValidationCurve } from './validation-curve.js';
export type { ValidationCurveOptions, ValidationCurveRow } from './validation-curve.js';
export { chartPruningPath } from './pruning-path.js';
export type { PruningPathOptions, PruningPathRow } from './pruning-path.js';
export { chartPruningTable } from './pruning-table.js';
export type { PruningTableOptions, PruningTableRow } from './pruning-table.js';
export { chartResidualsByFitted } from './residuals-by-fitted.js';
export { chartResidualsByFeature } from './residuals-by-feature.js';
export type { ResidualFeatureInput } from './residuals-by-feature.js';
export { chartResidualHistogram } from './residual-histogram.js';
export type { ResidualOptions } from './residual-options.js';
export type { ResidualInput } from './residuals.js';
export { chartImportance } from './importance.js';
export type { ImportanceOptions, ImportanceRow } from './importance.js';
export { chartConfusion } from './confusion.js';
export type { ConfusionInput } from './confusion.js';
export { chartRoc } from './roc-curve.js';
export type { RocCurveInput } from './roc-curve.js';
export { chartPrecisionRecall } from './precision-recall.js';
export type { PrecisionRecallInput } from './precision-recall.js';
export { chartCalibration } from './calibration.js';
export type { CalibrationChartBin } from './calibration.js';
export { chartEnsembleSizeError } from './ensemble-size.js';
export type { EnsembleSizeOptions, EnsembleSizeRow } from './ensemble-size.js';
export { chartBiasVariance } from './bias-variance.js';
export type { BiasVarianceChartOptions, BiasVarianceChartRow } from './bias-variance.js';
export { chartDependence } from './dependence.js';
export type { DependenceInput, DependenceOptions } from './dependence.js';
export { chartDependenceGrid } from './dependence-grid.js';
export type { DependenceGridInput, DependenceGridOptions } from './dependence-grid.js';
export { chartContributions } from './contributions.js';
export type { ContributionInput, ContributionOptions } from './contributions.js';
export { chartContributionSummary } from './contribution-summary.js';
export type { ContributionSummaryInput, ContributionSummaryOptions } from './contribution-summary.js';
export { chartDrift } from './drift.js';
export type { DriftOptions, DriftRow } from './drift.js';
export { chartMetricDeltas } from './metric-deltas.js';
export type { MetricDeltaOptions, MetricDeltaRow } from './metric-deltas.js';
export { chartTree } from './tree-chart.js';
export type { TreeChartInput, TreeChartOptions } from './tree-chart.js';
export { layoutTidyTree } from './tree-layout.js';
export type { TreeLayout } from './tree-layout.js';
