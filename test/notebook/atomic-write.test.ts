import { mkdtempSync, readdirSync, readFileSync, writeFileSync, chmodSync, mkdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { isAtomicTemp, writeAtomic, writeJsonAtomic } from '../../src/notebook/atomic-write.js';

describe('writeAtomic(path, content)', () => {
  it('creates folders, writes the content and leaves no temporary file', () => {
    const dir = mkdtempSync(join(tmpdir(), 'coppice-atomic-'));
    const file = join(dir, 'a', 'b', 'out.txt');
    writeAtomic(file, 'hello');
    expect(readFileSync(file, 'utf8')).toBe('hello');
    writeAtomic(file, new Uint8Array([104, 105]));
    expect(readFileSync(file, 'utf8')).toBe('hi');
    expect(readdirSync(join(dir, 'a', 'b'))).toEqual(['out.txt']);
  });

  it('replaces a file whole: the old content stays if the write fails', () => {
    const dir = mkdtempSync(join(tmpdir(), 'coppice-atomic-'));
    const file = join(dir, 'keep.json');
    writeJsonAtomic(file, { v: 1 });
    expect(JSON.parse(readFileSync(file, 'utf8'))).toEqual({ v: 1 });
    // make the rename fail: the target is now a non-empty folder
    const blocked = join(dir, 'blocked');
    mkdirSync(join(blocked, 'inside'), { recursive: true });
    expect(() => writeAtomic(blocked, 'x')).toThrow();
    expect(readdirSync(dir).filter(isAtomicTemp)).toEqual([]); // the temporary file was removed
    expect(JSON.parse(readFileSync(file, 'utf8'))).toEqual({ v: 1 });
  });

  it('fails cleanly in a read-only folder', () => {
    if (process.getuid?.() === 0) return; // root ignores folder permissions
    const dir = mkdtempSync(join(tmpdir(), 'coppice-atomic-'));
    writeFileSync(join(dir, 'x.txt'), 'old');
    chmodSync(dir, 0o555);
    try {
      expect(() => writeAtomic(join(dir, 'x.txt'), 'new')).toThrow();
      expect(readFileSync(join(dir, 'x.txt'), 'utf8')).toBe('old');
    } finally { chmodSync(dir, 0o755); }
  });
});

describe('isAtomicTemp(name)', () => {
  it('recognises the temporary names writeAtomic uses', () => {
    expect(isAtomicTemp('.run.json.1234.0.tmp')).toBe(true);
    expect(isAtomicTemp('run.json')).toBe(false);
  });
});
