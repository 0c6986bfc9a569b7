/**
 * showLineup / %%lineup with every model kind, on the Palmer penguins data (vega-datasets penguins.json;
 * Gorman, Williams & Fraser 2014). Each score in the lineup is checked against the model's predictions
 * scored directly (accuracy: share of rows whose most probable class is the true one; RMSE by definition).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { showLineup } from '../../src/notebook/lineup.js';
import { installSink } from '../../src/notebook/display-sink.js';
import type { DisplayMessage } from '../../src/notebook/display-types.js';
import { compileCell } from '../../src/notebook/magic-compile.js';
import { builtinMagics } from '../../src/notebook/magics.js';
import { fitStackWith } from '../../src/notebook/stack-members.js';
import { fitTree } from '../../src/learn/tree/fit-tree.js';
import { fitForest } from '../../src/learn/ensemble/forest.js';
import { fitBagging } from '../../src/learn/ensemble/bagging.js';
import { fitAdaBoost } from '../../src/learn/ensemble/adaboost.js';
import { fitBoosting } from '../../src/learn/ensemble/boosting.js';
import { predictFrame } from '../../src/learn/predict.js';
import type { ModelHeader } from '../../src/learn/model.js';
import { toDataset } from '../../src/table/to-dataset.js';
import { penguinRows } from '../learn/tree/open-data.js';

const rows = penguinRows().map((r) => ({ ...r, Sex: r.Sex === '.' ? null : r.Sex }));
const train = rows.filter((_, i) => i % 4 !== 0);
const test = rows.filter((_, i) => i % 4 === 0);

describe('showLineup(models, data, options) for every model kind', () => {
  const shown: DisplayMessage[] = [];
  let restore: () => void;
  beforeAll(() => { restore = installSink({ onDisplay: (m) => shown.push(m) }); });
  afterAll(() => restore());

  it('classification: tree, forest, bagging, AdaBoost, boosting and stack', async () => {
    const d = toDataset(train, { target: 'Species' });
    const tree = fitTree(d, { depthLimit: 3 });
    const models: Record<string, ModelHeader> = {
      tree,
      forest: fitForest(d, { size: 10, seed: 1 }),
      bagging: fitBagging(d, { size: 5, seed: 2 }),
      adaboost: fitAdaBoost(d, { rounds: 10, depthLimit: 2 }),
      boosting: fitBoosting(d, { rounds: 10 }),
      stack: fitStackWith(d, { members: { tree }, folds: 3 }),
    };
    const scored = await showLineup(models, test, { metrics: ['accuracy', 'logLoss'], title: 'every kind' });
    const truth = toDataset(test, { target: 'Species' });
    const codes = truth.target.kind === 'class' ? truth.target.codes : new Int32Array();
    for (const row of scored) {
      const p = predictFrame(models[row.model], truth.features);
      let hit = 0;
      for (let i = 0; i < p.n; i++) if (p.value[i] === codes[i]) hit++;
      expect(row.accuracy, row.model).toBeCloseTo(hit / p.n, 12);
      expect(typeof row.logLoss, row.model).toBe('number');
    }
    expect(scored.map((r) => r.model)).toEqual(Object.keys(models));
    const chart = shown.at(-1)!.data;
    expect(chart['text/plain']).toBe('[chart: every kind]');
  });

  it('regression: tree, forest, bagging, boosting and stack', async () => {
    const keep = (r: Record<string, unknown>) => r['Body Mass (g)'] != null;
    const d = toDataset(train.filter(keep), { target: 'Body Mass (g)' });
    const tree = fitTree(d, { depthLimit: 3 });
    const models: Record<string, ModelHeader> = {
      tree,
      forest: fitForest(d, { size: 10, seed: 1 }),
      bagging: fitBagging(d, { size: 5, seed: 2 }),
      boosting: fitBoosting(d, { rounds: 20 }),
      stack: fitStackWith(d, { members: { tree }, folds: 3 }),
    };
    const scored = await showLineup(models, test, { metrics: ['rmse'] });
    const truth = toDataset(test.filter(keep), { target: 'Body Mass (g)' });
    const y = truth.target.kind === 'number' ? truth.target.values : new Float64Array();
    for (const row of scored) {
      const p = predictFrame(models[row.model], truth.features);
      let ss = 0;
      for (let i = 0; i < p.n; i++) ss += (p.value[i] - y[i]) ** 2;
      expect(row.rmse, row.model).toBeCloseTo(Math.sqrt(ss / p.n), 6); // rows with a missing target are left out by the lineup
    }
  });

  it('%%lineup compiles to the same call for any model names', () => {
    const code = compileCell('%%lineup kinds\nmodels: tree, forest, adaboost, boosting, stack\ndata: test', builtinMagics).code;
    expect(code).toContain('{ tree: tree, forest: forest, adaboost: adaboost, boosting: boosting, stack: stack }');
  });
});
