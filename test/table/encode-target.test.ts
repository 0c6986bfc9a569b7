import { describe, expect, it } from 'vitest';
import { encodeTarget, inferTask } from '../../src/table/encode-target.js';

describe('inferTask(name, values)', () => {
  it('is regression for numbers and classification for texts, booleans or a mix', () => {
    expect(inferTask('y', [1, 2.5, null])).toBe('regression');
    expect(inferTask('y', ['a', null])).toBe('classification');
    expect(inferTask('y', [true, false])).toBe('classification');
    expect(inferTask('y', [1, 'a'])).toBe('classification');
  });
  it('refuses dates and objects', () => {
    expect(() => inferTask('when', ['2012-01-01'])).toThrow('Target column "when": dates cannot be a target; use a number or a label.');
    expect(() => inferTask('y', [{}])).toThrow(/neither numbers, texts nor booleans/);
  });
});

describe('encodeTarget(name, values, task, rows)', () => {
  it('sorts classes numerically when every label is a number, else by string value', () => {
    const num = encodeTarget('y', [10, 9, 10], 'classification', null);
    expect(num).toEqual({ kind: 'class', name: 'y', classes: ['9', '10'], codes: Int32Array.of(1, 0, 1) });
    const txt = encodeTarget('y', ['b', 'B', 'a'], 'classification', null);
    expect(txt.kind === 'class' && txt.classes).toEqual(['B', 'a', 'b']);
  });

  it('reads only the rows asked for, naming the original row in errors', () => {
    expect(encodeTarget('y', [1, null, 3], 'regression', [0, 2])).toEqual({ kind: 'number', name: 'y', values: Float64Array.of(1, 3) });
    expect(() => encodeTarget('y', [1, null, 'x'], 'regression', [0, 2])).toThrow('Target column "y": regression needs numbers, but row 2 holds "x".');
  });

  it('accepts number texts and booleans for regression', () => {
    expect(encodeTarget('y', ['1.5', true], 'regression', null)).toEqual({ kind: 'number', name: 'y', values: Float64Array.of(1.5, 1) });
  });
});
