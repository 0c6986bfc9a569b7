import { describe, expect, it } from 'vitest';
import { excerpt, splitCell } from '../../src/notebook/magic-parse.js';
import { CoppiceError } from '../../src/errors.js';

function failure(fn: () => unknown): CoppiceError {
  try {
    fn();
  } catch (err) {
    if (err instanceof CoppiceError) return err;
    throw err;
  }
  throw new Error('expected a CoppiceError');
}

describe('splitCell(source)', () => {
  it('returns code lines unchanged when there is no magic', () => {
    expect(splitCell('const a = 1;\nconst b = a % 2;')).toEqual([
      { kind: 'code', lineIndex: 0, text: 'const a = 1;' },
      { kind: 'code', lineIndex: 1, text: 'const b = a % 2;' },
    ]);
  });

  it('leaves a remainder operator continued on the next line alone', () => {
    const parts = splitCell('const r = 7\n  % 3;');
    expect(parts.every((p) => p.kind === 'code')).toBe(true);
  });

  it('finds a line magic with its arguments and their column', () => {
    const [m, code] = splitCell('%extract  claims data/claims.csv\nclaims');
    expect(m).toMatchObject({ kind: 'magic', call: { name: 'extract', cell: false, args: 'claims data/claims.csv', argsAt: { line: 1, column: 11 }, nameAt: { line: 1, column: 2 }, body: [] } });
    expect(code).toEqual({ kind: 'code', lineIndex: 1, text: 'claims' });
  });

  it('takes the rest of the cell as the body of a cell magic', () => {
    const parts = splitCell('\n%%fit m tree\ndata: t\ntarget: y');
    expect(parts[0]).toEqual({ kind: 'code', lineIndex: 0, text: '' });
    expect(parts[1]).toMatchObject({ kind: 'magic', call: { name: 'fit', cell: true, args: 'm tree', lineIndex: 1, body: ['data: t', 'target: y'] } });
    expect(parts).toHaveLength(2);
  });

  it('rejects a cell magic below the first line, with a caret under it', () => {
    const e = failure(() => splitCell('const a = 1;\n%%fit m tree'));
    expect(e.code).toBe('bad-magic');
    expect(e.message).toBe('Magic at line 2, column 1: cell magic %%fit must be on the first line of the cell.\n  %%fit m tree\n  ^^^^^');
  });

  it('rejects an indented magic on the first line', () => {
    const e = failure(() => splitCell('  %extract a b'));
    expect(e.message).toContain('line 1, column 3: a magic must start at the beginning of its line');
    expect(e.message).toContain('\n    %extract a b\n    ^');
  });
});

describe('excerpt(line, column, length)', () => {
  it('puts the caret under the given columns', () => {
    expect(excerpt('depht: 4', 1, 5)).toBe('  depht: 4\n  ^^^^^');
    expect(excerpt('a\tb', 3, 1)).toBe('  a b\n    ^');
  });
});
