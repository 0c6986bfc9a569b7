import { describe, expect, it } from 'vitest';
import * as aq from 'arquero';
import { predict, predictedLabels } from '../../src/assess/predict-table.js';
import { toDataset } from '../../src/table/to-dataset.js';
import { fitTree } from '../../src/learn/index.js';

// PlayTennis (Mitchell 1997, Machine Learning, Table 3.2).
const tennis = aq.table({
  outlook: ['sunny', 'sunny', 'overcast', 'rain', 'rain', 'rain', 'overcast', 'sunny', 'sunny', 'rain', 'sunny', 'overcast', 'overcast', 'rain'],
  humidity: ['high', 'high', 'high', 'high', 'normal', 'normal', 'normal', 'high', 'normal', 'normal', 'normal', 'high', 'normal', 'high'],
  wind: ['weak', 'strong', 'weak', 'weak', 'weak', 'strong', 'strong', 'weak', 'weak', 'weak', 'strong', 'strong', 'weak', 'strong'],
  play: ['no', 'no', 'yes', 'yes', 'yes', 'no', 'yes', 'no', 'yes', 'yes', 'yes', 'yes', 'yes', 'no'],
});

describe('predict(model, table)', () => {
  const model = fitTree(toDataset(tennis, { target: 'play' }), { criterion: 'entropy' });

  it('predicts the training rows of PlayTennis exactly (the ID3 tree is consistent with them)', () => {
    const p = predict(model, tennis);
    expect(p.report.clean).toBe(true);
    expect(predictedLabels(p)).toEqual(tennis.array('play'));
  });

  it('reports a missing column and an unseen category instead of throwing', () => {
    const fresh = aq.table({ outlook: ['foggy', 'overcast'], humidity: ['high', 'high'] });
    const p = predict(model, fresh);
    expect(p.report.clean).toBe(false);
    expect(p.report.missingColumns.map((m) => m.column)).toEqual(['wind']);
    expect(p.report.unseen[0]).toMatchObject({ column: 'outlook', rows: 1 });
    expect(p.n).toBe(2);
    expect(predictedLabels(p)[1]).toBe('yes'); // overcast -> yes in the ID3 tree
  });
});
