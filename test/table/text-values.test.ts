import { describe, expect, it } from 'vitest';
import { isNumberText, textKind, typeTextCells } from '../../src/table/text-values.js';

describe('textKind(cells)', () => {
  it('types a column on every cell', () => {
    expect(textKind(['1', null, '-2.5e3', ' 7 '])).toBe('number');
    expect(textKind(['true', 'FALSE', null])).toBe('boolean');
    expect(textKind(['2012-01-01', '2012-01-02T10:00'])).toBe('date');
    expect(textKind(['1', '2012-01-01'])).toBe('text');
    expect(textKind(['2012-01-01', '1'])).toBe('text');
    expect(textKind(['1', 'x'])).toBe('text');
    expect(textKind([null, null])).toBe('missing');
    expect(textKind([])).toBe('missing');
  });

  it('looks past the first thousand cells (a late text keeps the column as text)', () => {
    const cells: string[] = Array.from({ length: 5000 }, (_, i) => String(i));
    cells.push('n/a');
    expect(textKind(cells)).toBe('text');
  });
});

describe('isNumberText(text)', () => {
  it('accepts decimal numbers and NaN/Infinity, not hex, blanks or thousands separators', () => {
    for (const t of ['0', '-1', '+.5', '1.', '1e-3', 'NaN', '-Infinity']) expect(isNumberText(t)).toBe(true);
    for (const t of ['0x1f', '', ' ', '1,000', '1.2.3', 'e5']) expect(isNumberText(t)).toBe(false);
  });
});

describe('typeTextCells(cells, kind)', () => {
  it('converts cells and keeps missing as null', () => {
    expect(typeTextCells(['1.5', null], 'number')).toEqual([1.5, null]);
    expect(typeTextCells(['True', 'false', null], 'boolean')).toEqual([true, false, null]);
    expect(typeTextCells(['1970-01-02', null], 'date')).toEqual([new Date(86_400_000), null]);
    expect(typeTextCells(['a', null], 'text')).toEqual(['a', null]);
  });
});
