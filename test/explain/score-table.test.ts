/**
 * scoreTable / training ranges / output records: the scoring report on small inline tables.
 */
import { describe, expect, it } from 'vitest';
import { scoreColumns, toCsvText, toJsonText } from '../../src/explain/score-records.js';
import { scoreTable } from '../../src/explain/score-table.js';
import { featureRangesOf, trainingRangesOf, withTrainingRanges } from '../../src/explain/training-ranges.js';
import { modelFromJSON, modelToJSON } from '../../src/learn/model-file.js';
import { predictFrame } from '../../src/learn/predict.js';
import { fitTree } from '../../src/learn/tree/fit-tree.js';
import { orchard } from './fixtures.js';

const train = orchard(150, 51, 'number');
const model = fitTree(train, { depthLimit: 4 });

describe('featureRangesOf(frame) / withTrainingRanges(model, frame)', () => {
  it('records [min, max] of numeric and boolean columns, skips categories and NaN, and survives the model file', () => {
    const f = orchard(4, 2, 'number').features;
    const r = featureRangesOf(f);
    expect(Object.keys(r)).toEqual(['storage_hours', 'bruised', 'humidity']);
    const h = Array.from((f.columns[0] as { values: Float64Array }).values);
    expect(r.storage_hours).toEqual([Math.min(...h), Math.max(...h)]);
    const kept = withTrainingRanges(model, train.features);
    const back = modelFromJSON(JSON.parse(JSON.stringify(modelToJSON(kept))));
    expect(trainingRangesOf(back)).toEqual(featureRangesOf(train.features));
    expect(trainingRangesOf({ ...model, ranges: undefined })).toBeNull();
    expect(trainingRangesOf(model)).toEqual(featureRangesOf(train.features)); // fitTree records the ranges itself
  });
  it('rejects a frame whose columns are not the model features', () => {
    const other = { ...train.features, columns: [...train.features.columns].reverse() };
    expect(() => withTrainingRanges(model, other)).toThrow(/does not match the model/);
  });
});

describe('scoreTable(model, rows)', () => {
  const kept = withTrainingRanges(model, train.features);
  const rows = [
    { storage_hours: 10, variety: 'Elstar', bruised: 0, humidity: 80 },
    { storage_hours: -5, variety: 'Fuji', bruised: 1, humidity: 'damp' },
    { storage_hours: 500, variety: null, bruised: 0, humidity: null, extra: 1 },
  ];

  it('predicts like predictFrame on the aligned frame and notes each unusual row', () => {
    const s = scoreTable(kept, rows);
    expect(Array.from(s.predictions.value)).toEqual(Array.from(predictFrame(kept, s.frame).value));
    expect(s.notes).toEqual(['', 'storage_hours below range; unseen variety', 'storage_hours above range']);
    expect(s.rowsWithNotes).toBe(2);
    const [min, max] = featureRangesOf(train.features).storage_hours;
    expect(s.ranges).toEqual([{ column: 'storage_hours', min, max, below: 1, above: 1 }]);
    expect(s.align.typeChanges.map((t) => t.column)).toEqual(['humidity']);
    expect(s.align.extraColumns).toEqual(['extra']);
  });

  it('a value the kind cannot take is noted on its row', () => {
    const s = scoreTable(kept, [{ storage_hours: Infinity, variety: 'Elstar', bruised: 0, humidity: 80 }]);
    expect(s.notes).toEqual(['unreadable storage_hours']);
  });

  it('without recorded ranges: ranges null, other notes kept', () => {
    const s = scoreTable({ ...model, ranges: undefined }, rows);
    expect(s.ranges).toBeNull();
    expect(s.notes[1]).toBe('unseen variety');
  });

  it('an empty table scores to nothing', () => {
    const s = scoreTable(kept, []);
    expect(s.predictions.n).toBe(0);
    expect(s.rowsWithNotes).toBe(0);
  });
});

describe('scoreColumns / toCsvText / toJsonText', () => {
  const cls = orchard(100, 52, 'binary');
  const tree = fitTree(cls, { depthLimit: 2 });
  const p = predictFrame(tree, orchard(2, 53, 'binary').features);
  const cols = scoreColumns(tree, p, ['', 'a "quoted", note'], [['id', ['x1', 'x,2']]]);

  it('orders kept columns, prediction, class probabilities, notes', () => {
    expect(cols.names).toEqual(['id', 'predicted_condition', 'p_keep', 'p_discard', 'notes']);
  });
  it('CSV quotes fields with commas or quotes (RFC 4180 §2, rules 6–7)', () => {
    const lines = toCsvText(cols).trim().split('\n');
    expect(lines[2].startsWith('"x,2",')).toBe(true);
    expect(lines[2].endsWith(',"a ""quoted"", note"')).toBe(true);
  });
  it('JSON gives one record per row', () => {
    const rows = JSON.parse(toJsonText(cols));
    expect(rows).toHaveLength(2);
    expect(rows[1].id).toBe('x,2');
    expect(rows[0].p_keep + rows[0].p_discard).toBeCloseTo(1, 12);
  });
});
