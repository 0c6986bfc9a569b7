/**
 * The coppice Jupyter kernel: tslab's ZeroMQ server (sockets, signing, heartbeat) with coppice's cell
 * executor behind it. Compared with tslab's own handler it adds what notebook tools rely on: an
 * `execute_input` broadcast, an `error` message with name, value and traceback when a cell fails, rich
 * display bundles whose JSON entries stay objects, and output of timers and progress after a cell ends
 * routed to the cell that started them. tslab's notices about message types it does not handle go to the
 * kernel's log, never into a cell's output.
 */
import type { DisplayMessage, OutputHooks } from './display-types.js';
import { installSink } from './display-sink.js';
import type { CellError, CellExecutor } from './executor.js';
import { createCellExecutor } from './executor.js';
import { isKernelNotice } from './kernel-notices.js';
import { loadTslab } from './tslab-types.js';

/** A Jupyter message as tslab's server holds it. */
interface WireMessage {
  header: { msg_type: string; msg_id: string };
  content: Record<string, unknown>;
  createReply(): WireMessage;
  signAndSend(key: string, socket: unknown): void;
}

interface ServerBase {
  connInfo: { key: string };
  iopub: unknown;
  init(): Promise<void>;
  close(): void;
}

type ServerClass = new (handler: unknown, configPath: string) => ServerBase;

/** What the kernel reports about itself in `kernel_info_reply`. */
export function kernelInfo(typescriptVersion: string, packageVersion: string): Record<string, unknown> {
  return {
    protocol_version: '5.3',
    implementation: 'coppice',
    implementation_version: packageVersion,
    language_info: {
      name: 'typescript',
      version: typescriptVersion,
      mimetype: 'text/typescript',
      file_extension: '.ts',
      codemirror_mode: { mode: 'typescript', name: 'javascript', typescript: true },
    },
    banner: `coppice ${packageVersion}: TypeScript notebooks for decision trees and tree ensembles`,
    help_links: [],
  };
}

/** The Jupyter `error` content for a failed cell. */
export function errorContent(error: CellError): { ename: string; evalue: string; traceback: string[] } {
  const heading = error.kind === 'compile' ? 'The cell did not compile' : error.kind === 'magic' ? 'Malformed magic' : `${error.name}`;
  const traceback = [`${heading}: ${error.message}`, ...error.trace.map((t) => `    ${t}`)];
  return { ename: error.kind === 'runtime' ? error.name : heading, evalue: error.message, traceback };
}

export interface KernelOptions {
  /** Path of the Jupyter connection file. */
  readonly connectionFile: string;
  /** This package's version, for kernel_info. */
  readonly version: string;
}

/**
 * Start the kernel and serve until a shutdown request; resolves once the sockets are bound.
 * @example
 * await startKernel({ connectionFile: '/run/user/1000/jupyter/kernel-1.json', version: '0.1.0' });
 */
export async function startKernel(options: KernelOptions): Promise<void> {
  const tslab = loadTslab();
  const { ZmqServer } = tslab.require('./dist/jupyter.js') as { ZmqServer: ServerClass };

  let parent: WireMessage | null = null;
  let server: ServerBase | null = null;
  const publish = (type: string, content: Record<string, unknown>, on: WireMessage | null = parent) => {
    if (!on || !server) return;
    const m = on.createReply();
    m.header.msg_type = type;
    m.content = content;
    m.signAndSend(server.connInfo.key, server.iopub);
  };
  const hooks: OutputHooks = {
    onDisplay: (message: DisplayMessage, update: boolean) =>
      publish(update ? 'update_display_data' : 'display_data', { ...message }),
    onStream: (name, text) => publish('stream', { name, text }),
  };
  installSink(hooks);
  const realStdout = process.stdout.write.bind(process.stdout);
  const realStderr = process.stderr.write.bind(process.stderr);
  for (const name of ['stdout', 'stderr'] as const) {
    process[name].write = ((chunk: string | Uint8Array, ...rest: unknown[]) => {
      const text = typeof chunk === 'string' ? chunk : Buffer.from(chunk).toString('utf8');
      if (name === 'stderr' && isKernelNotice(text)) realStderr(text);
      else if (parent) hooks.onStream?.(name, text);
      else if (name === 'stdout') realStdout(text);
      const done = rest.find((r) => typeof r === 'function') as (() => void) | undefined;
      done?.();
      return true;
    }) as typeof process.stdout.write;
  }

  const cells: CellExecutor = createCellExecutor({ ...hooks, captureStreams: false });
  const info = kernelInfo(tslab.ts.version, options.version);
  let count = 0;
  let queue: Promise<unknown> = Promise.resolve();

  const handler = {
    handleKernel: () => info,
    handleExecute: () => {
      throw new Error('handled by the coppice server');
    },
    handleIsComplete: (req: { code: string }) => {
      const r = cells.isComplete(req.code);
      return r.completed ? { status: 'complete' } : { status: 'incomplete', indent: r.indent ?? '' };
    },
    handleInspect: (req: { code: string; cursor_pos: number }) => {
      const text = cells.inspect(req.code, req.cursor_pos);
      return { status: 'ok', found: text != null, data: text == null ? {} : { 'text/plain': text }, metadata: {} };
    },
    handleComplete: (req: { code: string; cursor_pos: number }) => {
      const c = cells.complete(req.code, req.cursor_pos);
      return { status: 'ok', cursor_start: c.start, cursor_end: c.end, matches: c.candidates, metadata: {} };
    },
    handleShutdown: () => ({ restart: false }),
    close: () => {
      cells.close();
      setTimeout(() => process.exit(0), 50).unref();
    },
  };

  class CoppiceServer extends ZmqServer {
    async handleExecute(sock: unknown, msg: WireMessage): Promise<void> {
      const run = queue.then(async () => {
        const code = String(msg.content.code ?? '');
        const silent = msg.content.silent === true;
        if (!silent) count++;
        parent = msg;
        publish('execute_input', { code, execution_count: count });
        const result = await cells.execute(code);
        const reply = msg.createReply();
        reply.header.msg_type = 'execute_reply';
        if (result.ok || !result.error) {
          reply.content = { status: 'ok', execution_count: count, payload: [], user_expressions: {} };
        } else {
          const err = errorContent(result.error);
          publish('error', err);
          reply.content = { status: 'error', execution_count: count, ...err };
        }
        reply.signAndSend(this.connInfo.key, sock);
      });
      queue = run.catch(() => undefined);
      await run;
    }
  }

  server = new CoppiceServer(handler, options.connectionFile);
  process.on('SIGINT', () => cells.interrupt());
  process.on('uncaughtException', (err) => process.stderr.write(`Uncaught exception: ${err.stack ?? String(err)}\n`));
  process.on('unhandledRejection', (reason) => process.stderr.write(`Unhandled rejection: ${String(reason)}\n`));
  await server.init();
}
