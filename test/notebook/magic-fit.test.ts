/**
 * `%%fit` on the real learners: each learner's cell is compiled and its code run against coppice's own
 * exports (`src/index.ts` standing in for the "coppice" import), on the Palmer penguins data shipped in
 * vega-datasets (Gorman, Williams & Fraser 2014; 344 rows, 3 species).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import * as coppice from '../../src/index.js';
import { compileCell } from '../../src/notebook/magic-compile.js';
import { builtinMagics } from '../../src/notebook/magics.js';
import { installSink } from '../../src/notebook/display-sink.js';
import type { DisplayMessage } from '../../src/notebook/display-types.js';
import { learnerTable, tableOptions } from '../../src/notebook/magic-learners.js';
import { TREE_OPTION_NAMES } from '../../src/learn/tree/tree-options.js';
import { forestKeys } from '../../src/learn/ensemble/forest.js';
import { baggingKeys } from '../../src/learn/ensemble/bagging.js';
import { adaBoostKeys } from '../../src/learn/ensemble/adaboost.js';
import { boostingKeys } from '../../src/learn/ensemble/boosting-options.js';
import type { ModelHeader } from '../../src/learn/model.js';
import type { TreeModel } from '../../src/learn/tree-model.js';
import type { StackModel } from '../../src/learn/ensemble/models.js';

type Row = Record<string, unknown>;
const penguins = JSON.parse(readFileSync(join(import.meta.dirname, '..', '..', 'node_modules', 'vega-datasets', 'data', 'penguins.json'), 'utf8')) as Row[];
const train = penguins.filter((_, i) => i % 4 !== 0);
const test = penguins.filter((_, i) => i % 4 === 0);
const AsyncFunction = Object.getPrototypeOf(async () => undefined).constructor as new (...args: string[]) => (...values: unknown[]) => Promise<unknown>;

/** Compile `cell` and run it with `scope` as its variables; resolves with the model it binds. */
async function runFit(cell: string, scope: Record<string, unknown> = {}): Promise<ModelHeader> {
  const { code } = compileCell(cell, builtinMagics);
  const name = /^%%fit\s+(\S+)/.exec(cell)![1];
  const body = `${code.replace(/^import \* as coppice\$ from "coppice"; /, '')}\nreturn ${name};`;
  const names = ['coppice$', 'train', 'test', ...Object.keys(scope)];
  return await new AsyncFunction(...names, body)(coppice, train, test, ...Object.values(scope)) as ModelHeader;
}

const head = 'data: train\ntarget: Species\nexclude: Sex';

describe('%%fit <name> <learner> on the real learners', () => {
  const shown: DisplayMessage[] = [];
  let restore: () => void;
  beforeAll(() => { restore = installSink({ onDisplay: (m) => shown.push(m) }); });
  afterAll(() => restore());

  it('tree: depth, criterion, leaf-rows, leaves, engine, leaf-value, seed', async () => {
    const m = await runFit(`%%fit t tree\n${head}\ndepth: 3\ncriterion: gini\nleaf-rows: 2\nleaves: 6\nengine: exact\nleaf-value: mean\nseed: 3`) as TreeModel;
    expect(m.kind).toBe('tree');
    expect(m.settings).toMatchObject({ depthLimit: 3, criterion: 'gini', leafRows: 2, leafBudget: 6, engine: 'exact', seed: 3 });
    expect(m.features.map((f) => f.name)).not.toContain('Sex');
    expect(m.trainingRows).toBe(train.length); // no missing Species in penguins.json (counted: 258 of 344)
  });

  it('tree: the option API names are accepted as settings (depthLimit, leafRows)', async () => {
    const m = await runFit(`%%fit t tree\n${head}\ndepthLimit: 2\nleafRows: 4`);
    expect(m.settings).toMatchObject({ depthLimit: 2, leafRows: 4 });
  });

  it('tree: prune-on prunes by reduced error on the held-out table', async () => {
    const cell = `%%fit p tree\n${head}\nprune: reduced-error\nprune-on: test`;
    expect(compileCell(cell, builtinMagics).code).toContain('coppice$.fitPrunedTree(d, o)');
    const p = await runFit(cell) as TreeModel;
    expect(String(shown.at(-1)?.data['text/plain'])).toMatch(/\n {2}pruned +reduced error, on 86 held-out rows\n/);
    const full = await runFit(`%%fit full tree\n${head}`) as TreeModel;
    expect(p.settings.pruning).toEqual({ method: 'reducedError', heldOutRows: test.length });
    expect(p.tree.nNodes).toBeLessThan(full.tree.nNodes); // a fully grown tree has nodes that no held-out row reaches: pruned on ties
  });

  it('tree: prune: cost-complexity with folds and rule', async () => {
    const p = await runFit(`%%fit p tree\n${head}\nprune: cost-complexity\nprune-folds: 4\nprune-rule: minimum`) as TreeModel;
    expect(p.settings.pruning).toMatchObject({ method: 'costComplexity', rule: 'minimum', evaluation: 'crossValidation', folds: 4 });
  });

  it('forest: trees, features-per-split, combine, class-weights, depth, seed, workers', async () => {
    const m = await runFit(`%%fit f forest\n${head}\ntrees: 8\nfeatures-per-split: 2\ncombine: vote\nclass-weights: { Adelie: 1, Chinstrap: 2, Gentoo: 1 }\ndepth: 4\nseed: 5\nworkers: 1`);
    expect(m.kind).toBe('forest');
    expect(m.settings).toMatchObject({ size: 8, featuresPerSplit: 2, combine: 'vote', depthLimit: 4, classWeights: { Chinstrap: 2 } });
    expect(m.seed).toBe(5);
  });

  it('bagging: trees, combine, leaf-weight, min-gain, categorical', async () => {
    const m = await runFit(`%%fit b bagging\n${head}\ntrees: 5\ncombine: average\nleaf-weight: 2\nmin-gain: 0.001\ncategorical: multiway`);
    expect(m.kind).toBe('bagging');
    expect(m.settings).toMatchObject({ size: 5, leafWeight: 2, minGain: 0.001, categorical: 'multiway' });
  });

  it('adaboost: rounds, sampling, watch (a table), depth', async () => {
    const m = await runFit(`%%fit a adaboost\n${head}\nrounds: 6\nsampling: resample\nwatch: test\ndepth: 2`);
    expect(m.kind).toBe('adaboost');
    const rounds = (m as unknown as { rounds: { watchError: number }[] }).rounds;
    expect(rounds.length).toBeGreaterThan(0);
    expect(Number.isNaN(rounds[0].watchError)).toBe(false); // the watched table was read and scored
  });

  it('boosting: rounds, rate, loss, row-fraction, step-decay, watch, patience, newton-trees', async () => {
    const m = await runFit(`%%fit g boosting\n${head}\nrounds: 12\nrate: 0.3\nloss: multiclass\nrow-fraction: 0.8\nstep-decay: 0.01\nwatch: test\npatience: 3\nseed: 2\nnewton-trees: yes`);
    expect(m.kind).toBe('boosting');
    expect(m.settings).toMatchObject({ rounds: 12, learningRate: 0.3, loss: 'multiclass', rowFraction: 0.8, stepDecay: 0.01, patience: 3, newtonTrees: true });
    expect((m as unknown as { watchLoss: number[] }).watchLoss.length).toBeGreaterThan(1);
  });

  it('boosting: huber-quantile and quantile-level reach a regression fit', async () => {
    const cell = '%%fit r boosting\ndata: train\ntarget: Body Mass (g)\nmissing-target: drop\nfeatures: Flipper Length (mm), Species\nloss: huber\nhuber-quantile: 0.8\nquantile-level: 0.4\nrounds: 5';
    const m = await runFit(cell);
    expect(m.task).toBe('regression');
    expect(m.settings).toMatchObject({ loss: 'huber', huberQuantile: 0.8, quantileLevel: 0.4 });
  });

  it('stacking: members named by earlier models are refitted like them; folds, ridge, seed', async () => {
    const shallow = await runFit(`%%fit shallow tree\n${head}\ndepth: 2`);
    const forest = await runFit(`%%fit forest forest\n${head}\ntrees: 6\nseed: 1`);
    const s = await runFit(`%%fit s stacking\n${head}\nmembers: shallow, forest\nfolds: 3\nridge: 0.01\nseed: 4`, { shallow, forest }) as StackModel;
    expect(s.kind).toBe('stack');
    expect(s.members.map((x) => x.name)).toEqual(['shallow', 'forest']);
    expect(s.members[1].model.settings).toMatchObject({ size: 6 });
    expect(s.members[1].model.seed).toBe(1);
    expect(s.folds).toBe(3);
  });

  it('stacking: members may be an expression giving learners', async () => {
    const cell = `%%fit s stacking\n${head}\nmembers: [{ name: 'stump', fit: (d) => coppice$.fitTree(d, { depthLimit: 1 }) }]\nfolds: 2`;
    const s = await runFit(cell) as StackModel;
    expect(s.members.map((x) => x.name)).toEqual(['stump']);
  });

  it('shows progress and ends each fit with the model summary', () => {
    const finals = shown.filter((m) => String(m.data['text/plain']).includes(' model\n'));
    expect(finals.length).toBeGreaterThanOrEqual(10);
    expect(String(finals[0].data['text/plain'])).toMatch(/^t: tree model\n {2}task +classification of Species \(3 classes\)/);
  });

  it('reports an option a learner rejects as the learner error, and marks the progress stopped', async () => {
    await expect(runFit(`%%fit f forest\n${head}\ncombine: median`)).rejects.toThrow("Option combine = \"median\" is invalid: expected 'average' or 'vote'.");
    expect(String(shown.at(-1)?.data['text/plain'])).toContain('stopped: Option combine');
  });
});

describe('learnerTable', () => {
  const stackKeys = ['members', 'folds', 'seed', 'passThrough', 'ridge'];
  const pruneKeys = ['prune', 'pruneOn', 'pruneFolds', 'pruneRule'];
  // The option lists each learner validates against (src/learn): every one has a setting, and no setting names anything else.
  const api: Record<string, readonly string[]> = {
    tree: [...TREE_OPTION_NAMES, ...pruneKeys],
    forest: forestKeys,
    bagging: baggingKeys,
    adaboost: adaBoostKeys,
    boosting: boostingKeys,
    stacking: stackKeys,
  };
  for (const [learner, keys] of Object.entries(api)) {
    it(`${learner}: one setting per option of the learner`, () => {
      const rule = learnerTable[learner];
      const options = Object.values(rule.settings).map((r) => r.option).sort();
      // a progress callback is fed by watchFit, not set from a cell
      expect(options).toEqual(keys.filter((k) => k !== rule.progress?.option).sort());
    });
  }

  it('lists the options that may hold a table', () => {
    expect([...tableOptions].sort()).toEqual(['pruneOn', 'watch']);
  });
});

describe('%%fit errors', () => {
  const message = (cell: string) => {
    try {
      compileCell(cell, builtinMagics);
    } catch (e) {
      return (e as Error).message;
    }
    return 'no error';
  };

  it('puts a caret under a setting the learner does not take', () => {
    expect(message('%%fit f forest\ndata: t\ntarget: y\nrate: 0.1')).toMatch(
      /^Magic at line 4, column 1: unknown setting "rate" for forest; known: .*\.\n {2}rate: 0\.1\n {2}\^\^\^\^$/);
  });

  it('refuses a setting given twice under two names', () => {
    expect(message('%%fit t tree\ndata: t\ntarget: y\ndepth: 2\ndepthLimit: 3')).toBe(
      'Magic at line 5, column 1: depthLimit sets depthLimit again (first at line 4).\n  depthLimit: 3\n  ^^^^^^^^^^');
  });

  it('checks the kind of a value', () => {
    expect(message('%%fit g boosting\ndata: t\ntarget: y\nrate: fast')).toBe(
      'Magic at line 4, column 7: rate: expected a number, found "fast".\n  rate: fast\n        ^^^^');
  });
});
