/**
 * Model file: round trip and rejection of bad files. Sources: DESIGN.md "Model file" and
 * "Reliability" (the loader validates and rejects with a clear message; common practice).
 */
import { mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { CoppiceError } from '../../src/errors.js';
import { loadModel, modelFromJSON, modelToJSON, saveModel } from '../../src/learn/model-file.js';
import { predictFrame } from '../../src/learn/predict.js';
import { fitTree } from '../../src/learn/tree/fit-tree.js';
import { penguinsData } from './tree/open-data.js';
import { datasetOf, numberTarget } from './tree/fixtures.js';

const dir = mkdtempSync(join(tmpdir(), 'coppice-model-'));
const data = penguinsData();
const models = {
  multiway: fitTree(data, { criterion: 'gainRatio', depthLimit: 4 }),
  subset: fitTree(data, { categorical: 'subset', leafBudget: 6 }),
  regression: fitTree(datasetOf({ x: [1, 2, 3, null, 5, 6], g: ['a', 'b', 'a', 'b', null, 'c'] }, numberTarget('y', [1, 2, 2, 8, 9, 9]))),
};

function rejects(json: unknown, pattern: RegExp): void {
  let err: unknown;
  try { modelFromJSON(json); } catch (e) { err = e; }
  expect(err).toBeInstanceOf(CoppiceError);
  expect((err as CoppiceError).code).toBe('bad-model');
  expect((err as Error).message).toMatch(pattern);
}

describe('modelToJSON / modelFromJSON', () => {
  for (const [name, model] of Object.entries(models)) {
    it(`modelFromJSON(JSON.parse(JSON.stringify(modelToJSON(model)))) predicts identically (${name})`, () => {
      const json = JSON.parse(JSON.stringify(modelToJSON(model)));
      const back = modelFromJSON(json);
      expect(back.tree).toEqual(model.tree);
      expect(back.settings).toEqual(model.settings); // Infinity settings survive (tagged numbers)
      const frame = name === 'regression' ? datasetOf({ x: [1, null, 7, 2], g: ['c', 'a', null, 'b'] }, numberTarget('y', [0, 0, 0])).features : data.features;
      const a = predictFrame(model, frame), b = predictFrame(back, frame);
      expect(Array.from(b.value)).toEqual(Array.from(a.value));
      expect(Array.from(b.proba)).toEqual(Array.from(a.proba));
    });
  }

  it('modelToJSON(model) writes the documented top-level fields', () => {
    const json = modelToJSON(models.multiway, { created: '2020-01-01T00:00:00.000Z' });
    expect(Object.keys(json)).toEqual(['format', 'version', 'kind', 'task', 'features', 'target', 'settings', 'seed', 'fingerprint', 'ranges', 'created', 'body']);
    expect(json.format).toBe('coppice-model');
    expect(json.version).toBe(1);
    expect((json.settings as Record<string, unknown>).depthLimit).toBe(4);
    expect((json.settings as Record<string, unknown>).leafBudget).toEqual({ $number: 'Infinity' });
  });

  const good = (): Record<string, any> => JSON.parse(JSON.stringify(modelToJSON(models.subset)));

  it('modelFromJSON(json) rejects a newer version, saying which version it reads', () => {
    rejects({ ...good(), version: 2 }, /newer coppice \(format version 2\); this build reads version 1/);
  });
  it('modelFromJSON(json) rejects a wrong format or kind', () => {
    rejects({ ...good(), format: 'other' }, /not a coppice model/);
    rejects({ ...good(), kind: 'mystery' }, /unknown model kind/);
    rejects(null, /should be an object/);
  });
  it('modelFromJSON(json) rejects wrong field types and array lengths', () => {
    const a = good(); a.features[0].kind = 'text'; rejects(a, /features\[0\]\.kind/);
    const b = good(); b.body.tree.left.pop(); rejects(b, /body\.tree\.left should have/);
    const c = good(); c.body.tree.value[0] = 'x'; rejects(c, /body\.tree\.value\[0\] should be a number/);
    const d = good(); d.seed = 1.5; rejects(d, /seed should be an integer/);
    const e = good(); delete e.body; rejects(e, /body is missing/);
    const f = good(); f.target.kind = 'number'; rejects(f, /target\.kind is number/);
  });
  it('modelFromJSON(json) rejects child and feature indices out of range (no loops, no bad reads)', () => {
    const a = good(); a.body.tree.left[0] = 0; rejects(a, /node 0 has left child 0/);
    const b = good(); b.body.tree.feature[0] = 99; rejects(b, /body\.tree\.feature\[0\]/);
    const c = good(); c.body.tree.missing[0] = a.body.tree.nNodes - 1; rejects(c, /sends missing values/);
    const d = good();
    const subsetNode = d.body.tree.kind.indexOf(2); // a SUBSET node
    expect(subsetNode).toBeGreaterThanOrEqual(0);
    d.body.tree.offset[subsetNode] = 10_000;
    rejects(d, /category set outside catBits/);
    const m = JSON.parse(JSON.stringify(modelToJSON(models.multiway)));
    const multiNode = m.body.tree.kind.indexOf(3); // a MULTIWAY node
    m.body.tree.branches[m.body.tree.offset[multiNode]] = multiNode;
    rejects(m, /branch 0/);
  });
});

describe('saveModel / loadModel', () => {
  it('saveModel(model, path) then loadModel(path) predicts identically and leaves no temporary file', async () => {
    const path = join(dir, 'penguins.json');
    await saveModel(models.multiway, path);
    expect(readdirSync(dir)).toEqual(['penguins.json']);
    const back = await loadModel(path);
    const a = predictFrame(models.multiway, data.features), b = predictFrame(back, data.features);
    expect(Array.from(b.proba)).toEqual(Array.from(a.proba));
    expect(back.created).toMatch(/^\d{4}-\d\d-\d\dT/);
  });

  it('loadModel(path) rejects truncated and corrupted files and names a missing file', async () => {
    const path = join(dir, 'whole.json');
    await saveModel(models.subset, path);
    const text = readFileSync(path, 'utf8');
    writeFileSync(join(dir, 'cut.json'), text.slice(0, Math.floor(text.length / 2)));
    await expect(loadModel(join(dir, 'cut.json'))).rejects.toThrow(/not valid JSON \(truncated or corrupted\)/);
    writeFileSync(join(dir, 'flip.json'), text.replace('"kind":[', '"kind":[7,'));
    await expect(loadModel(join(dir, 'flip.json'))).rejects.toThrow(/Model file rejected/);
    await expect(loadModel(join(dir, 'nope.json'))).rejects.toThrow(/no such file/);
  });
});

describe('model file: training ranges', () => {
  it('fitted models record [min, max] per numeric feature and the file keeps them', async () => {
    const { fitTree } = await import('../../src/learn/tree/fit-tree.js');
    const { modelFromJSON, modelToJSON } = await import('../../src/learn/model-file.js');
    const features = {
      nRows: 4,
      columns: [{ name: 'x', kind: 'numeric' as const, values: Float64Array.from([3, NaN, -1, 8]) }],
      schema: { columns: [{ name: 'x', kind: 'numeric' as const }], fingerprint: 'f' },
    };
    const m = fitTree({ features, target: { kind: 'number', name: 'y', values: Float64Array.from([1, 2, 3, 4]) }, weights: null });
    expect(m.ranges).toEqual({ x: [-1, 8] });
    const back = modelFromJSON(JSON.parse(JSON.stringify(modelToJSON(m))));
    expect(back.ranges).toEqual({ x: [-1, 8] });
    const bad = { ...modelToJSON(m), ranges: { x: [9, 1] } };
    expect(() => modelFromJSON(bad)).toThrow(/ranges\.x should be \[min, max\]/);
  });
});
