/**
 * The current output destination for `show`, progress reporters and magics.
 *
 * Kept on `globalThis` under a registered symbol so that every loaded copy of coppice (the kernel's own,
 * one resolved from a notebook's folder, the test runner's source copy) writes to the same place.
 * With no sink installed (plain scripts, a terminal) output falls back to stdout / stderr.
 */
import type { DisplayMessage, OutputHooks } from './display-types.js';

const key = Symbol.for('coppice.notebook.sink');

interface SinkSlot {
  hooks: OutputHooks | null;
}

function slot(): SinkSlot {
  const g = globalThis as unknown as Record<symbol, SinkSlot | undefined>;
  let s = g[key];
  if (!s) {
    s = { hooks: null };
    g[key] = s;
  }
  return s;
}

/**
 * Install `hooks` as the output destination; returns a function restoring the previous one.
 * @example
 * const restore = installSink({ onDisplay: (m) => messages.push(m) });
 * try { show(table) } finally { restore() }
 */
export function installSink(hooks: OutputHooks | null): () => void {
  const s = slot();
  const previous = s.hooks;
  s.hooks = hooks;
  return () => {
    s.hooks = previous;
  };
}

/** True when a notebook front end (kernel or headless runner) receives rich output. */
export function hasRichSink(): boolean {
  return slot().hooks?.onDisplay != null;
}

/** Send a display message to the current sink; without one, print its text/plain entry to stdout. */
export function emitDisplay(message: DisplayMessage, update = false): void {
  const hooks = slot().hooks;
  if (hooks?.onDisplay) {
    hooks.onDisplay(message, update);
    return;
  }
  const text = message.data['text/plain'];
  if (typeof text === 'string') writeStream('stdout', text.endsWith('\n') ? text : `${text}\n`);
}

/** Write text to the current sink's stream, or to the process stream without one. */
export function writeStream(name: 'stdout' | 'stderr', text: string): void {
  const hooks = slot().hooks;
  if (hooks?.onStream) hooks.onStream(name, text);
  else process[name].write(text);
}

const pendingKey = Symbol.for('coppice.notebook.pending');

function pendingSet(): Set<Promise<unknown>> {
  const g = globalThis as unknown as Record<symbol, Set<Promise<unknown>> | undefined>;
  let s = g[pendingKey];
  if (!s) {
    s = new Set();
    g[pendingKey] = s;
  }
  return s;
}

/** Remember a display still being prepared (an SVG rendering) so the cell waits for it. */
export function trackDisplay<T>(promise: Promise<T>): Promise<T> {
  const s = pendingSet();
  const settled = promise.then(() => undefined, () => undefined);
  s.add(settled);
  void settled.then(() => s.delete(settled));
  return promise;
}

/** Wait until every tracked display has been sent. */
export async function settleDisplays(): Promise<void> {
  const s = pendingSet();
  while (s.size > 0) await Promise.all([...s]);
}
