/**
 * Progress of a fit fed by the learner's own callback (src/learn/ensemble/progress.ts). The figures shown
 * are compared with those the fitted model keeps (its loss curves), on the Palmer penguins data
 * (vega-datasets penguins.json; Gorman, Williams & Fraser 2014).
 */
import { describe, expect, it } from 'vitest';
import { progressOptions, roundScores, treeScores } from '../../src/notebook/fit-progress.js';
import { watchFit } from '../../src/notebook/fit-display.js';
import { learnerTable } from '../../src/notebook/magic-learners.js';
import { installSink } from '../../src/notebook/display-sink.js';
import { formatCell } from '../../src/notebook/format-cell.js';
import type { DisplayMessage } from '../../src/notebook/display-types.js';
import type { Progress } from '../../src/notebook/progress.js';
import { fitBoosting } from '../../src/learn/ensemble/boosting.js';
import { fitForest } from '../../src/learn/ensemble/forest.js';
import { fitAdaBoost } from '../../src/learn/ensemble/adaboost.js';
import type { BoostingModel } from '../../src/learn/ensemble/models.js';
import { penguinRows } from '../learn/tree/open-data.js';
import { toDataset } from '../../src/table/to-dataset.js';

const rows = penguinRows().map((r) => ({ ...r, Sex: r.Sex === '.' ? null : r.Sex }));
const train = rows.filter((_, i) => i % 4 !== 0);
const test = rows.filter((_, i) => i % 4 === 0);

function recorder(): { progress: Progress; steps: [number, Record<string, number>, number | undefined][] } {
  const steps: [number, Record<string, number>, number | undefined][] = [];
  return { steps, progress: { step: (d, s = {}, t) => steps.push([d, { ...s }, t]), finish: () => undefined, fail: () => undefined } };
}

describe('roundScores(info, score) and treeScores(info)', () => {
  it('names the training and watched measure, and leaves out what is NaN', () => {
    expect(roundScores({ round: 3, total: 10, trainLoss: 0.5, watchLoss: 0.6, bestRound: 2, last: false }, 'loss'))
      .toEqual({ 'training loss': 0.5, 'watched loss': 0.6, 'best round': 2 });
    expect(roundScores({ round: 3, total: 10, trainLoss: 0.1, watchLoss: NaN, bestRound: 3, last: false }, 'error'))
      .toEqual({ 'training error': 0.1 });
    expect(treeScores({ done: 1, total: 5, oobError: NaN })).toEqual({});
    expect(treeScores({ done: 4, total: 5, oobError: 0.25 })).toEqual({ 'out-of-bag error': 0.25 });
  });
});

describe('progressOptions(rule, progress, given)', () => {
  it('reports every boosting round with the losses the model keeps', () => {
    const { progress, steps } = recorder();
    const options = progressOptions(learnerTable.boosting, progress);
    expect(Object.keys(options)).toEqual(['onRound']);
    const data = toDataset(train, { target: 'Species' });
    const watch = toDataset(test, { target: 'Species' });
    const model = fitBoosting(data, { rounds: 8, watch, ...options });
    expect(steps).toEqual(Array.from({ length: 8 }, (_, i) => [i + 1, {
      'training loss': model.trainLoss[i + 1], 'watched loss': model.watchLoss[i + 1], 'best round': expect.any(Number),
    }, 8]));
  });

  it('reports every forest tree with the out-of-bag error the model keeps', () => {
    const { progress, steps } = recorder();
    const options = progressOptions(learnerTable.forest, progress);
    expect(Object.keys(options)).toEqual(['onTree']);
    const model = fitForest(toDataset(train, { target: 'Species' }), { size: 6, seed: 3, ...options });
    expect(steps.map((s) => s[0])).toEqual([1, 2, 3, 4, 5, 6]);
    expect(steps.every((s) => s[2] === 6)).toBe(true);
    steps.forEach(([done, scores]) => {
      const oob = model.oobCurve[done - 1].error;
      expect(scores).toEqual(Number.isNaN(oob) ? {} : { 'out-of-bag error': oob });
    });
  });

  it('reports AdaBoost rounds with the training and watched error', () => {
    const { progress, steps } = recorder();
    const model = fitAdaBoost(toDataset(train, { target: 'Species' }), { rounds: 4, depthLimit: 2, watch: toDataset(test, { target: 'Species' }), ...progressOptions(learnerTable.adaboost, progress) });
    expect(steps.map((s) => s[0])).toEqual(model.rounds.map((r) => r.round));
    expect(steps.map((s) => s[1]['training error'])).toEqual(model.rounds.map((r) => r.trainError));
    expect(steps.map((s) => s[1]['watched error'])).toEqual(model.rounds.map((r) => r.watchError));
  });

  it('passes nothing for a learner without a callback, or one that does not accept it', () => {
    const { progress } = recorder();
    expect(progressOptions(learnerTable.tree, progress)).toEqual({});
    expect(progressOptions(undefined, progress)).toEqual({});
    expect(progressOptions({ fn: 'fitSomethingElse', settings: {}, progress: { option: 'onRound', unit: 'round', score: 'loss' } }, progress)).toEqual({});
  });
});

describe('watchFit(name, learner, fit, request) with a progress callback', () => {
  it('shows round of total with the training and watched loss, then the summary', async () => {
    const seen: DisplayMessage[] = [];
    const mine: number[] = [];
    const restore = installSink({ onDisplay: (m) => seen.push(m) });
    let model: BoostingModel;
    try {
      model = await watchFit('g', 'boosting', (d, o) => fitBoosting(d, o), {
        data: train, target: 'Species', rounds: 15, learningRate: 0.3, watch: test, onRound: (i: { round: number }) => mine.push(i.round),
      });
    } finally {
      restore();
    }
    expect(mine).toEqual(Array.from({ length: 15 }, (_, i) => i + 1)); // the caller's own callback still runs
    const lines = seen.map((m) => String(m.data['text/plain']));
    const final = lines.find((l) => l.includes('round 15 of 15'));
    const t = model.trainLoss[15], w = model.watchLoss[15];
    expect(final).toBe(`fitting g (boosting): round 15 of 15 · training loss ${formatCell(t)} · watched loss ${formatCell(w)} · best round ${model.bestRound} · ${final!.split(' · ').slice(-1)[0]}`);
    expect(lines.at(-1)).toMatch(/^g: boosting model\n/);
  });
});
