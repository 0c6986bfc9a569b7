/**
 * `coppice install-kernel [--user | --prefix DIR]`: write the kernelspec so Jupyter offers
 * "TypeScript (coppice)". `--user` (the default) installs for the current user; `--prefix DIR` installs
 * under `DIR/share/jupyter` (an environment, or a folder put on `JUPYTER_PATH`).
 */
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { errors } from '../errors.js';
import type { InstallPlace } from './kernelspec.js';
import { installKernelSpec, kernelSpec } from './kernelspec.js';
import { findPackageRoot } from './package-bridge.js';

const usage = 'usage: coppice install-kernel [--user | --prefix DIR]';

/** The install place named by the arguments. */
export function installPlaceFrom(args: readonly string[]): InstallPlace {
  let place: InstallPlace | null = null;
  for (let i = 0; i < args.length; i++) {
    const a = args[i];
    let next: InstallPlace;
    if (a === '--user') next = { user: true };
    else if (a === '--prefix') {
      const dir = args[++i];
      if (!dir) throw errors.badArguments('install-kernel', `--prefix needs a folder; ${usage}`);
      next = { prefix: dir };
    } else if (a.startsWith('--prefix=')) next = { prefix: a.slice('--prefix='.length) };
    else throw errors.badArguments('install-kernel', `unexpected argument ${JSON.stringify(a)}; ${usage}`);
    if (place) throw errors.badArguments('install-kernel', `give one of --user or --prefix; ${usage}`);
    place = next;
  }
  return place ?? { user: true };
}

export async function main(args: string[]): Promise<number> {
  const place = installPlaceFrom(args);
  const cli = join(findPackageRoot(), 'dist', 'cli.js');
  if (!existsSync(cli)) throw errors.badFile(cli, 'the package is not built (run npm run build)');
  const dir = installKernelSpec(kernelSpec(cli), place);
  process.stdout.write(`Installed the coppice kernelspec in ${dir}\n`);
  return 0;
}
