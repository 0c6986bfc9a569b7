import { describe, expect, it } from 'vitest';
import { tableFromTexts, tableFromValues } from '../../src/table/columns-table.js';

describe('tableFromTexts(names, cells, options)', () => {
  it('types each column and applies missingText after trimming', () => {
    const t = tableFromTexts(['n', 's'], [['1', ' NA ', '3'], ['x', 'NA', null]], { missingText: ['', 'NA'] });
    expect(t.array('n')).toEqual([1, null, 3]);
    expect(t.array('s')).toEqual(['x', null, null]);
  });
  it('refuses a bad missingText', () => {
    expect(() => tableFromTexts(['a'], [['1']], { missingText: 'NA' as never })).toThrow(/Option missingText/);
  });
});

describe('tableFromValues(names, values, options)', () => {
  it('turns all-ISO text columns into Dates unless kept as text', () => {
    expect(tableFromValues(['d'], [['1970-01-02', undefined]]).array('d')).toEqual([new Date(86_400_000), null]);
    expect(tableFromValues(['d'], [['1970-01-02']], { keepText: ['d'] }).array('d')).toEqual(['1970-01-02']);
    expect(tableFromValues(['d'], [['1970-01-02', 'later']]).array('d')).toEqual(['1970-01-02', 'later']);
  });
});
