/**
 * Where the built worker scripts live. Worker threads run plain JavaScript, so they are always loaded
 * from the package's `dist/` (built by `npm run build`, part of `prepare`), whether the caller runs
 * from `dist/` or from `src/` under a TypeScript test runner. The package root is found by walking up
 * from this module's URL to the nearest package.json.
 */
import { existsSync } from 'node:fs';
import { dirname, join, relative, sep } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

let root: string | null | undefined;

/** The package root directory, or null when not found. */
export function packageRoot(): string | null {
  if (root !== undefined) return root;
  let dir = dirname(fileURLToPath(import.meta.url));
  for (;;) {
    if (existsSync(join(dir, 'package.json'))) return (root = dir);
    const up = dirname(dir);
    if (up === dir) return (root = null);
    dir = up;
  }
}

/**
 * The built (dist/) URL of a module given by its own `import.meta.url` — `src/x/y.ts` maps to
 * `dist/x/y.js`, a `dist/` URL stays — or null when that file does not exist.
 * @example
 * builtModuleUrl(import.meta.url); // file:///.../dist/learn/ensemble/forest-job.js
 */
export function builtModuleUrl(moduleUrl: string): URL | null {
  const r = packageRoot();
  if (!r) return null;
  const file = fileURLToPath(moduleUrl);
  const rel = relative(r, file);
  let built: string;
  if (rel.startsWith(`src${sep}`)) built = join(r, 'dist', rel.slice(4).replace(/\.ts$/, '.js'));
  else if (rel.startsWith(`dist${sep}`)) built = file;
  else return null;
  return existsSync(built) ? pathToFileURL(built) : null;
}

/** URL of a built worker script under dist/learn/parallel/, or null when not built. */
export function workerScriptUrl(name: string): URL | null {
  const r = packageRoot();
  if (!r) return null;
  const p = join(r, 'dist', 'learn', 'parallel', name);
  return existsSync(p) ? pathToFileURL(p) : null;
}
