/**
 * Atomic file writes: the content goes to a temporary file beside the target (same folder, so the same file
 * system), is flushed to disk, then renamed over the target. A reader sees the old file or the new one, never
 * half of either; an interrupted write leaves at most a temporary file named `.<name>.<pid>.<n>.tmp`, which
 * `isAtomicTemp` recognises.
 */
import { closeSync, fsyncSync, mkdirSync, openSync, renameSync, rmSync, writeSync } from 'node:fs';
import { basename, dirname, join } from 'node:path';

let counter = 0;

/** True for the name of a temporary file left by an interrupted atomic write. */
export function isAtomicTemp(name: string): boolean {
  return /^\..+\.\d+\.\d+\.tmp$/.test(name);
}

/**
 * Write `content` to `path` atomically, creating parent folders.
 * @example
 * writeAtomic('out/run.json', JSON.stringify(record, null, 2));
 */
export function writeAtomic(path: string, content: string | Uint8Array): void {
  const dir = dirname(path);
  mkdirSync(dir, { recursive: true });
  const temp = join(dir, `.${basename(path)}.${process.pid}.${counter++}.tmp`);
  let fd: number | null = null;
  try {
    fd = openSync(temp, 'wx');
    const bytes = typeof content === 'string' ? Buffer.from(content, 'utf8') : content;
    let off = 0;
    while (off < bytes.length) off += writeSync(fd, bytes, off, bytes.length - off);
    fsyncSync(fd);
    closeSync(fd);
    fd = null;
    renameSync(temp, path);
  } catch (err) {
    if (fd !== null) closeSync(fd);
    rmSync(temp, { force: true });
    throw err;
  }
}

/**
 * Write JSON atomically (two-space indent, trailing newline).
 * @example
 * writeJsonAtomic('out/latest.json', { run: '2025-06-01T10-00-00Z' });
 */
export function writeJsonAtomic(path: string, value: unknown): void {
  writeAtomic(path, `${JSON.stringify(value, null, 2)}\n`);
}
