/**
 * Learning curves straight from fitted boosting and AdaBoost models (seeded packhouse crates): the rows are
 * the model's own per-round figures, the best round is marked only when rows were watched.
 */
import { describe, expect, it } from 'vitest';
import { chartBoostingCurve, learningCurveRows } from '../../src/charts/boosting-curve.js';
import { fitAdaBoost } from '../../src/learn/ensemble/adaboost.js';
import { fitBoosting } from '../../src/learn/ensemble/boosting.js';
import { crateDataset } from './packhouse-data.js';
import { checkSpec } from './validate-spec.js';

type Spec = { layer: { mark: { type: string; strokeDash?: unknown }; data?: { values: { round: number }[] }; encoding?: { y?: { title?: string } } }[]; title: { subtitle?: string | string[] } };

const train = crateDataset(300, 'grade'), watch = crateDataset(200, 'grade', 2024, 300);

describe('learningCurveRows(model) / chartBoostingCurve(model, options)', () => {
  const gb = fitBoosting(train, { rounds: 40, learningRate: 0.3, depthLimit: 2, watch, patience: 8, seed: 1 });

  it('boosting: one training and one watched row per recorded round, from round 0 (the starting model)', () => {
    const rows = learningCurveRows(gb);
    const training = rows.filter((r) => r.set === 'training'), watched = rows.filter((r) => r.set === 'watched');
    expect(training.map((r) => r.loss)).toEqual([...gb.trainLoss]);
    expect(watched.map((r) => r.loss)).toEqual([...gb.watchLoss]);
    expect(training[0].round).toBe(0);
    expect(training.at(-1)!.round).toBe(gb.trainLoss.length - 1);
  });

  it('boosting: marks the model\'s best round, titles the axis by the loss, and validates', async () => {
    const spec = chartBoostingCurve(gb) as unknown as Spec;
    const rule = spec.layer.find((l) => l.mark.type === 'rule')!;
    expect(rule.data!.values[0].round).toBe(gb.bestRound);
    expect(spec.layer[0].encoding!.y!.title).toBe('Multiclass log loss (nats)');
    const { schema, warnings } = await checkSpec(spec as never);
    expect(schema).toEqual([]);
    expect(warnings).toEqual([]);
  });

  it('boosting without watched rows: no best-round mark, and the subtitle says so', () => {
    const plain = fitBoosting(crateDataset(200, 'shelf'), { rounds: 10, depthLimit: 2 });
    const spec = chartBoostingCurve(plain) as unknown as Spec;
    expect(spec.layer.some((l) => l.mark.type === 'rule')).toBe(false);
    expect(String(spec.title.subtitle)).toContain('no watched rows');
    expect(spec.layer[0].encoding!.y!.title).toBe('Mean squared error');
    expect(learningCurveRows(plain).every((r) => r.set === 'training')).toBe(true);
  });

  it('adaboost: training and watched error of the vote per round; no watched rows when none were recorded', async () => {
    const ada = fitAdaBoost(train, { rounds: 8, depthLimit: 1, watch, seed: 2 });
    const rows = learningCurveRows(ada);
    expect(rows.filter((r) => r.set === 'training').map((r) => r.loss)).toEqual(ada.rounds.map((r) => r.trainError));
    expect(rows.filter((r) => r.set === 'watched').map((r) => r.loss)).toEqual(ada.rounds.map((r) => r.watchError));
    const spec = chartBoostingCurve(ada) as unknown as Spec;
    expect(spec.layer[0].encoding!.y!.title).toMatch(/^Error rate/);
    expect((await checkSpec(spec as never)).warnings).toEqual([]);
    const alone = fitAdaBoost(train, { rounds: 3, depthLimit: 1, seed: 2 });
    expect(learningCurveRows(alone).some((r) => r.set === 'watched')).toBe(false);
  });

  it('options override the model-derived defaults', () => {
    const spec = chartBoostingCurve(gb, { lossName: 'deviance', subtitle: 'mine' }) as unknown as Spec;
    expect(spec.layer[0].encoding!.y!.title).toBe('Deviance');
    expect(spec.title.subtitle).toBe('mine');
  });
});
