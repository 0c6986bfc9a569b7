/**
 * Bad and empty inputs for every chart: empty inputs give an empty-state chart (valid vega-lite v5, renders
 * without warnings, shows a message); NaN or Infinity gives a CoppiceError naming the field and row.
 */
import { describe, expect, it } from 'vitest';
import * as charts from '../../src/charts/index.js';
import type { ChartSpec } from '../../src/charts/index.js';
import { CoppiceError } from '../../src/errors.js';
import { checkSpec } from './validate-spec.js';

const empties: Record<string, () => ChartSpec> = {
  chartLearningCurve: () => charts.chartLearningCurve([]),
  chartValidationCurve: () => charts.chartValidationCurve([]),
  chartPruningPath: () => charts.chartPruningPath([]),
  chartPruningTable: () => charts.chartPruningTable([]),
  chartResidualsByFitted: () => charts.chartResidualsByFitted({ y: [], fitted: [] }),
  chartResidualsByFeature: () => charts.chartResidualsByFeature({ y: [], fitted: [], feature: [], featureName: 'f' }),
  'chartResidualsByFeature (all missing)': () => charts.chartResidualsByFeature({ y: [1, 2], fitted: [1, 1], feature: [NaN, NaN], featureName: 'f' }),
  chartResidualHistogram: () => charts.chartResidualHistogram({ y: [], fitted: [] }),
  chartImportance: () => charts.chartImportance([]),
  chartConfusion: () => charts.chartConfusion({ classes: [], counts: [] }),
  'chartConfusion (all zero)': () => charts.chartConfusion({ classes: ['a'], counts: [[0]] }),
  chartRoc: () => charts.chartRoc([]),
  chartPrecisionRecall: () => charts.chartPrecisionRecall([]),
  chartCalibration: () => charts.chartCalibration([]),
  chartEnsembleSizeError: () => charts.chartEnsembleSizeError([]),
  chartBiasVariance: () => charts.chartBiasVariance([]),
  chartDependence: () => charts.chartDependence({ feature: 'f', points: [] }),
  chartDependenceGrid: () => charts.chartDependenceGrid({ x: { name: 'a' }, y: { name: 'b' }, cells: [] }),
  chartContributions: () => charts.chartContributions({ expected: 1, contributions: [] }),
  chartContributionSummary: () => charts.chartContributionSummary({ features: ['a'], contributions: [], values: [[]] }),
  chartDrift: () => charts.chartDrift([]),
  chartMetricDeltas: () => charts.chartMetricDeltas([]),
};

describe('chart…(empty input)', () => {
  for (const [name, make] of Object.entries(empties)) {
    it(`${name}: an empty-state chart with a message, valid and warning-free`, async () => {
      const spec = make();
      const { schema, warnings, svg } = await checkSpec(spec);
      expect(schema).toEqual([]);
      expect(warnings).toEqual([]);
      expect(JSON.stringify(spec)).toMatch(/"message":"[A-Z][^"]+\."/);
      expect(svg).toContain('<text');
    });
  }
});

const nans: Record<string, () => unknown> = {
  chartLearningCurve: () => charts.chartLearningCurve([{ round: 1, set: 'training', loss: NaN }]),
  'chartLearningCurve (set)': () => charts.chartLearningCurve([{ round: 1, set: 'test' as 'training', loss: 1 }]),
  'chartLearningCurve (log scale, zero loss)': () => charts.chartLearningCurve([{ round: 1, set: 'training', loss: 0 }], { logScale: true }),
  chartValidationCurve: () => charts.chartValidationCurve([{ value: 1, fold: 1, score: Infinity }]),
  'chartValidationCurve (chosen missing)': () => charts.chartValidationCurve([{ value: 1, fold: 1, score: 1 }], { chosen: 2 }),
  chartPruningPath: () => charts.chartPruningPath([{ leaves: NaN, heldOutError: 0.1 }]),
  chartPruningTable: () => charts.chartPruningTable([{ node: 1, depth: 1, rows: 3, errorWithSubtree: NaN, errorAsLeaf: 1, decision: 'keep' }]),
  chartResidualsByFitted: () => charts.chartResidualsByFitted({ y: [1, NaN], fitted: [1, 2] }),
  chartResidualHistogram: () => charts.chartResidualHistogram({ y: [1, 2], fitted: [1, Infinity] }),
  chartResidualsByFeature: () => charts.chartResidualsByFeature({ y: [1, 2], fitted: [1, 2], feature: [1], featureName: 'f' }),
  chartImportance: () => charts.chartImportance([{ feature: 'a', value: NaN }]),
  'chartImportance (limit)': () => charts.chartImportance([{ feature: 'a', value: 1 }], { limit: 0 }),
  chartRoc: () => charts.chartRoc([{ label: 'x', points: [{ falsePositiveRate: 1.2, truePositiveRate: 0.5 }] }]),
  chartPrecisionRecall: () => charts.chartPrecisionRecall([{ label: 'x', points: [{ recall: NaN, precision: 0.5 }] }]),
  chartCalibration: () => charts.chartCalibration([{ meanPredicted: 0.2, observed: NaN, rows: 3 }]),
  chartEnsembleSizeError: () => charts.chartEnsembleSizeError([{ size: 1, error: NaN }]),
  chartBiasVariance: () => charts.chartBiasVariance([{ complexity: 1, component: 'noise' as 'error', value: 1 }]),
  chartDependence: () => charts.chartDependence({ feature: 'f', points: [{ value: 1, average: NaN }] }),
  chartDependenceGrid: () => charts.chartDependenceGrid({ x: { name: 'a' }, y: { name: 'b' }, cells: [{ x: 1, y: 1, average: NaN }] }),
  chartContributions: () => charts.chartContributions({ expected: NaN, contributions: [{ feature: 'a', contribution: 1 }] }),
  chartContributionSummary: () => charts.chartContributionSummary({ features: ['a'], contributions: [NaN], values: [[1]] }),
  chartDrift: () => charts.chartDrift([{ feature: 'a', psi: -0.1 }]),
  'chartDrift (thresholds)': () => charts.chartDrift([{ feature: 'a', psi: 0.1 }], { thresholds: [0.3, 0.2] }),
  chartMetricDeltas: () => charts.chartMetricDeltas([{ metric: 'm', before: 1, after: NaN }]),
  chartConfusion: () => charts.chartConfusion({ classes: ['a'], counts: [[NaN]] }),
  'width option': () => charts.chartImportance([{ feature: 'a', value: 1 }], { width: -5 }),
};

describe('chart…(NaN, Infinity or out-of-range input)', () => {
  for (const [name, make] of Object.entries(nans)) {
    it(`${name}: throws a CoppiceError`, () => {
      expect(make).toThrow(CoppiceError);
    });
  }
});

describe('chart…(one row)', () => {
  it('learning curve, validation curve, residuals and importance draw a single row without warnings', async () => {
    for (const spec of [
      charts.chartLearningCurve([{ round: 1, set: 'watched', loss: 0.3 }], { bestRound: 1 }),
      charts.chartValidationCurve([{ value: 3, fold: 1, score: 0.7 }], { chosen: 3 }),
      charts.chartResidualsByFitted({ y: [2], fitted: [1.5] }),
      charts.chartResidualHistogram({ y: [2], fitted: [1.5] }),
      charts.chartImportance([{ feature: 'a', value: 0 }]),
      charts.chartConfusion({ classes: ['only'], counts: [[5]] }),
    ]) {
      const { schema, warnings } = await checkSpec(spec);
      expect(schema).toEqual([]);
      expect(warnings).toEqual([]);
    }
  });
});
