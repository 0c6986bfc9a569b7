/**
 * Worker thread body for `runTreeJobs`: imports the job module once, then takes job indices from the
 * shared counter until none are left, posting each result with its index.
 */
import { parentPort, workerData } from 'node:worker_threads';
import type { MessagePort } from 'node:worker_threads';

interface Batch {
  readonly module: string;
  readonly name: string;
  readonly input: unknown;
  readonly count: number;
  readonly control: Int32Array;
  readonly port: MessagePort;
}

type JobFn = (input: unknown, t: number) => unknown;
const modules = new Map<string, Record<string, unknown>>();

/**
 * The ArrayBuffers a result owns outright (typed arrays spanning their whole, non-shared buffer), found
 * in plain objects and arrays: moved to the calling thread instead of copied, so it does not spend its
 * time decoding large trees while the helpers wait for nothing.
 */
function ownedBuffers(value: unknown, out: Set<ArrayBuffer>): Set<ArrayBuffer> {
  if (ArrayBuffer.isView(value)) {
    const buf = value.buffer;
    if (buf instanceof ArrayBuffer && value.byteOffset === 0 && value.byteLength === buf.byteLength && buf.byteLength > 0) out.add(buf);
  } else if (Array.isArray(value)) {
    for (const v of value) ownedBuffers(v, out);
  } else if (value !== null && typeof value === 'object' && Object.getPrototypeOf(value) === Object.prototype) {
    for (const v of Object.values(value)) ownedBuffers(v, out);
  }
  return out;
}

function postResult(port: MessagePort, msg: { t: number; result?: unknown; error?: string }): void {
  const moved = [...ownedBuffers(msg.result, new Set())];
  try {
    port.postMessage(msg, moved);
  } catch {
    port.postMessage(msg); // something in the list could not be moved: copy everything
  }
}

async function runBatch(b: Batch): Promise<void> {
  try {
    let mod = modules.get(b.module);
    if (!mod) { mod = (await import(b.module)) as Record<string, unknown>; modules.set(b.module, mod); }
    const fn = mod[b.name] as JobFn;
    if (typeof fn !== 'function') throw new Error(`${b.module} has no export ${b.name}`);
    for (;;) {
      const t = Atomics.add(b.control, 0, 1);
      if (t >= b.count) break;
      let msg: { t: number; result?: unknown; error?: string };
      try { msg = { t, result: fn(b.input, t) }; } catch (e) { msg = { t, error: (e as Error).message }; }
      postResult(b.port, msg);
      Atomics.add(b.control, 1, 1);
      Atomics.notify(b.control, 1);
    }
  } catch (e) {
    // the module failed to load: report one error for the next unclaimed job and release the waiter
    const t = Atomics.add(b.control, 0, 1);
    if (t < b.count) { b.port.postMessage({ t, error: (e as Error).message }); Atomics.add(b.control, 1, 1); Atomics.notify(b.control, 1); }
  }
  b.port.close();
}

void workerData;
parentPort?.on('message', (b: Batch) => { void runBatch(b); });
