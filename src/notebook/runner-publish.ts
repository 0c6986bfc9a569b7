/**
 * Publishing a run's files: they are written into a hidden staging folder beside the earlier runs, which is then
 * renamed to `runs/<id>` in one step; `latest.json` is replaced atomically afterwards. A run killed before the
 * rename leaves no visible file; earlier runs are never touched. Staging folders left by killed runs are removed
 * by the next run.
 */
import { existsSync, mkdirSync, readdirSync, renameSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { writeAtomic, writeJsonAtomic } from './atomic-write.js';

const STAGING = /^\.staging-(\d+)-/;

function alive(pid: number): boolean {
  if (pid === process.pid) return true;
  try {
    process.kill(pid, 0);
    return true;
  } catch (err) {
    return (err as NodeJS.ErrnoException).code === 'EPERM';
  }
}

/** Remove staging folders whose process is gone. */
export function removeStaleStaging(runsDir: string): void {
  if (!existsSync(runsDir)) return;
  for (const name of readdirSync(runsDir)) {
    const m = STAGING.exec(name);
    if (m && !alive(Number(m[1]))) rmSync(join(runsDir, name), { recursive: true, force: true });
  }
}

/** A run id from a time, unique among the folders in `runsDir`. */
export function newRunId(runsDir: string, at: Date): string {
  const base = at.toISOString().replace(/:/g, '-');
  let id = base;
  for (let k = 2; existsSync(join(runsDir, id)); k++) id = `${base}-${k}`;
  return id;
}

/**
 * Write `files` (name → content) as run `id` under `outDir/runs/`, then point `latest.json` at it when asked.
 * Returns the run folder.
 * @example
 * publishRun('out', '2025-06-01T10-00-00.000Z', { 'run.json': text }, true);
 */
export function publishRun(outDir: string, id: string, files: Record<string, string>, updateLatest: boolean): string {
  const runsDir = join(outDir, 'runs');
  mkdirSync(runsDir, { recursive: true });
  removeStaleStaging(runsDir);
  const staging = join(runsDir, `.staging-${process.pid}-${id}`);
  const final = join(runsDir, id);
  rmSync(staging, { recursive: true, force: true });
  mkdirSync(staging);
  try {
    for (const [name, content] of Object.entries(files)) writeAtomic(join(staging, name), content);
    renameSync(staging, final);
  } catch (err) {
    rmSync(staging, { recursive: true, force: true });
    throw err;
  }
  if (updateLatest) writeJsonAtomic(join(outDir, 'latest.json'), { run: id });
  return final;
}
