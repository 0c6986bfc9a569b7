/**
 * Collect a cell's output as Jupyter nbformat 4 outputs: display messages become `display_data` (an update with a
 * display id replaces the earlier output in place), stream text is merged into `stream` outputs, and a failure
 * becomes an `error` output.
 */
import type { DisplayMessage } from './display-types.js';

export type NotebookOutput = Record<string, unknown>;

export interface OutputCollector {
  onDisplay(message: DisplayMessage, update: boolean): void;
  onStream(name: 'stdout' | 'stderr', text: string): void;
  /** Append an error output. */
  error(name: string, message: string, trace: readonly string[]): void;
  /** Outputs of the current cell so far. */
  readonly outputs: NotebookOutput[];
  /** Start a new cell's outputs (display ids stay known across cells, as in Jupyter). */
  next(): void;
}

/** Deep copy through JSON so typed arrays or class instances never reach the notebook file. */
function plain(value: unknown): unknown {
  return JSON.parse(JSON.stringify(value ?? null));
}

/**
 * A collector for outputs.
 * @example
 * const out = collectOutputs();
 * const cells = createCellExecutor({ onDisplay: out.onDisplay, onStream: out.onStream });
 */
export function collectOutputs(): OutputCollector {
  let outputs: NotebookOutput[] = [];
  const byId = new Map<string, NotebookOutput[]>();
  const collector: OutputCollector = {
    get outputs() { return outputs; },
    onDisplay(message, update) {
      const id = message.transient?.display_id;
      const data = plain(message.data) as Record<string, unknown>;
      const metadata = plain(message.metadata ?? {}) as Record<string, unknown>;
      if (update) {
        for (const o of (id ? byId.get(id) : undefined) ?? []) { o.data = data; o.metadata = metadata; }
        return;
      }
      const o: NotebookOutput = { output_type: 'display_data', data, metadata };
      outputs.push(o);
      if (id) byId.set(id, [...(byId.get(id) ?? []), o]);
    },
    onStream(name, text) {
      const last = outputs[outputs.length - 1];
      if (last && last.output_type === 'stream' && last.name === name) last.text = `${String(last.text)}${text}`;
      else outputs.push({ output_type: 'stream', name, text });
    },
    error(name, message, trace) {
      outputs.push({ output_type: 'error', ename: name, evalue: message, traceback: [`${name}: ${message}`, ...trace] });
    },
    next() { outputs = []; },
  };
  collector.onDisplay = collector.onDisplay.bind(collector);
  collector.onStream = collector.onStream.bind(collector);
  return collector;
}
