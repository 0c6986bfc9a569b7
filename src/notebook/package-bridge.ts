/**
 * Make `import ... from "coppice"` (and `"arquero"`) work in notebook cells wherever the notebook lives.
 *
 * tslab compiles cells with TypeScript 5.0 using Node10 module resolution from the notebook's folder and
 * runs them as CommonJS. A notebook outside this package's tree would not find coppice, so the bridge:
 * - at compile time, shows `<folder>/node_modules/<name>` to TypeScript as the package's real folder
 *   (a forwarding layer over TypeScript's file system functions, like tslab does for itself);
 * - at run time, answers `require("<name>")` from cells with the package's own copy.
 * coppice is always the kernel's own copy (one module instance for display and progress); other bridged
 * names are used only when the notebook's folder cannot resolve them itself.
 */
import { createRequire } from 'node:module';
import { existsSync, readFileSync } from 'node:fs';
import { dirname, join, relative, resolve, sep } from 'node:path';
import { fileURLToPath } from 'node:url';

/** A package made visible to cells. */
export interface BridgedPackage {
  /** Module name as written in an import. */
  readonly name: string;
  /** The package's folder (holding its package.json). */
  readonly dir: string;
  /** Use this copy even when the notebook's folder has its own. */
  readonly always: boolean;
}

/** The subset of TypeScript's `sys` the bridge forwards. */
export interface FileSystemHost {
  fileExists(path: string): boolean;
  directoryExists(path: string): boolean;
  readFile(path: string, encoding?: string): string | undefined;
  realpath?(path: string): string;
  getDirectories(path: string): string[];
}

interface Forward {
  readonly from: string;
  readonly to: string;
  readonly always: boolean;
}

const forwards: Forward[] = [];
const patched = new WeakSet<object>();

/** This package's root folder (the one whose package.json names coppice). */
export function findPackageRoot(start = dirname(fileURLToPath(import.meta.url))): string {
  let dir = start;
  for (;;) {
    const file = join(dir, 'package.json');
    if (existsSync(file)) {
      try {
        const pkg = JSON.parse(readFileSync(file, 'utf8')) as { name?: unknown };
        if (pkg.name === 'coppice') return dir;
      } catch {
        // keep walking up
      }
    }
    const up = dirname(dir);
    if (up === dir) throw new Error(`coppice package root not found above ${start}`);
    dir = up;
  }
}

/** The folder of package `name` as resolved from `fromDir`, or null. */
export function packageDir(name: string, fromDir: string): string | null {
  try {
    const req = createRequire(join(fromDir, 'noop.js'));
    let dir = dirname(req.resolve(name));
    for (;;) {
      const file = join(dir, 'package.json');
      if (existsSync(file) && (JSON.parse(readFileSync(file, 'utf8')) as { name?: unknown }).name === name) return dir;
      const up = dirname(dir);
      if (up === dir) return null;
      dir = up;
    }
  } catch {
    return null;
  }
}

/** The packages bridged by default: coppice itself (always) and arquero (when missing locally). */
export function defaultBridges(root = findPackageRoot()): BridgedPackage[] {
  const out: BridgedPackage[] = [{ name: 'coppice', dir: root, always: true }];
  const aq = packageDir('arquero', root);
  if (aq) out.push({ name: 'arquero', dir: aq, always: false });
  return out;
}

function mapPath(path: string, real: (p: string) => boolean): string {
  const abs = resolve(path);
  for (const f of forwards) {
    if (abs === f.from || abs.startsWith(f.from + sep)) {
      if (!f.always && real(abs)) return path;
      return join(f.to, relative(f.from, abs));
    }
  }
  return path;
}

/**
 * Forward `<folder>/node_modules/<name>` to each bridged package for TypeScript's file system `host`
 * (patched once; later calls add forwards).
 */
export function bridgeTypes(host: FileSystemHost, folder: string, packages: readonly BridgedPackage[]): void {
  for (const p of packages) {
    const from = resolve(folder, 'node_modules', p.name);
    const at = forwards.findIndex((f) => f.from === from);
    if (at >= 0) forwards.splice(at, 1);
    forwards.push({ from, to: p.dir, always: p.always });
  }
  if (patched.has(host)) return;
  patched.add(host);
  const fileExists = host.fileExists.bind(host);
  const directoryExists = host.directoryExists.bind(host);
  const readFile = host.readFile.bind(host);
  const getDirectories = host.getDirectories.bind(host);
  const realpath = host.realpath?.bind(host);
  const nodeModules = () => new Set(forwards.map((f) => dirname(f.from)));
  host.fileExists = (p) => fileExists(mapPath(p, fileExists));
  host.directoryExists = (p) => directoryExists(mapPath(p, directoryExists)) || nodeModules().has(resolve(p));
  host.readFile = (p, e) => readFile(mapPath(p, fileExists), e);
  host.getDirectories = (p) => (directoryExists(p) ? getDirectories(mapPath(p, directoryExists)) : []);
  if (realpath) host.realpath = (p) => realpath(mapPath(p, (q) => fileExists(q) || directoryExists(q)));
}

/**
 * A `require` for cells: bridged names (and their subpaths) load the bridged copy; everything else goes
 * to `base`.
 */
export function bridgeRequire(base: (id: string) => unknown, folder: string, packages: readonly BridgedPackage[]): (id: string) => unknown {
  const local = createRequire(join(folder, 'noop.js'));
  const own = createRequire(import.meta.url);
  return (id: string) => {
    const p = packages.find((b) => id === b.name || id.startsWith(`${b.name}/`));
    if (p) {
      let usable = p.always;
      if (!usable) {
        try {
          local.resolve(id);
        } catch {
          usable = true;
        }
      }
      if (usable) return own(id === p.name ? p.dir : join(p.dir, id.slice(p.name.length + 1)));
    }
    return base(id);
  };
}
