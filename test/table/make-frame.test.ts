import { describe, expect, it } from 'vitest';
import { columnSchemaOf, makeFrame } from '../../src/table/make-frame.js';
import { schemaFingerprint } from '../../src/table/fingerprint.js';

describe('makeFrame(nRows, columns)', () => {
  it('derives the schema and its fingerprint', () => {
    const f = makeFrame(2, [
      { name: 'x', kind: 'numeric', values: Float64Array.of(1, 2) },
      { name: 'c', kind: 'categorical', codes: Int32Array.of(0, -1), categories: ['a'] },
    ]);
    expect(f.schema.columns).toEqual([{ name: 'x', kind: 'numeric' }, { name: 'c', kind: 'categorical', categories: ['a'] }]);
    expect(f.schema.fingerprint).toBe(schemaFingerprint(f.schema.columns));
  });

  it('refuses repeated names and wrong lengths', () => {
    const x = { name: 'x', kind: 'numeric' as const, values: Float64Array.of(1) };
    expect(() => makeFrame(1, [x, x])).toThrow(/unique column names/);
    expect(() => makeFrame(2, [x])).toThrow(/Option column x = 1 is invalid: expected 2 values/);
  });
});

describe('columnSchemaOf(column)', () => {
  it('keeps a date origin', () => {
    const origin = { source: 'd', part: 'year' as const };
    expect(columnSchemaOf({ name: 'd.year', kind: 'numeric', values: new Float64Array(0), origin })).toEqual({ name: 'd.year', kind: 'numeric', origin });
  });
});
