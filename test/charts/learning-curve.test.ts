import { describe, expect, it } from 'vitest';
import { chartLearningCurve, type LearningCurveRow } from '../../src/charts/learning-curve.js';

type Layer = { mark: { type: string; strokeDash?: unknown; align?: string; dx?: number }; encoding?: { x?: { scale?: { domain?: number[]; nice?: boolean } } } };
type Spec = { layer: Layer[]; title: { subtitle?: string | string[] } };

function curve(last: number, first = 1): LearningCurveRow[] {
  const rows: LearningCurveRow[] = [];
  for (let r = first; r <= last; r++) rows.push({ round: r, set: 'training', loss: 1 / r }, { round: r, set: 'watched', loss: 1 / r + 0.1 });
  return rows;
}

describe('chartLearningCurve(rows, { bestRound })', () => {
  it('x-axis runs from the first to the last round exactly (no rounding out)', () => {
    const spec = chartLearningCurve(curve(173)) as unknown as Spec;
    expect(spec.layer[0].encoding!.x!.scale).toEqual({ domain: [1, 173], nice: false, zero: false });
  });

  it('the best-round rule is solid (the training line is the dashed one) and the subtitle says grey line', () => {
    const spec = chartLearningCurve(curve(50), { bestRound: 10 }) as unknown as Spec;
    const rule = spec.layer.find((l) => l.mark.type === 'rule')!;
    expect(rule.mark.strokeDash).toBeUndefined();
    expect(String(spec.title.subtitle)).toContain('grey line marks the best round');
    expect(String(spec.title.subtitle)).not.toContain('dashed');
  });

  it('puts the label right of the rule, or left of it when the best round is in the right third', () => {
    const text = (best: number) => (chartLearningCurve(curve(90), { bestRound: best }) as unknown as Spec).layer.find((l) => l.mark.type === 'text')!.mark;
    expect(text(30)).toMatchObject({ align: 'left', dx: 5 });
    expect(text(60)).toMatchObject({ align: 'left' }); // (60 − 1)/89 = 0.66 < 2/3
    expect(text(61)).toMatchObject({ align: 'right', dx: -5 }); // (61 − 1)/89 = 0.67 > 2/3
  });

  it('a best round outside the recorded rounds widens the x domain to show it', () => {
    const spec = chartLearningCurve(curve(20, 5), { bestRound: 2 }) as unknown as Spec;
    expect(spec.layer[0].encoding!.x!.scale!.domain).toEqual([2, 20]);
  });

  it('training rows only: the subtitle does not promise watched rows; a single round has no fixed domain', () => {
    const spec = chartLearningCurve([{ round: 1, set: 'training', loss: 0.5 }]) as unknown as Spec;
    expect(String(spec.title.subtitle)).toContain('no watched rows');
    expect(spec.layer[0].encoding!.x!.scale).toEqual({ zero: false });
  });
});
