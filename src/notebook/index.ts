// --- notebook: executor, magics, display, progress (task F) ---
export { createCellExecutor, type CellError, type CellExecutor, type CellExecutorOptions, type CellResult } from './executor.js';
export type { DisplayMessage, MimeBundle, OutputHooks } from './display-types.js';
export { installSink, emitDisplay, hasRichSink } from './display-sink.js';
export { compileCell, type CompiledCell, type MagicDefinition } from './magic-compile.js';
export { builtinMagics } from './magics.js';
export { showValue, type ShowOptions } from './show.js';
// show (same function) is not listed: src/errors.ts's show would collide in src/index.ts; see the task F report.
export { startProgress, progressLine, type Progress, type ProgressOptions } from './progress.js';
export { watchFit, type FitData } from './fit-display.js';
export { showLineup, type LineupOptions, type LineupRow } from './lineup.js';
export { learnerTable, dataSettings, tableOptions, findSetting, type LearnerRule, type SettingRule, type MagicSettingKind } from './magic-learners.js';
export { fitPrunedTree, type PrunedTreeOptions } from './fit-pruned-tree.js';
export { fitStackWith, stackLearners, type StackMembers, type StackWithOptions } from './stack-members.js';
export { learnerLike } from './learner-like.js';
export { readHeldOut } from './held-out-data.js';
export { progressOptions, roundScores, treeScores } from './fit-progress.js';
export { bundleFor, kindOfValue, type RepresentOptions, type ValueKind } from './represent.js';
export { tableBundle, type TableDisplayOptions } from './table-bundle.js';
export { chartBundle, isChartSpec, VEGA_LITE_MIME } from './chart-bundle.js';
export { modelBundle, isModelValue } from './model-bundle.js';
export { glanceBundle } from './glance-bundle.js';
export type { ExtractTable } from './extract-table.js';
// --- end task F ---
// --- reruns: extracts, decisions, run notes (task H) ---
export { declareExtract, resolveExtractSource, isQuerySource } from './extracts.js';
export { recordDecision, type DecisionInput } from './decisions.js';
export { parseCheck, evaluateCheck, normalizeCheck } from './decision-checks.js';
export { decisionBundle, decisionHtml, decisionText, DECISION_MIME } from './decision-card.js';
export type { CheckResult, CheckSpec, CustomCheck, DecisionRecord, EvidenceItem, MetricCheck, RankCheck } from './decision-types.js';
export { noteMetric, noteTable, notePredictions, noteShown, noteAffectsPeople } from './record-notes.js';
export { currentRunState, resetRunState, setExtractOverrides, type BoundExtract, type NotedMetric, type RunState } from './record-state.js';
export { profileColumn, shareAtOrBelow, quantileOf, type ColumnProfile, type NumericProfile, type CategoricalProfile } from './record-profile.js';
// --- reruns: headless runs, run records, comparison, report (task H) ---
export { runNotebook, type RunOptions, type RunOutcome } from './runner.js';
export { readRunRecord, validateRunRecord, locateRunRecord, RUN_FORMAT, RUN_VERSION, type RunRecord, type CellTiming, type RunFailure, type ModelNote } from './record-file.js';
export { compareRuns, runExitCode, type RunComparison, type ColumnDriftRow, type ExtractComparison, type MetricDelta, type PredictionShift, type CheckChange } from './compare-runs.js';
export { comparisonText } from './compare-text.js';
export { diffSchemas, describeSchemaChange, type SchemaChange } from './compare-schema.js';
export { psiFromShares, driftBand, numericDrift, categoricalDrift, columnDrift, quantileEdges, PSI_FLOOR, type DriftBand, type DriftBin, type DriftResult } from './drift-psi.js';
export { renderReport, type ReportInput } from './report-html.js';
export { renderMarkdown } from './report-markdown.js';
export { escapeHtml } from './report-escape.js';
export { writeAtomic, writeJsonAtomic } from './atomic-write.js';
