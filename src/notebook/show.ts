/**
 * `show(x)`: display any value in the notebook with the representation that fits it — a chart as one
 * bundle (vega-lite object + SVG + text), a model summary, a table (escaped HTML, cut with a note), or
 * plain text. Outside a notebook it prints the text form.
 */
import { formatWithOptions } from 'node:util';
import { emitDisplay, trackDisplay } from './display-sink.js';
import type { MimeBundle } from './display-types.js';
import { glanceBundle } from './glance-bundle.js';
import { noteShown } from './record-notes.js';
import type { RepresentOptions } from './represent.js';
import { bundleFor, kindOfValue } from './represent.js';

export interface ShowOptions extends RepresentOptions {
  /**
   * `'glance'` shows a table as one row per column (kind, missing, distinct, summary) instead of its rows.
   * __Default:__ the representation picked from the value.
   */
  readonly as?: 'glance';
}

/**
 * Display `value`; resolves once it has been sent. With a `title`, the output is also noted under that
 * name so a decision can cite it as evidence.
 * @example
 * await show(penguins, { as: 'glance' });
 * await show(chart, { title: 'learning curve' });
 */
export async function show(value: unknown, options: ShowOptions = {}): Promise<void> {
  const kind = options.as === 'glance' ? 'table' : kindOfValue(value);
  let bundle: MimeBundle | Promise<MimeBundle> | null =
    options.as === 'glance' ? glanceBundle(value, options.title) : bundleFor(value, options);
  if (bundle === null) bundle = { 'text/plain': typeof value === 'string' ? value : formatWithOptions({ colors: false }, value) };
  const data = await trackDisplay(Promise.resolve(bundle));
  emitDisplay({ data, metadata: {}, transient: {} });
  if (options.title) noteShown(options.title, kind);
}

/**
 * The same function as `show`, under a name that does not collide with the `show` message helper of
 * src/errors.ts in the flat package index.
 * @example
 * await showValue(model);
 */
export const showValue = show;
