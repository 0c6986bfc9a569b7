/**
 * The Jupyter kernelspec for coppice: a folder `kernels/coppice/` holding `kernel.json`, written directly
 * (no Python needed). Jupyter finds it under a data folder: `~/.local/share/jupyter` for one user,
 * `<prefix>/share/jupyter` for an environment, or any folder listed in `JUPYTER_PATH`.
 */
import { mkdirSync, renameSync, writeFileSync } from 'node:fs';
import { homedir } from 'node:os';
import { join, resolve } from 'node:path';

/** The name Jupyter knows the kernel by (`--ExecutePreprocessor.kernel_name`, notebook metadata). */
export const KERNEL_NAME = 'coppice';

export interface KernelSpec {
  readonly argv: readonly string[];
  readonly display_name: string;
  readonly language: string;
  readonly interrupt_mode: 'signal';
  readonly metadata: Record<string, unknown>;
}

/**
 * The kernel.json content starting `node <cli> kernel --connection {connection_file}`.
 * @param cliPath absolute path of coppice's `dist/cli.js`.
 * @param nodePath the node binary. __Default:__ the running one (`process.execPath`).
 * @example
 * kernelSpec('/opt/coppice/dist/cli.js').argv;
 * // ['/usr/bin/node', '/opt/coppice/dist/cli.js', 'kernel', '--connection', '{connection_file}']
 */
export function kernelSpec(cliPath: string, nodePath: string = process.execPath): KernelSpec {
  return {
    argv: [nodePath, resolve(cliPath), 'kernel', '--connection', '{connection_file}'],
    display_name: 'TypeScript (coppice)',
    language: 'typescript',
    interrupt_mode: 'signal',
    metadata: { debugger: false },
  };
}

/** Where to install: the per-user data folder, or `<prefix>/share/jupyter`. */
export type InstallPlace = { readonly user: true } | { readonly prefix: string };

/** The Jupyter data folder for `place` (kernels go in its `kernels/` folder). */
export function jupyterDataDir(place: InstallPlace, env: NodeJS.ProcessEnv = process.env): string {
  if ('prefix' in place) return resolve(place.prefix, 'share', 'jupyter');
  if (env.JUPYTER_DATA_DIR) return resolve(env.JUPYTER_DATA_DIR);
  if (process.platform === 'darwin') return join(homedir(), 'Library', 'Jupyter');
  if (process.platform === 'win32') return join(env.APPDATA ?? homedir(), 'jupyter');
  return join(env.XDG_DATA_HOME ?? join(homedir(), '.local', 'share'), 'jupyter');
}

/**
 * Write the kernelspec folder for `spec` under `place`; returns the folder written. The file is written
 * to a temporary name and renamed, so a reader never sees half a file.
 * @example
 * installKernelSpec(kernelSpec('/opt/coppice/dist/cli.js'), { prefix: '/tmp/env' });
 * // '/tmp/env/share/jupyter/kernels/coppice'
 */
export function installKernelSpec(spec: KernelSpec, place: InstallPlace): string {
  const dir = join(jupyterDataDir(place), 'kernels', KERNEL_NAME);
  mkdirSync(dir, { recursive: true });
  const file = join(dir, 'kernel.json');
  const temp = `${file}.${process.pid}.tmp`;
  writeFileSync(temp, `${JSON.stringify(spec, null, 2)}\n`);
  renameSync(temp, file);
  return dir;
}
