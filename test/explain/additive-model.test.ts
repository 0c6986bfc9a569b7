/**
 * additiveModelOf: the additive form reproduces each learner's own raw output (summing the members'
 * leaf values plus the base), and says what the output is.
 */
import { describe, expect, it } from 'vitest';
import { additiveModelOf } from '../../src/explain/additive-model.js';
import { rawOutputsOf } from '../../src/explain/predict-model.js';
import { fitAdaBoost } from '../../src/learn/ensemble/adaboost.js';
import { fitBoosting } from '../../src/learn/ensemble/boosting.js';
import { fitForest } from '../../src/learn/ensemble/forest.js';
import { leafOf } from '../../src/learn/flat-tree.js';
import type { ModelHeader } from '../../src/learn/model.js';
import { rowSourceOf } from '../../src/learn/tree/row-source.js';
import { fitTree } from '../../src/learn/tree/fit-tree.js';
import { orchard } from './fixtures.js';

function formOutputs(model: ModelHeader, frame = orchard(50, 1, 'class').features): [Float64Array, Float64Array] {
  const form = additiveModelOf(model);
  const src = rowSourceOf(frame), K = form.nOutputs;
  const out = new Float64Array(frame.nRows * K);
  for (let i = 0; i < frame.nRows; i++) {
    for (let k = 0; k < K; k++) out[i * K + k] = form.base[k];
    for (const m of form.members) {
      const l = leafOf(m.tree, src, i);
      for (let k = 0; k < m.width; k++) out[i * K + m.at + k] += m.values[l * m.width + k];
    }
  }
  return [out, rawOutputsOf(model, frame)];
}

describe('additiveModelOf(model)', () => {
  const cls = orchard(200, 2, 'class');
  it('forest (vote) and AdaBoost: members add one-hot votes weighted 1/m or α/Σα (ESL Algorithm 10.1 step 3)', () => {
    for (const model of [fitForest(cls, { size: 7, seed: 1, combine: 'vote' }), fitAdaBoost(cls, { rounds: 6 })]) {
      const [a, b] = formOutputs(model);
      for (let j = 0; j < a.length; j++) expect(a[j]).toBeCloseTo(b[j], 12);
    }
    expect(additiveModelOf(fitAdaBoost(cls, { rounds: 3 })).outputMeaning).toBe('share of the weighted vote');
  });

  it('multiclass boosting: tree t adds into output t mod K; base = F_0 (Friedman 2001, Algorithm 6)', () => {
    const gb = fitBoosting(cls, { rounds: 5, depthLimit: 2 });
    const form = additiveModelOf(gb);
    expect(form.members.map((m) => m.at)).toEqual([0, 1, 2, 0, 1, 2, 0, 1, 2, 0, 1, 2, 0, 1, 2]);
    expect(Array.from(form.base)).toEqual(gb.initial);
    expect(form.link).toBe('softmax');
    const [a, b] = formOutputs(gb);
    for (let j = 0; j < a.length; j++) expect(a[j]).toBeCloseTo(b[j], 12);
  });

  it('names outputs: classes for probabilities, the second class for a logistic margin', () => {
    expect(additiveModelOf(fitTree(cls, { depthLimit: 2 })).outputNames).toEqual(['fresh', 'watch', 'spoiled']);
    const bin = orchard(200, 3, 'binary');
    const form = additiveModelOf(fitBoosting(bin, { rounds: 3 }));
    expect(form.outputNames).toEqual(['discard']);
    expect(form.outputMeaning).toBe('log-odds (raw score)');
  });

  it('refuses a model kind it cannot write additively', () => {
    const fake = { ...fitTree(cls, { depthLimit: 1 }), kind: 'stack' } as unknown as ModelHeader;
    expect(() => additiveModelOf(fake)).toThrow(/kind "stack".*not supported/);
  });
});
