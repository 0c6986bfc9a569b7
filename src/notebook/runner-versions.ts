/**
 * Versions recorded with a run: coppice, Node, and the packages that shape results and outputs.
 */
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { findPackageRoot, packageDir } from './package-bridge.js';

const PACKAGES = ['arquero', 'tslab', 'vega', 'vega-lite', 'vega-embed'];

function versionAt(dir: string | null): string | null {
  if (!dir) return null;
  const file = join(dir, 'package.json');
  if (!existsSync(file)) return null;
  const v = (JSON.parse(readFileSync(file, 'utf8')) as { version?: unknown }).version;
  return typeof v === 'string' ? v : null;
}

/**
 * Versions of coppice, Node and key packages, plus the platform.
 * @example
 * runVersions(); // { coppice: '0.1.0', node: 'v20.20.2', arquero: '8.0.3', ... }
 */
export function runVersions(): Record<string, string> {
  const root = findPackageRoot();
  const out: Record<string, string> = { coppice: versionAt(root) ?? 'unknown', node: process.version, platform: `${process.platform}-${process.arch}` };
  for (const name of PACKAGES) {
    const v = versionAt(packageDir(name, root));
    if (v) out[name] = v;
  }
  return out;
}
