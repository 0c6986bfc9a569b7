/**
 * readHeldOut: held-out rows coded like the training rows. Expected codes are worked by hand from the
 * inline tables; in the penguins case (vega-datasets penguins.json, Gorman, Williams & Fraser 2014) the
 * one row with Sex "." (row 336) lands only in the held-out rows.
 */
import { describe, expect, it } from 'vitest';
import { readHeldOut } from '../../src/notebook/held-out-data.js';
import { watchFit } from '../../src/notebook/fit-display.js';
import { installSink } from '../../src/notebook/display-sink.js';
import { fitBoosting } from '../../src/learn/ensemble/boosting.js';
import { toDataset } from '../../src/table/to-dataset.js';
import { penguinRows } from '../learn/tree/open-data.js';

const train = toDataset([
  { colour: 'red', size: 1, y: 'a' }, { colour: 'blue', size: 2, y: 'b' }, { colour: 'green', size: 3, y: 'c' },
], { target: 'y' }); // colour dictionary sorted: blue 0, green 1, red 2; classes a 0, b 1, c 2

describe('readHeldOut(input, like)', () => {
  it('codes categories and classes with the training dictionaries', () => {
    const held = readHeldOut([{ colour: 'red', size: 5, y: 'c' }, { colour: 'violet', size: 6, y: 'c' }], train);
    expect(held.features.schema.fingerprint).toBe(train.features.schema.fingerprint);
    const colour = held.features.columns[0];
    expect(colour.kind === 'categorical' && Array.from(colour.codes)).toEqual([2, -1]); // red → 2; violet unseen → missing
    expect(held.target).toEqual({ kind: 'class', name: 'y', classes: ['a', 'b', 'c'], codes: Int32Array.of(2, 2) });
    expect(held.weights).toBeNull();
  });

  it('leaves out rows whose target is missing', () => {
    const held = readHeldOut([{ colour: 'red', size: 5, y: null }, { colour: 'blue', size: 6, y: 'a' }, { colour: 'blue', size: 7, y: '' }], train);
    expect(held.features.nRows).toBe(1);
    expect(held.target.kind === 'class' && Array.from(held.target.codes)).toEqual([0]);
    const size = held.features.columns[1];
    expect(size.kind !== 'categorical' && Array.from(size.values)).toEqual([6]);
  });

  it('reads a number target', () => {
    const t = toDataset([{ x: 1, y: 2.5 }, { x: 2, y: 3 }], { target: 'y' });
    expect(readHeldOut([{ x: 3, y: '4.5' }, { x: 4, y: NaN }], t).target).toEqual({ kind: 'number', name: 'y', values: Float64Array.of(4.5) });
  });

  it('names a class the training rows never had, and a missing target column', () => {
    expect(() => readHeldOut([{ colour: 'red', size: 1, y: 'd' }], train)).toThrow('Target column "y": the held-out rows have classes the training rows do not: d.');
    expect(() => readHeldOut([{ colour: 'red', size: 1 }], train)).toThrow('Column "y" is missing from the held-out rows (the target).');
  });
});

describe('watchFit with a watch table', () => {
  it('boosting watches penguins rows with a Sex value the training rows lack', async () => {
    const rows = penguinRows();
    const tr = rows.filter((_, i) => i % 4 !== 0);
    const te = rows.filter((_, i) => i % 4 === 0);
    expect(!tr.some((r) => r.Sex === '.') && te.some((r) => r.Sex === '.')).toBe(true); // row 336 only
    const restore = installSink({ onDisplay: () => undefined });
    try {
      const m = await watchFit('g', 'boosting', (d, o) => fitBoosting(d, o), { data: tr, target: 'Species', rounds: 3, watch: te });
      expect(m.watchLoss).toHaveLength(4);
    } finally {
      restore();
    }
  });
});
