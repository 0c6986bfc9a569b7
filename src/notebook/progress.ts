/**
 * Progress of a long fit or search. In a notebook it is ONE output updated in place (a display id, then
 * `update_display_data`): step of total, the latest scores, time elapsed and an estimate to finish; it
 * ends with a final summary. Without a notebook it is a line on stderr.
 *
 * Learners' callbacks feed it: `progress.step(done, { train: 0.31, watched: 0.35 })`.
 */
import { randomUUID } from 'node:crypto';
import { ROLE } from '../charts/theme.js';
import type { MimeBundle } from './display-types.js';
import { emitDisplay, hasRichSink, writeStream } from './display-sink.js';
import { formatCell } from './format-cell.js';
import { escapeHtml } from './html-escape.js';

export interface Progress {
  /**
   * Report that `done` units of the total are finished, with the latest scores; `total` (when given)
   * replaces the total set at the start (a learner may only know it once it runs).
   */
  step(done: number, scores?: Readonly<Record<string, number>>, total?: number): void;
  /** Replace the progress output with `summary` (a bundle or text). */
  finish(summary?: MimeBundle | string): void;
  /** Mark the work as stopped with `reason`, keeping the last progress shown. */
  fail(reason: string): void;
}

export interface ProgressOptions {
  /** Units of work in all. __Default:__ unknown (no estimate to finish). */
  readonly total?: number;
  /** Name of one unit: 'round', 'tree', 'fold', ... __Default:__ `'step'`. */
  readonly unit?: string;
  /** Least milliseconds between two updates (the last update is always sent). __Default:__ 200. */
  readonly interval?: number;
  /** Clock in milliseconds. __Default:__ `performance.now`. */
  readonly now?: () => number;
}

function seconds(ms: number): string {
  const s = ms / 1000;
  if (s < 60) return `${s < 10 ? s.toFixed(1) : Math.round(s)} s`;
  return `${Math.floor(s / 60)} min ${Math.round(s % 60)} s`;
}

/**
 * The progress text for one state.
 * @example
 * progressLine('forest', 'tree', 40, 200, { oob: 0.12 }, 2000); // 'forest: tree 40 of 200 · oob 0.12 · 2.0 s elapsed · about 8.0 s left'
 */
export function progressLine(label: string, unit: string, done: number, total: number | undefined,
  scores: Readonly<Record<string, number>>, elapsed: number): string {
  const parts = [`${label}: ${unit} ${done}${total ? ` of ${total}` : ''}`];
  for (const [k, v] of Object.entries(scores)) parts.push(`${k} ${formatCell(v)}`);
  parts.push(`${seconds(elapsed)} elapsed`);
  if (total && done > 0 && done < total) parts.push(`about ${seconds((elapsed / done) * (total - done))} left`);
  return parts.join(' · ');
}

function bar(done: number, total: number | undefined): string {
  if (!total) return '';
  const share = Math.max(0, Math.min(1, done / total));
  return `<div style="width:240px;height:6px;background:#e5e5e5"><div style="width:${(share * 100).toFixed(1)}%;height:6px;background:${ROLE.primary}"></div></div>`;
}

/**
 * Start reporting progress of work called `label`.
 * @example
 * const progress = startProgress('boosting', { total: 200, unit: 'round' });
 * for (let m = 1; m <= 200; m++) progress.step(m, { train: loss[m] });
 * progress.finish(modelBundle(model));
 */
export function startProgress(label: string, options: ProgressOptions = {}): Progress {
  const now = options.now ?? (() => performance.now());
  const interval = options.interval ?? 200;
  const unit = options.unit ?? 'step';
  const started = now();
  const rich = hasRichSink();
  const id = randomUUID();
  let shown = false;
  let lastSent = -Infinity;
  let lastLine = '';
  let ended = false;

  const send = (data: MimeBundle) => {
    emitDisplay({ data, metadata: {}, transient: { display_id: id } }, shown);
    shown = true;
  };
  let total = options.total;
  const render = (done: number, scores: Readonly<Record<string, number>>) => {
    lastLine = progressLine(label, unit, done, total, scores, now() - started);
    if (rich) send({ 'text/html': `<div class="coppice-progress">${escapeHtml(lastLine)}${bar(done, total)}</div>`, 'text/plain': lastLine });
    else writeStream('stderr', `\r${lastLine}`);
  };
  render(0, {});
  lastSent = now();

  return {
    step(done, scores = {}, newTotal) {
      if (ended) return;
      if (newTotal !== undefined) total = newTotal;
      const t = now();
      const final = total !== undefined && done >= total;
      if (!final && t - lastSent < interval) return;
      lastSent = t;
      render(done, scores);
    },
    finish(summary) {
      if (ended) return;
      ended = true;
      const took = `${label}: done in ${seconds(now() - started)}`;
      const data: MimeBundle = summary === undefined ? { 'text/plain': took }
        : typeof summary === 'string' ? { 'text/plain': summary } : summary;
      if (rich) send(data);
      else {
        writeStream('stderr', `\r${took}\n`);
        if (summary !== undefined) {
          const text = typeof data['text/plain'] === 'string' ? data['text/plain'] : '';
          if (text) writeStream('stdout', `${text}\n`);
        }
      }
    },
    fail(reason) {
      if (ended) return;
      ended = true;
      const text = `${lastLine} · stopped: ${reason}`;
      if (rich) send({ 'text/plain': text, 'text/html': `<div class="coppice-progress">${escapeHtml(text)}</div>` });
      else writeStream('stderr', `\r${text}\n`);
    },
  };
}
