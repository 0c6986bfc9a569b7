/**
 * Demo inputs for every chart, generated from a fixed seed. The scenario is our own: a fruit packhouse
 * grading apple crates (grade A / grade B / rejected) and predicting shelf life in days from storage
 * hours, bruise score, harvest week and variety. Values are invented for demos, not checks.
 */
import { LEAF, MULTIWAY, NUMERIC, SUBSET, type FlatTree } from '../../src/learn/flat-tree.js';
import { createRng, type Rng } from '../../src/util/rng.js';
import * as charts from '../../src/charts/index.js';
import { confusionTable } from '../../src/assess/metrics/confusion-table.js';
import { fitAdaBoost } from '../../src/learn/ensemble/adaboost.js';
import { fitBoosting } from '../../src/learn/ensemble/boosting.js';
import { fitForest } from '../../src/learn/ensemble/forest.js';
import { crateDataset } from './packhouse-data.js';
import type { ChartSpec } from '../../src/charts/index.js';

const VARIETIES = ['Elstar', 'Jonagold', 'Boskoop', 'Topaz', 'Santana'];
const GRADES = ['grade A', 'grade B', 'rejected'];

interface Crate { storage: number; bruise: number; week: number; variety: string; shelf: number; grade: number; score: number[] }

/** Seeded packhouse crates. */
export function packhouseCrates(n: number, seed = 2024): Crate[] {
  const rng = createRng(seed);
  return Array.from({ length: n }, () => {
    const storage = 4 + rng.next() * 92;
    const bruise = Math.max(0, Math.min(10, 2 + rng.normal() * 1.8 + storage / 40));
    const week = 34 + rng.int(10);
    const v = rng.int(VARIETIES.length);
    const shelf = 28 - 0.12 * storage - 1.1 * bruise + [2, 0, 3, -1, -2][v] + rng.normal() * 2.2;
    const logitB = -2 + 0.35 * bruise + 0.01 * storage, logitR = -4.5 + 0.6 * bruise + 0.02 * storage + (v === 4 ? 0.8 : 0);
    const e = [1, Math.exp(logitB), Math.exp(logitR)], s = e[0] + e[1] + e[2];
    const p = e.map((x) => x / s);
    const u = rng.next();
    const grade = u < p[0] ? 0 : u < p[0] + p[1] ? 1 : 2;
    const noisy = p.map((x) => Math.min(0.999, Math.max(0.001, x + rng.normal() * 0.05)));
    return { storage, bruise, week, variety: VARIETIES[v], shelf, grade, score: noisy };
  });
}

function rocPoints(scores: number[], positive: boolean[]): { falsePositiveRate: number; truePositiveRate: number }[] {
  const idx = scores.map((_, i) => i).sort((a, b) => scores[b] - scores[a]);
  const P = positive.filter(Boolean).length, N = positive.length - P;
  let tp = 0, fp = 0;
  const out = [{ falsePositiveRate: 0, truePositiveRate: 0 }];
  idx.forEach((i, k) => {
    if (positive[i]) tp++; else fp++;
    if (k === idx.length - 1 || scores[idx[k + 1]] !== scores[i]) out.push({ falsePositiveRate: fp / N, truePositiveRate: tp / P });
  });
  return out;
}

function prPoints(scores: number[], positive: boolean[]): { recall: number; precision: number }[] {
  const idx = scores.map((_, i) => i).sort((a, b) => scores[b] - scores[a]);
  const P = positive.filter(Boolean).length;
  let tp = 0;
  return idx.map((i, k) => { if (positive[i]) tp++; return { recall: tp / P, precision: tp / (k + 1) }; });
}

function flatTree(nodes: { kind: number; feature?: number; threshold?: number; left?: number; right?: number; missing?: number; bits?: number; branches?: number[]; value: number[]; count: number }[], nOutputs: number): FlatTree {
  const n = nodes.length;
  const catBits: number[] = [], branches: number[] = [];
  const offset = new Int32Array(n), width = new Int32Array(n);
  nodes.forEach((d, i) => {
    if (d.kind === SUBSET) { offset[i] = catBits.length; width[i] = 1; catBits.push(d.bits ?? 0); }
    if (d.kind === MULTIWAY) { offset[i] = branches.length; width[i] = d.branches!.length; branches.push(...d.branches!); }
  });
  return {
    nNodes: n, nOutputs,
    kind: Uint8Array.from(nodes.map((d) => d.kind)),
    feature: Int32Array.from(nodes.map((d) => d.feature ?? -1)),
    threshold: Float64Array.from(nodes.map((d) => d.threshold ?? NaN)),
    left: Int32Array.from(nodes.map((d) => d.left ?? -1)),
    right: Int32Array.from(nodes.map((d) => d.right ?? -1)),
    missing: Int32Array.from(nodes.map((d) => d.missing ?? d.left ?? -1)),
    offset, width, branches: Int32Array.from(branches), catBits: Uint32Array.from(catBits),
    value: Float64Array.from(nodes.flatMap((d) => d.value)),
    cover: Float64Array.from(nodes.map((d) => d.count)),
    count: Float64Array.from(nodes.map((d) => d.count)),
    gain: new Float64Array(n),
  };
}

export const FEATURES = [
  { name: 'storage_hours' }, { name: 'bruise_score' }, { name: 'harvest_week' },
  { name: 'variety', categories: VARIETIES },
];

/** A hand-built classification tree with numeric, subset and multiway splits. */
export function gradeTree(): FlatTree {
  return flatTree([
    { kind: NUMERIC, feature: 1, threshold: 4.25, left: 1, right: 2, missing: 1, value: [0.55, 0.3, 0.15], count: 1200 },
    { kind: NUMERIC, feature: 0, threshold: 48.5, left: 3, right: 4, missing: 3, value: [0.72, 0.22, 0.06], count: 760 },
    { kind: SUBSET, feature: 3, left: 5, right: 6, missing: 6, bits: 0b10001, value: [0.26, 0.44, 0.3], count: 440 },
    { kind: LEAF, value: [0.84, 0.13, 0.03], count: 410 },
    { kind: MULTIWAY, feature: 3, branches: [7, 8, 7, 9, 9], missing: 7, value: [0.58, 0.32, 0.1], count: 350 },
    { kind: LEAF, value: [0.12, 0.38, 0.5], count: 170 },
    { kind: NUMERIC, feature: 2, threshold: 38.5, left: 10, right: 11, missing: 10, value: [0.35, 0.48, 0.17], count: 270 },
    { kind: LEAF, value: [0.66, 0.27, 0.07], count: 160 },
    { kind: LEAF, value: [0.52, 0.36, 0.12], count: 80 },
    { kind: LEAF, value: [0.48, 0.35, 0.17], count: 110 },
    { kind: NUMERIC, feature: 0, threshold: 70.25, left: 12, right: 13, missing: 12, value: [0.45, 0.43, 0.12], count: 150 },
    { kind: LEAF, value: [0.22, 0.55, 0.23], count: 120 },
    { kind: LEAF, value: [0.5, 0.42, 0.08], count: 90 },
    { kind: LEAF, value: [0.3, 0.45, 0.25], count: 60 },
  ], 3);
}

/** A regression tree (shelf life, days) of depth 5, complete binary, from a seeded generator. */
export function shelfTree(rng: Rng = createRng(5)): FlatTree {
  const nodes: Parameters<typeof flatTree>[0] = [];
  const build = (depth: number, rows: number, mean: number): number => {
    const id = nodes.length;
    nodes.push({ kind: LEAF, value: [mean], count: rows });
    if (depth < 5 && rows > 20) {
      const f = rng.int(3);
      const t = [20 + rng.next() * 60, 1 + rng.next() * 7, 35 + rng.int(8)][f];
      const share = 0.3 + rng.next() * 0.4;
      const l = build(depth + 1, Math.round(rows * share), mean + 2 + rng.normal());
      const r = build(depth + 1, rows - Math.round(rows * share), mean - 2 + rng.normal());
      nodes[id] = { kind: NUMERIC, feature: f, threshold: Number(t.toFixed(2)), left: l, right: r, missing: l, value: [mean], count: rows };
    }
    return id;
  };
  build(0, 2400, 16);
  return flatTree(nodes, 1);
}

/** Every chart with demo inputs: name → spec. */
export function gallery(): Record<string, ChartSpec> {
  const rng = createRng(99);
  const crates = packhouseCrates(3000);
  const out: Record<string, ChartSpec> = {};
  const lc: charts.LearningCurveRow[] = [];
  for (let r = 1; r <= 300; r++) {
    lc.push({ round: r, set: 'training', loss: 0.42 * Math.exp(-r / 55) + 0.31 - 0.0002 * r + rng.normal() * 0.002 });
    lc.push({ round: r, set: 'watched', loss: 0.4 * Math.exp(-r / 50) + 0.39 + 0.00012 * r + rng.normal() * 0.003 });
  }
  out['learning-curve'] = charts.chartLearningCurve(lc, { lossName: 'multiclass log loss (nats)', bestRound: 168 });
  out['learning-curve-late-best'] = charts.chartLearningCurve(lc, { lossName: 'multiclass log loss (nats)', bestRound: 262 });
  const vc: charts.ValidationCurveRow[] = [];
  for (let d = 1; d <= 12; d++) for (let f = 1; f <= 5; f++) vc.push({ value: d, fold: f, score: 0.62 + 0.14 * (1 - Math.exp(-d / 2.2)) - 0.006 * Math.max(0, d - 5) + rng.normal() * 0.012 });
  out['validation-curve'] = charts.chartValidationCurve(vc, { setting: 'depth limit', scoreName: 'accuracy (share correct)', chosen: 6 });
  const vcLog: charts.ValidationCurveRow[] = [];
  for (const lr of [0.003, 0.01, 0.03, 0.1, 0.3, 1]) for (let f = 1; f <= 4; f++) vcLog.push({ value: lr, fold: f, score: 0.45 + 0.1 * Math.log10(lr / 0.05) ** 2 / 3 + rng.normal() * 0.01 });
  out['validation-curve-log'] = charts.chartValidationCurve(vcLog, { setting: 'learning rate', scoreName: 'log loss (nats)', chosen: 0.1 });
  const pp: charts.PruningPathRow[] = [1, 2, 3, 5, 7, 9, 12, 16, 21, 27, 34].map((leaves) => ({
    leaves, heldOutError: 0.42 * Math.exp(-leaves / 4) + 0.16 + 0.0025 * leaves, trainingError: 0.42 * Math.exp(-leaves / 4) + 0.14 - 0.0022 * leaves,
  }));
  out['pruning-path'] = charts.chartPruningPath(pp, { chosen: 9 });
  out['pruning-table'] = charts.chartPruningTable([
    { node: 12, depth: 4, rows: 18, errorWithSubtree: 4, errorAsLeaf: 3, decision: 'prune' },
    { node: 9, depth: 3, rows: 41, errorWithSubtree: 7, errorAsLeaf: 7, decision: 'prune' },
    { node: 6, depth: 3, rows: 33, errorWithSubtree: 5, errorAsLeaf: 9, decision: 'keep' },
    { node: 4, depth: 2, rows: 74, errorWithSubtree: 12, errorAsLeaf: 15, decision: 'keep' },
    { node: 2, depth: 1, rows: 129, errorWithSubtree: 21, errorAsLeaf: 34, decision: 'keep' },
  ]);
  const y = crates.map((c) => c.shelf);
  const fitted = crates.map((c) => 28 - 0.12 * c.storage - 1.1 * c.bruise + 0.015 * (c.storage - 50) ** 2 / 20 + (c.variety === 'Boskoop' ? 2 : 0));
  out['residuals-by-fitted'] = charts.chartResidualsByFitted({ y, fitted }, { targetName: 'shelf life', unit: 'days' });
  out['residuals-by-feature-numeric'] = charts.chartResidualsByFeature({ y, fitted, feature: crates.map((c, i) => (i % 37 === 0 ? NaN : c.storage)), featureName: 'storage_hours', featureUnit: 'h' }, { targetName: 'shelf life', unit: 'days' });
  out['residuals-by-feature-category'] = charts.chartResidualsByFeature({ y, fitted, feature: crates.map((c, i) => (i % 101 === 0 ? null : c.variety)), featureName: 'variety' }, { targetName: 'shelf life', unit: 'days' });
  out['residual-histogram'] = charts.chartResidualHistogram({ y, fitted }, { unit: 'days' });
  out['importance'] = charts.chartImportance([
    { feature: 'bruise_score', value: 0.142, low: 0.128, high: 0.158 }, { feature: 'storage_hours', value: 0.071, low: 0.06, high: 0.083 },
    { feature: 'variety', value: 0.018, low: 0.011, high: 0.026 }, { feature: 'harvest_week', value: 0.004, low: -0.003, high: 0.01 },
    { feature: 'crate_id', value: -0.002, low: -0.006, high: 0.002 },
  ], { valueName: 'drop in accuracy when shuffled (share of rows)', intervalName: 'whiskers: middle 90% of 20 shuffles' });
  const raw = [1, 2, 3, 4, 5, 6, 7, 8].map((i) => 1 / i ** 1.3);
  const rawSum = raw.reduce((a, b) => a + b, 0);
  out['importance-plain'] = charts.chartImportance(['bruise_score', 'storage_hours', 'variety', 'harvest_week', 'grower_region', 'pallet_position', 'picker_team', 'crate_material'].map((feature, i) => ({ feature, value: raw[i] / rawSum })), { valueName: 'impurity decrease (share of total)' });
  const counts = [[0, 0, 0], [0, 0, 0], [0, 0, 0]];
  for (const c of crates) counts[c.grade][c.score.indexOf(Math.max(...c.score))]++;
  out['confusion'] = charts.chartConfusion({ classes: GRADES, counts });
  out['confusion-sparse'] = charts.chartConfusion(defectConfusion(), { title: 'Defect found at grading' });
  const roc = GRADES.map((label, k) => ({ label, points: rocPoints(crates.map((c) => c.score[k]), crates.map((c) => c.grade === k)) }));
  out['roc'] = charts.chartRoc(roc);
  out['roc-single'] = charts.chartRoc([roc[2]]);
  const share = (k: number) => crates.filter((c) => c.grade === k).length / crates.length;
  out['precision-recall'] = charts.chartPrecisionRecall(GRADES.map((label, k) => ({ label, baseline: share(k), points: prPoints(crates.map((c) => c.score[k]), crates.map((c) => c.grade === k)) })));
  const bins: charts.CalibrationChartBin[] = [];
  for (let b = 0; b < 10; b++) {
    const inBin = crates.filter((c) => Math.min(9, Math.floor(c.score[2] * 10)) === b);
    if (inBin.length === 0) continue;
    bins.push({ meanPredicted: inBin.reduce((s, c) => s + c.score[2], 0) / inBin.length, observed: inBin.filter((c) => c.grade === 2).length / inBin.length, rows: inBin.length });
  }
  out['calibration'] = charts.chartCalibration(bins);
  const oob: charts.EnsembleSizeRow[] = [];
  for (const [series, base] of [['2 features per split', 0.205], ['all 4 features', 0.222]] as const) {
    for (let size = 5; size <= 300; size += 5) oob.push({ size, series, error: base + 0.12 / Math.sqrt(size) + rng.normal() * 0.002 });
  }
  out['ensemble-size'] = charts.chartEnsembleSizeError(oob, { seriesName: 'features tried per split' });
  const bv: charts.BiasVarianceChartRow[] = [];
  for (let d = 1; d <= 10; d++) {
    const bias = 6 * Math.exp(-d / 1.8) + 0.3, variance = 0.05 * d ** 1.6;
    bv.push({ complexity: d, component: 'bias²', value: bias }, { complexity: d, component: 'variance', value: variance }, { complexity: d, component: 'error', value: bias + variance + 1 });
  }
  out['bias-variance'] = charts.chartBiasVariance(bv, { complexityName: 'depth limit', noise: 1, subtitle: 'Shelf life (days²) · 30 bootstrap resamples of the training rows' });
  const grid = Array.from({ length: 20 }, (_, i) => 4 + i * 4.8);
  const sample = crates.slice(0, 200);
  const pdRow = (c: Crate, s: number) => 28 - 0.12 * s - 1.1 * c.bruise + (s > 60 ? -3 : 0);
  out['dependence'] = charts.chartDependence({
    feature: 'storage_hours', unit: 'h',
    points: grid.map((s) => ({ value: s, average: sample.reduce((t, c) => t + pdRow(c, s), 0) / sample.length })),
    curves: sample.flatMap((c, row) => grid.map((s) => ({ row, value: s, prediction: pdRow(c, s) }))),
  }, { predictionName: 'shelf life (days)' });
  out['dependence-category'] = charts.chartDependence({
    feature: 'variety',
    points: VARIETIES.map((v, i) => ({ value: v, average: 16 + [2, 0, 3, -1, -2][i] })),
    curves: sample.flatMap((c, row) => VARIETIES.map((v, i) => ({ row, value: v, prediction: 16 + [2, 0, 3, -1, -2][i] - 1.1 * (c.bruise - 3) }))),
  }, { predictionName: 'shelf life (days)' });
  out['dependence-grid'] = charts.chartDependenceGrid({
    x: { name: 'storage_hours', unit: 'h' }, y: { name: 'bruise_score' },
    cells: grid.flatMap((s) => Array.from({ length: 11 }, (_, b) => ({ x: s, y: b, average: 28 - 0.12 * s - 1.1 * b - (s > 60 && b > 5 ? 3 : 0) }))),
  }, { predictionName: 'shelf life (days)' });
  out['dependence-grid-category'] = charts.chartDependenceGrid({
    x: { name: 'storage_hours', unit: 'h' }, y: { name: 'variety' },
    cells: grid.flatMap((s) => VARIETIES.map((v, i) => ({ x: s, y: v, average: 20 - 0.12 * s + [2, 0, 3, -1, -2][i] }))),
  }, { predictionName: 'shelf life (days)' });
  out['contributions'] = charts.chartContributions({
    expected: 15.8,
    contributions: [
      { feature: 'storage_hours', value: 71.5, contribution: -3.4 }, { feature: 'bruise_score', value: 2.1, contribution: 1.9 },
      { feature: 'variety', value: 'Boskoop', contribution: 2.6 }, { feature: 'harvest_week', value: 39, contribution: -0.3 },
      { feature: 'grower_region', value: null, contribution: 0.12 }, { feature: 'pallet_position', value: 'top', contribution: -0.05 },
      { feature: 'picker_team', value: 'C', contribution: 0.04 },
    ],
  }, { outputName: 'shelf life', unit: 'days', limit: 5 });
  const p = 4, n = 600;
  const contrib = new Float64Array(n * p);
  const subset = crates.slice(0, n);
  subset.forEach((c, i) => {
    contrib[i * p] = -0.12 * (c.storage - 50) + (c.storage > 60 ? -1.5 : 0.8) + rng.normal() * 0.6;
    contrib[i * p + 1] = -1.1 * (c.bruise - 3.3) + rng.normal() * 0.4;
    contrib[i * p + 2] = 0.05 * (c.week - 38) + rng.normal() * 0.05;
    contrib[i * p + 3] = [2, 0, 3, -1, -2][VARIETIES.indexOf(c.variety)] - 0.4 + rng.normal() * 0.5;
  });
  out['contribution-summary'] = charts.chartContributionSummary({
    features: ['storage_hours', 'bruise_score', 'harvest_week', 'variety'], contributions: contrib,
    values: [subset.map((c) => c.storage), subset.map((c) => c.bruise), subset.map((c) => c.week), subset.map((c) => c.variety)],
  });
  out['drift'] = charts.chartDrift([
    { feature: 'storage_hours', psi: 0.34 }, { feature: 'bruise_score', psi: 0.12 }, { feature: 'harvest_week', psi: 0.61 },
    { feature: 'variety', psi: 0.03 }, { feature: 'grower_region', psi: 0.07 }, { feature: 'pallet_position', psi: 0.01 },
  ]);
  out['metric-deltas'] = charts.chartMetricDeltas([
    { metric: 'accuracy', before: 0.812, after: 0.795 }, { metric: 'log loss (nats)', before: 0.462, after: 0.488, higherIsBetter: false },
    { metric: 'AUC (rejected)', before: 0.881, after: 0.889 }, { metric: 'rows scored', before: 12040, after: 12040 },
    { metric: 'RMSE shelf life (days)', before: 2.31, after: 2.18, higherIsBetter: false },
  ], { runs: ['June extract', 'July extract'] });
  out['tree-classes'] = charts.chartTree({ tree: gradeTree(), features: FEATURES, classes: GRADES });
  out['tree-regression'] = charts.chartTree({ tree: shelfTree(), features: FEATURES }, { valueName: 'shelf life (days)' });
  out['tree-long-names'] = charts.chartTree({ tree: oneRowLeafTree(), features: LONG_FEATURES, classes: GRADES });
  Object.assign(out, fittedModelCharts());
  out['empty'] = charts.chartLearningCurve([], { lossName: 'log loss' });
  return out;
}

/** Defect classes at grading: confusions only between look-alike defects, so many cells are empty. */
function defectConfusion(): ReturnType<typeof confusionTable> {
  const rng = createRng(17);
  const defects = ['none', 'bruise', 'rot', 'scab', 'russet', 'stem damage'];
  const actual: number[] = [], predicted: number[] = [];
  for (let i = 0; i < 900; i++) {
    const a = rng.next() < 0.55 ? 0 : 1 + rng.int(5);
    const u = rng.next();
    // a defect is missed (graded 'none') 6% of the time and taken for its neighbour 10% of the time
    const p = a === 0 ? (u < 0.03 ? 1 : 0) : u < 0.06 ? 0 : u < 0.16 ? 1 + (a % 5) : a;
    actual.push(a); predicted.push(p);
  }
  return confusionTable(actual, predicted, { classes: defects });
}

export const LONG_FEATURES = [
  { name: 'Storage Duration Before Grading (h)' }, { name: 'Bruise Score (0–10)' }, { name: 'Harvest Week' },
  { name: 'Variety', categories: VARIETIES },
];

/** gradeTree with one leaf reached by a single training row. */
export function oneRowLeafTree(): FlatTree {
  const t = gradeTree();
  const count = Float64Array.from(t.count);
  count[8] = 1;
  return { ...t, count, cover: Float64Array.from(count) };
}

/** Charts made straight from fitted models (boosting, AdaBoost, forests) on seeded crates. */
export function fittedModelCharts(): Record<string, ChartSpec> {
  const train = crateDataset(600, 'grade'), watch = crateDataset(400, 'grade', 2024, 600);
  const gb = fitBoosting(train, { rounds: 200, learningRate: 0.1, depthLimit: 3, watch, patience: 40, seed: 1 });
  const ada = fitAdaBoost(train, { rounds: 60, depthLimit: 2, watch, seed: 1 });
  const shelf = crateDataset(600, 'shelf');
  const forests = {
    '2 features per split': fitForest(train, { size: 120, featuresPerSplit: 2, seed: 3 }),
    'all 4 features': fitForest(train, { size: 120, featuresPerSplit: 4, seed: 3 }),
  };
  return {
    'boosting-curve': charts.chartBoostingCurve(gb),
    'adaboost-curve': charts.chartBoostingCurve(ada),
    'forest-oob': charts.chartOutOfBag(forests, { seriesName: 'features tried per split' }),
    'forest-oob-regression': charts.chartOutOfBag(fitForest(shelf, { size: 80, seed: 4 })),
  };
}
