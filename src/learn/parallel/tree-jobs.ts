/**
 * Running independent tree jobs (forest and bagging members) on worker threads, synchronously.
 *
 * `runTreeJobs(count, spec, workers)` returns `[job(input, 0), ..., job(input, count - 1)]` in index order.
 * Jobs are claimed from a shared atomic counter by the calling thread and `workers - 1` worker threads;
 * each result depends only on (input, t) — seeds come from `derive(seed, t, ...)` — so the output is
 * identical whatever the number of workers or the scheduling. The caller blocks (Atomics.wait) until all
 * jobs are done; results travel back on MessagePorts read with `receiveMessageOnPort` between the calling
 * thread's own jobs (their whole-buffer typed arrays are moved, not copied). Workers are kept
 * for reuse and unref'd (they never keep the process alive). A job failing in the calling thread throws
 * its own error; one failing in a worker is reported as a worker failure naming the job. With one worker, or when the job module or
 * the worker script is not built into dist/, everything runs in the calling thread.
 */
import { MessageChannel, receiveMessageOnPort, Worker, type MessagePort } from 'node:worker_threads';
import { errors } from '../../errors.js';
import { builtModuleUrl, workerScriptUrl } from './package-root.js';
import { toShared } from './share.js';

/** A job: the function itself (for the calling thread) and where workers can import it. */
export interface TreeJobSpec<I, R> {
  /** Runs job t. Must be a pure function of (input, t). */
  readonly run: (input: I, t: number) => R;
  /** `import.meta.url` of the module exporting `run` (src/ URLs are mapped to dist/). */
  readonly module: string;
  /** Export name of `run` in that module. */
  readonly name: string;
  /** Plain data (typed arrays are moved to shared memory once, not copied per worker). */
  readonly input: I;
}

const pool: Worker[] = [];

function workersFor(n: number, script: URL): Worker[] {
  while (pool.length < n) {
    const w = new Worker(script);
    w.unref();
    pool.push(w);
  }
  return pool.slice(0, n);
}

/**
 * Run `count` jobs on `workers` threads (the caller counts as one). __Default:__ workers = 1.
 * @example
 * const members = runTreeJobs(500, { run: growForestJob, module: import.meta.url, name: 'growForestJob', input }, 2);
 */
export function runTreeJobs<I, R>(count: number, spec: TreeJobSpec<I, R>, workers = 1): R[] {
  if (!(Number.isInteger(count) && count >= 0)) throw errors.badOption('count', count, 'a non-negative integer');
  if (!(Number.isInteger(workers) && workers >= 1)) throw errors.badOption('workers', workers, 'an integer >= 1');
  const out: R[] = new Array(count);
  const script = workers > 1 && count > 1 ? workerScriptUrl('tree-worker.js') : null;
  const moduleUrl = script ? builtModuleUrl(spec.module) : null;
  if (!script || !moduleUrl) {
    for (let t = 0; t < count; t++) out[t] = spec.run(spec.input, t);
    return out;
  }
  const control = new Int32Array(new SharedArrayBuffer(8));
  const input = toShared(spec.input);
  const ports: MessagePort[] = [];
  for (const w of workersFor(Math.min(workers - 1, count - 1), script)) {
    const { port1, port2 } = new MessageChannel();
    ports.push(port1);
    w.postMessage({ module: moduleUrl.href, name: spec.name, input, count, control, port: port2 }, [port2]);
  }
  const done = new Uint8Array(count);
  let failure: string | null = null;
  let own: unknown = null;
  const drain = (): void => {
    for (const p of ports) {
      for (let m = receiveMessageOnPort(p); m; m = receiveMessageOnPort(p)) {
        const msg = m.message as { t: number; result?: R; error?: string };
        if (msg.error !== undefined) failure ??= `job ${msg.t}: ${msg.error}`;
        else out[msg.t] = msg.result as R;
        done[msg.t] = 1;
      }
    }
  };
  for (;;) {
    const t = Atomics.add(control, 0, 1);
    if (t >= count) break;
    try { out[t] = spec.run(input, t); } catch (e) { own ??= e; }
    done[t] = 1;
    Atomics.add(control, 1, 1);
    drain(); // take the helpers' results as they come, not all at the end
  }
  for (;;) {
    const finished = Atomics.load(control, 1);
    if (finished >= count) break;
    Atomics.wait(control, 1, finished, 50);
  }
  drain();
  for (const p of ports) p.close();
  if (own) throw own;
  if (failure) throw errors.workerFailed(spec.name, failure);
  if (done.some((d) => d === 0)) throw errors.workerFailed(spec.name, 'a worker stopped before finishing');
  return out;
}
