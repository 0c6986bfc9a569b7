/**
 * Whole-file writes that readers never see half done: a temporary file in the same folder, then a rename.
 */
import { realpath, rename, unlink, writeFile } from 'node:fs/promises';
import { basename, dirname, join, resolve } from 'node:path';
import { errors } from '../errors.js';

let counter = 0;

/**
 * Write `data` to `path` atomically (temporary file, then rename over `path`).
 * @example
 * await writeFileAtomic('scores.csv', text);
 */
export async function writeFileAtomic(path: string, data: string | Uint8Array): Promise<void> {
  const temp = join(dirname(path), `.${basename(path)}.${process.pid}.${++counter}.tmp`);
  try {
    await writeFile(temp, data, { flag: 'wx' });
    await rename(temp, path);
  } catch (e) {
    await unlink(temp).catch(() => undefined);
    throw e;
  }
}

async function canonical(path: string): Promise<string> {
  const full = resolve(path);
  try { return await realpath(full); } catch { return full; }
}

/**
 * Throw `wouldOverwrite` when `out` names the same file as any of `inputs` (after resolving links).
 * @example
 * await refuseOverwrite('scores.csv', { extract: 'march.csv', model: 'model.json' });
 */
export async function refuseOverwrite(out: string, inputs: Readonly<Record<string, string>>): Promise<void> {
  const target = await canonical(out);
  for (const [what, path] of Object.entries(inputs)) {
    if ((await canonical(path)) === target) throw errors.wouldOverwrite(out, what);
  }
}
