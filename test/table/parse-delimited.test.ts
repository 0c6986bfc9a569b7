import { describe, expect, it } from 'vitest';
import { parseDelimited } from '../../src/table/parse-delimited.js';
import { CoppiceError } from '../../src/errors.js';

// Quoting rules: RFC 4180 (Shafranovich 2005), section 2, rules 5–7.
describe('parseDelimited(text, delimiter, path)', () => {
  it('splits a header and columns of field texts', () => {
    const r = parseDelimited('a,b\n1,2\n3,4\n', ',', 'x.csv');
    expect(r.header).toEqual(['a', 'b']);
    expect(r.columns).toEqual([['1', '3'], ['2', '4']]);
    expect(r.nRows).toBe(2);
  });

  it('keeps commas, line breaks and doubled quotes inside quoted fields (RFC 4180 rules 6, 7)', () => {
    const text = 'id,note,n\n1,"a, b",2\n2,"line one\nline two",3\n3,"say ""hi""",4\n4,x,5\n';
    const r = parseDelimited(text, ',', 'x.csv');
    expect(r.columns).toEqual([['1', '2', '3', '4'], ['a, b', 'line one\nline two', 'say "hi"', 'x'], ['2', '3', '4', '5']]);
  });

  it('counts the lines inside a quoted field when naming a later line', () => {
    expect(() => parseDelimited('id,note\n1,"one\ntwo"\n2\n', ',', 'x.csv')).toThrow(/line 4: 1 field/);
    expect(() => parseDelimited('id,note\r\n1,"one\r\ntwo"\r\n2\r\n', ',', 'x.csv')).toThrow(/line 4: 1 field/);
  });

  it('accepts CRLF and CR line breaks, a final line without a break, and a byte-order mark', () => {
    expect(parseDelimited('\ufeffa,b\r\n1,2\r\n3,4', ',', 'x').columns).toEqual([['1', '3'], ['2', '4']]);
    expect(parseDelimited('a,b\r1,2\r', ',', 'x').columns).toEqual([['1'], ['2']]);
  });

  it('keeps empty fields, including a trailing one', () => {
    expect(parseDelimited('a,b,c\n,,\n1,,\n', ',', 'x').columns).toEqual([['', '1'], ['', ''], ['', '']]);
  });

  it('skips blank lines but counts them for line numbers (common practice)', () => {
    expect(() => parseDelimited('a,b\n\n1,2\n\n3\n', ',', 'x.csv')).toThrow(/line 5: 1 field\(s\), expected 2/);
  });

  it('reads tab-separated text', () => {
    expect(parseDelimited('a\tb\n1\t"x\ty"\n', '\t', 'x.tsv').columns).toEqual([['1'], ['x\ty']]);
  });

  it('rejects a ragged record with its line and field counts', () => {
    const text = 'a,b,c\n1,2,3\n"x\ny",2,3\n4,5\n';
    try {
      parseDelimited(text, ',', 'claims.csv');
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(CoppiceError);
      expect((e as CoppiceError).code).toBe('ragged-row');
      expect((e as Error).message).toBe('"claims.csv", line 5: 2 field(s), expected 3 as in the header.');
    }
    expect(() => parseDelimited('a,b\n1,2,3\n', ',', 'x.csv')).toThrow(/line 2: 3 field\(s\), expected 2/);
  });

  it('rejects a quote that is never closed, naming the line where it opened', () => {
    expect(() => parseDelimited('a,b\n1,2\n3,"open\n4,5\n', ',', 'x.csv')).toThrow(/line 3: a quoted field is never closed/);
  });

  it('rejects text after a closing quote', () => {
    expect(() => parseDelimited('a,b\n"x"y,2\n', ',', 'x.csv')).toThrow(/line 2: unexpected text after a closing quote/);
  });

  it('rejects an empty file, an empty header name and a repeated header name', () => {
    expect(() => parseDelimited('', ',', 'x.csv')).toThrow(/header is missing/);
    expect(() => parseDelimited('a,,c\n1,2,3\n', ',', 'x.csv')).toThrow(/field 2 is empty/);
    expect(() => parseDelimited('a,a\n1,2\n', ',', 'x.csv')).toThrow(/names column "a" twice/);
  });

  it('gives a header with no records for a header-only file', () => {
    expect(parseDelimited('a,b\n', ',', 'x')).toEqual({ header: ['a', 'b'], columns: [[], []], nRows: 0 });
  });

  it('rejects a quote or line break as delimiter', () => {
    expect(() => parseDelimited('a', '"', 'x')).toThrow(/Option delimiter/);
    expect(() => parseDelimited('a', ';;', 'x')).toThrow(/Option delimiter/);
  });
});
