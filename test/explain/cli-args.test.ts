/** parseArgs: the argument conventions of the explain commands (common practice for command lines). */
import { describe, expect, it } from 'vitest';
import { parseArgs } from '../../src/explain/cli-args.js';

describe('parseArgs(command, args, valued, flags)', () => {
  it('reads positionals, --name value, --name=value and flags', () => {
    const p = parseArgs('score', ['m.json', '--out', 'o.csv', 'x.csv', '--keep=a,b', '--strict'], ['out', 'keep'], ['strict']);
    expect(p.positional).toEqual(['m.json', 'x.csv']);
    expect(p.options.get('out')).toBe('o.csv');
    expect(p.options.get('keep')).toBe('a,b');
    expect(p.flags.has('strict')).toBe(true);
  });
  it('rejects unknown options, missing values, repeated options and a value on a flag', () => {
    expect(() => parseArgs('score', ['--nope'], ['out'], [])).toThrow(/unknown option --nope/);
    expect(() => parseArgs('score', ['--out'], ['out'], [])).toThrow(/--out needs a value/);
    expect(() => parseArgs('score', ['--out', 'a', '--out', 'b'], ['out'], [])).toThrow(/given twice/);
    expect(() => parseArgs('score', ['--strict=yes'], [], ['strict'])).toThrow(/takes no value/);
  });
});
