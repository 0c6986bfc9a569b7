/**
 * `coppice kernel --connection <file>` (or `coppice kernel <file>`): run the Jupyter kernel. Jupyter starts
 * it through the kernelspec written by `coppice install-kernel`.
 */
import { readFileSync } from 'node:fs';
import { errors } from '../errors.js';
import { startKernel } from './kernel.js';
import { findPackageRoot } from './package-bridge.js';

/** The connection file named by the arguments, checked to be a readable Jupyter connection file. */
export function connectionFileFrom(args: readonly string[]): string {
  let file: string | undefined;
  for (let i = 0; i < args.length; i++) {
    const a = args[i];
    if (a === '--connection' || a === '-f') file = args[++i];
    else if (a.startsWith('--connection=')) file = a.slice('--connection='.length);
    else if (!a.startsWith('-') && file === undefined) file = a;
    else throw errors.badArguments('kernel', `unexpected argument ${JSON.stringify(a)}; usage: coppice kernel --connection <file>`);
  }
  if (!file) throw errors.badArguments('kernel', 'missing the connection file; usage: coppice kernel --connection <file>');
  let parsed: unknown;
  try {
    parsed = JSON.parse(readFileSync(file, 'utf8'));
  } catch (err) {
    throw errors.badConnectionFile(file, err instanceof Error ? err.message.replace(/\.$/, '') : String(err));
  }
  const c = parsed as Record<string, unknown>;
  for (const k of ['shell_port', 'iopub_port', 'control_port', 'stdin_port', 'hb_port']) {
    if (typeof c[k] !== 'number') throw errors.badConnectionFile(file, `${k} is missing or not a number`);
  }
  if (typeof c.key !== 'string' || typeof c.ip !== 'string' || typeof c.transport !== 'string') {
    throw errors.badConnectionFile(file, 'key, ip and transport must be strings');
  }
  if (c.signature_scheme !== undefined && c.signature_scheme !== 'hmac-sha256') {
    throw errors.badConnectionFile(file, `signature scheme ${String(c.signature_scheme)} is not supported (hmac-sha256 is)`);
  }
  return file;
}

export async function main(args: string[]): Promise<number> {
  const connectionFile = connectionFileFrom(args);
  const pkg = JSON.parse(readFileSync(`${findPackageRoot()}/package.json`, 'utf8')) as { version: string };
  await startKernel({ connectionFile, version: pkg.version });
  // Keep running: the server's sockets hold the process open until a shutdown request.
  return new Promise<number>(() => {});
}
