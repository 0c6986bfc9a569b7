/**
 * The parts of tslab 1.0.22 (CommonJS, `node_modules/tslab/dist`) coppice uses, typed here and loaded
 * through one `require` so every user shares tslab's single TypeScript instance.
 */
import { createRequire } from 'node:module';
import type { FileSystemHost } from './package-bridge.js';

export interface TslabDiagnostic {
  readonly messageText: string;
}

export interface TslabCompletion {
  readonly start: number;
  readonly end: number;
  readonly candidates: string[];
}

export interface TslabConverter {
  close(): void;
}

export interface TslabConverterSet {
  readonly node: TslabConverter;
  readonly browser: TslabConverter;
  close(): void;
}

export interface TslabConsole {
  log(...args: unknown[]): void;
  error(...args: unknown[]): void;
}

export interface TslabExecutor {
  execute(src: string): Promise<boolean>;
  inspect(src: string, position: number): unknown;
  complete(src: string, position: number): TslabCompletion;
  reset(): void;
  interrupt(): void;
  locals: Record<string, unknown>;
  close(): void;
}

export interface TslabModules {
  createConverter(options: { isJS: boolean; isBrowser: boolean }): TslabConverter;
  isCompleteCode(code: string): { completed: boolean; indent?: string };
  createExecutor(rootDir: string, convs: TslabConverterSet, console: TslabConsole): TslabExecutor;
  printQuickInfo(info: unknown): string;
  /** tslab's TypeScript: `sys` (file system functions) and `version`. */
  ts: { sys: FileSystemHost & { getCurrentDirectory(): string }; version: string };
  /** The folder of tslab's package (for its jupyter module). */
  require: NodeJS.Require;
}

let loaded: TslabModules | null = null;

/** Load tslab's converter, executor and TypeScript (once). */
export function loadTslab(): TslabModules {
  if (loaded) return loaded;
  const base = createRequire(import.meta.url);
  const req = createRequire(base.resolve('tslab/package.json'));
  const conv = req('./dist/converter.js') as Pick<TslabModules, 'createConverter' | 'isCompleteCode'>;
  const exec = req('./dist/executor.js') as Pick<TslabModules, 'createExecutor'>;
  const insp = req('./dist/inspect.js') as Pick<TslabModules, 'printQuickInfo'>;
  const ts = req('@tslab/typescript-for-tslab') as TslabModules['ts'];
  loaded = {
    createConverter: conv.createConverter,
    isCompleteCode: conv.isCompleteCode,
    createExecutor: exec.createExecutor,
    printQuickInfo: insp.printQuickInfo,
    ts,
    require: req,
  };
  return loaded;
}
