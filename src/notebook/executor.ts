/**
 * The cell executor shared by the Jupyter kernel and the headless runner: cells go through the magic
 * compiler (magics → ordinary TypeScript), then tslab's compiler and executor, so declarations persist
 * from cell to cell and top-level `await` works. Output leaves through the hooks given at creation.
 */
import { formatWithOptions } from 'node:util';
import { resolve } from 'node:path';
import { CoppiceError } from '../errors.js';
import type { OutputHooks } from './display-types.js';
import { installSink, settleDisplays, trackDisplay } from './display-sink.js';
import type { MagicDefinition } from './magic-compile.js';
import { RUNTIME, compileCell } from './magic-compile.js';
import { builtinMagics } from './magics.js';
import type { BridgedPackage } from './package-bridge.js';
import { bridgeRequire, bridgeTypes, defaultBridges } from './package-bridge.js';
import { representValue } from './represent.js';
import type { TslabConverter, TslabExecutor } from './tslab-types.js';
import { loadTslab } from './tslab-types.js';

/** Why a cell failed. */
export interface CellError {
  /** `magic`: a malformed magic (nothing ran); `compile`: TypeScript errors (nothing ran); `runtime`: it threw. */
  readonly kind: 'magic' | 'compile' | 'runtime';
  /** Error class name (`CoppiceError`, `TypeError`, `TSError` for compiler messages, ...). */
  readonly name: string;
  /** The message: for `compile`, one line per compiler message (`line:column - text`). */
  readonly message: string;
  /** Stack trace lines for runtime errors (empty otherwise). */
  readonly trace: readonly string[];
}

export interface CellResult {
  readonly ok: boolean;
  readonly error?: CellError;
}

export interface CellExecutorOptions extends OutputHooks {
  /**
   * Folder that cells compile and resolve imports from (relative imports, `node_modules`).
   * __Default:__ `process.cwd()`.
   */
  dir?: string;
  /**
   * While a cell runs, route `process.stdout` / `process.stderr` writes to `onStream`.
   * __Default:__ `true` when `onStream` is given.
   */
  captureStreams?: boolean;
  /** Magics understood in cells. __Default:__ `builtinMagics`. */
  magics?: readonly MagicDefinition[];
  /** Packages made importable from cells. __Default:__ coppice itself and arquero (see package-bridge). */
  packages?: readonly BridgedPackage[];
}

export interface CellExecutor {
  /** Compile and run one cell. Resolves (never rejects) with whether it succeeded and why not. */
  execute(code: string): Promise<CellResult>;
  /** Completion candidates at `cursor` (offset into `code`). */
  complete(code: string, cursor: number): { start: number; end: number; candidates: string[] };
  /** Hover text at `cursor`, or null. */
  inspect(code: string, cursor: number): string | null;
  /** Whether `code` is a complete cell (for console front ends), with the indent for the next line. */
  isComplete(code: string): { completed: boolean; indent?: string };
  /** Abandon the awaited part of a running cell (its promise is left to settle on its own). */
  interrupt(): void;
  /** Variables defined so far, by name. */
  readonly locals: Readonly<Record<string, unknown>>;
  /** Release the compiler's resources. */
  close(): void;
}

interface TslabGlobal {
  exports: Record<string, unknown>;
  require: (id: string) => unknown;
}

const compilerMessage = '%s%d:%d - %s';

/**
 * Create a cell executor over tslab.
 *
 * @param options output hooks and settings; see `CellExecutorOptions`.
 * @example
 * const cells = createCellExecutor({
 *   onDisplay: (message, update) => outputs.push({ message, update }),
 *   onStream: (name, text) => process[name].write(text),
 * });
 * await cells.execute('const a = await Promise.resolve(2)');
 * await cells.execute('a * 21'); // displays 42
 * cells.close();
 */
export function createCellExecutor(options: CellExecutorOptions = {}): CellExecutor {
  const dir = resolve(options.dir ?? process.cwd());
  const magics = options.magics ?? builtinMagics;
  const packages = options.packages ?? defaultBridges();
  const capture = options.captureStreams ?? options.onStream != null;
  const tslab = loadTslab();
  const sys = tslab.ts.sys;
  bridgeTypes(sys, dir, packages);

  const getCwd = sys.getCurrentDirectory;
  let node: TslabConverter;
  sys.getCurrentDirectory = () => dir;
  try {
    node = tslab.createConverter({ isJS: false, isBrowser: false });
  } finally {
    sys.getCurrentDirectory = getCwd;
  }
  const convs = {
    get node() {
      return node;
    },
    get browser(): TslabConverter {
      throw new CoppiceError('not-supported', 'Browser cells are not supported.');
    },
    close: () => node.close(),
  };

  let diagnostics: string[] = [];
  let thrown: unknown = undefined;
  let didThrow = false;
  let lineOneShift = 0;
  const hooks: OutputHooks = { onDisplay: options.onDisplay, onStream: options.onStream };
  const toStream = (name: 'stdout' | 'stderr', text: string) => {
    if (hooks.onStream) hooks.onStream(name, text);
    else process[name].write(text);
  };
  const cellConsole = {
    log: (value: unknown) => {
      const message = hooks.onDisplay ? representValue(value) : null;
      if (message instanceof Promise) void trackDisplay(message.then((m) => hooks.onDisplay?.(m, false)));
      else if (message) hooks.onDisplay?.(message, false);
      else toStream('stdout', `${formatWithOptions({ colors: false }, value)}\n`);
    },
    error: (...args: unknown[]) => {
      if (args[0] === compilerMessage && args.length === 5) {
        const [, file, line, column, text] = args as [string, string, number, number, string];
        const col = line === 1 ? Math.max(1, column - lineOneShift) : column;
        diagnostics.push(`${file ? `${file} ` : ''}${line}:${col} - ${text}`);
        return;
      }
      didThrow = true;
      thrown = args[0];
    },
  };

  const inner: TslabExecutor = tslab.createExecutor(dir, convs, cellConsole);
  const g = globalThis as unknown as { __tslab__: TslabGlobal };
  const own: TslabGlobal = { exports: g.__tslab__.exports, require: bridgeRequire(g.__tslab__.require, dir, packages) };
  g.__tslab__ = own;

  async function execute(code: string): Promise<CellResult> {
    let compiled: string;
    try {
      const c = compileCell(code, magics);
      compiled = c.code;
      lineOneShift = c.used.length > 0 ? `import * as ${RUNTIME} from "coppice"; `.length : 0;
    } catch (err) {
      return { ok: false, error: describe('magic', err) };
    }
    diagnostics = [];
    didThrow = false;
    thrown = undefined;
    g.__tslab__ = own;
    const restoreSink = installSink(hooks);
    const restoreStreams = capture ? captureStreams(toStream) : () => {};
    let ok: boolean;
    try {
      ok = await inner.execute(compiled);
      await settleDisplays();
    } catch (err) {
      ok = false;
      didThrow = true;
      thrown = err;
    } finally {
      restoreStreams();
      restoreSink();
    }
    if (ok) return { ok: true };
    if (diagnostics.length > 0) {
      return { ok: false, error: { kind: 'compile', name: 'TSError', message: diagnostics.join('\n'), trace: [] } };
    }
    return { ok: false, error: describe('runtime', didThrow ? thrown : new Error('the cell failed')) };
  }

  return {
    execute,
    complete: (code, cursor) => {
      const info = inner.complete(blankMagics(code), cursor);
      return { start: info.start, end: info.end, candidates: info.candidates };
    },
    inspect: (code, cursor) => {
      const info = inner.inspect(blankMagics(code), cursor);
      return info ? tslab.printQuickInfo(info) : null;
    },
    isComplete: (code) => (/^\s*%%/.test(code) ? { completed: true } : tslab.isCompleteCode(blankMagics(code))),
    interrupt: () => inner.interrupt(),
    locals: inner.locals,
    close: () => inner.close(),
  };
}

/** Replace magic lines with blanks of the same length so offsets into the cell still line up. */
function blankMagics(code: string): string {
  if (/^\s*%%/.test(code)) return code.replace(/[^\n]/g, ' ');
  return code.replace(/^%[A-Za-z][^\n]*/gm, (m) => ' '.repeat(m.length));
}

function describe(kind: CellError['kind'], err: unknown): CellError {
  if (err instanceof Error) {
    const trace = (err.stack ?? '').split('\n').slice(1).map((l) => l.trim()).filter((l) => l.startsWith('at '));
    return { kind, name: err.name, message: err.message, trace: kind === 'magic' ? [] : trace };
  }
  return { kind, name: 'Error', message: formatWithOptions({ colors: false }, err), trace: [] };
}

/** Route process stream writes to `write` until the returned function is called. */
function captureStreams(write: (name: 'stdout' | 'stderr', text: string) => void): () => void {
  const saved = { stdout: process.stdout.write, stderr: process.stderr.write };
  for (const name of ['stdout', 'stderr'] as const) {
    process[name].write = ((chunk: string | Uint8Array, ...rest: unknown[]) => {
      write(name, typeof chunk === 'string' ? chunk : Buffer.from(chunk).toString('utf8'));
      const done = rest.find((r) => typeof r === 'function') as (() => void) | undefined;
      done?.();
      return true;
    }) as typeof process.stdout.write;
  }
  return () => {
    process.stdout.write = saved.stdout;
    process.stderr.write = saved.stderr;
  };
}
