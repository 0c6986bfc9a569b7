import { describe, expect, it } from 'vitest';
import { describeSchemaChange, diffSchemas } from '../../src/notebook/compare-schema.js';
import { profileColumn, type ColumnProfile } from '../../src/notebook/record-profile.js';

function extract(cols: Record<string, unknown[]>) {
  const profiles: Record<string, ColumnProfile> = {};
  for (const [k, v] of Object.entries(cols)) profiles[k] = profileColumn(v);
  return { columns: Object.keys(cols).map((name) => ({ name, kind: profiles[name].kind })), profiles };
}

// Expected changes are read off the inline tables by hand.
describe('diffSchemas(baseline, current)', () => {
  it('reports added, removed and retyped columns and new and lost categories', () => {
    const a = extract({ depot: ['n', 's', 'n'], km: [1, 2, 3], code: [1, 2, 3], old: [1, 1, 1] });
    const b = extract({ depot: ['n', 'e', 'w', 'e'], km: [1, 2, 3, 4], code: ['A1', 'B2', 'C3', 'D4'], fresh: [true, false, true, true] });
    expect(diffSchemas(a, b)).toEqual([
      { column: 'depot', change: 'new-categories', categories: ['e', 'w'], count: 2, share: 0.75 },
      { column: 'depot', change: 'lost-categories', categories: ['s'], count: 1 },
      { column: 'code', change: 'kind', before: 'numeric', after: 'categorical' },
      { column: 'fresh', change: 'added', after: 'boolean' },
      { column: 'old', change: 'removed', before: 'numeric' },
    ]);
  });

  it('reports nothing for identical schemas and for empty tables', () => {
    const a = extract({ x: [1, 2], y: ['a', 'b'] });
    expect(diffSchemas(a, a)).toEqual([]);
    expect(diffSchemas(extract({}), extract({}))).toEqual([]);
  });
});

describe('describeSchemaChange(change)', () => {
  it('words each kind of change, quoting category labels', () => {
    expect(describeSchemaChange({ column: 'x', change: 'added', after: 'numeric' })).toBe('new column x (numeric)');
    expect(describeSchemaChange({ column: 'x', change: 'removed', before: 'numeric' })).toBe('column x is gone (was numeric)');
    expect(describeSchemaChange({ column: 'c', change: 'new-categories', categories: ['<script>'], count: 1, share: 0.04 }))
      .toBe('column c has new categories "<script>" (4.0% of rows)');
    expect(describeSchemaChange({ column: 'c', change: 'lost-categories', categories: ['a'], count: 30 })).toBe('column c lost categories "a", … 30 in all');
  });
});
