/**
 * A fitted model as a mime bundle: kind, task and target, features, settings, size, and the training and
 * watched scores the learner kept (loss curves, out-of-bag error, round errors, fold scores).
 */
import type { FlatTree } from '../learn/flat-tree.js';
import type { ModelHeader } from '../learn/model.js';
import type { MimeBundle } from './display-types.js';
import { formatCell } from './format-cell.js';
import { escapeHtml } from './html-escape.js';

const kinds = new Set(['tree', 'bagging', 'forest', 'adaboost', 'boosting', 'stack']);

/** True for a fitted coppice model (any kind). */
export function isModelValue(x: unknown): x is ModelHeader {
  const m = x as Partial<ModelHeader> | null;
  return m != null && typeof m === 'object' && typeof m.kind === 'string' && kinds.has(m.kind)
    && (m.task === 'classification' || m.task === 'regression') && Array.isArray(m.features) && m.settings != null;
}

type Loose = Record<string, unknown>;

function last(xs: unknown): number | null {
  if (!Array.isArray(xs) || xs.length === 0) return null;
  const v = xs[xs.length - 1] as unknown;
  if (typeof v === 'number') return v;
  if (v && typeof v === 'object') {
    const n = Object.values(v as Loose).filter((e): e is number => typeof e === 'number');
    return n.length ? n[n.length - 1] : null;
  }
  return null;
}

function treeSize(trees: readonly FlatTree[]): string {
  let nodes = 0;
  let leaves = 0;
  for (const t of trees) {
    nodes += t.nNodes;
    for (let i = 0; i < t.nNodes; i++) if (t.kind[i] === 0) leaves++;
  }
  return trees.length === 1 ? `${nodes} nodes, ${leaves} leaves` : `${trees.length} trees, ${nodes} nodes, ${leaves} leaves`;
}

/** How a tree was pruned, from the `settings.pruning` record the pruning functions write; null if not. */
function pruningText(p: unknown): string | null {
  if (p == null || typeof p !== 'object') return null;
  const r = p as Loose;
  if (r.method === 'reducedError') return `reduced error, on ${String(r.heldOutRows)} held-out rows`;
  if (r.method === 'costComplexity') {
    const on = r.evaluation === 'heldOut' ? 'held-out rows' : `${String(r.folds)}-fold cross-validation`;
    return `cost complexity, α = ${formatCell(r.alpha)} (rule ${String(r.rule)}, ${on})`;
  }
  return String(r.method);
}

/** Label → value lines summarising `model`. */
export function modelFacts(model: ModelHeader): [string, string][] {
  const m = model as unknown as Loose;
  const facts: [string, string][] = [];
  const classes = model.target.classes;
  facts.push(['task', `${model.task} of ${model.target.name}${classes ? ` (${classes.length} classes)` : ''}`]);
  facts.push(['features', `${model.features.length}: ${model.features.slice(0, 8).map((f) => f.name).join(', ')}${model.features.length > 8 ? ', …' : ''}`]);
  const trees = m.tree ? [m.tree as FlatTree] : Array.isArray(m.trees) ? (m.trees as FlatTree[]) : [];
  if (trees.length > 0) facts.push(['size', treeSize(trees)]);
  if (Array.isArray(m.members)) facts.push(['members', (m.members as { name: string }[]).map((x) => x.name).join(', ')]);
  if (typeof m.trainingRows === 'number') facts.push(['training rows', String(m.trainingRows)]);
  const lossName = typeof m.loss === 'string' ? ` (${m.loss})` : '';
  const train = last(m.trainLoss);
  if (train != null) facts.push([`training loss${lossName}`, `${formatCell(train)} after round ${(m.trainLoss as number[]).length - 1}`]);
  const watch = last(m.watchLoss);
  if (watch != null) {
    const curve = m.watchLoss as number[];
    const best = typeof m.bestRound === 'number' ? m.bestRound : curve.length - 1;
    const kept = m.roundsKept !== curve.length - 1 ? `; model keeps rounds 1–${String(m.roundsKept)}` : '';
    facts.push([`watched loss${lossName}`, `${formatCell(watch)} after round ${curve.length - 1}; lowest ${formatCell(curve[best])} after round ${best}${kept}`]);
  }
  if (Array.isArray(m.rounds) && m.rounds.length > 0) {
    const r = m.rounds[m.rounds.length - 1] as Loose;
    facts.push(['training error', formatCell(r.trainError)]);
    if (typeof r.watchError === 'number' && !Number.isNaN(r.watchError)) facts.push(['watched error', formatCell(r.watchError)]);
    if (typeof m.stopReason === 'string') facts.push(['stopped', m.stopReason]);
  }
  const oob = last(m.oobCurve);
  if (oob != null) facts.push(['out-of-bag error', formatCell(oob)]);
  if (Array.isArray(m.foldScores)) {
    facts.push(['fold scores', (m.foldScores as { name: string; score: number }[]).map((s) => `${s.name} ${formatCell(s.score)}`).join(', ')]);
  }
  const pruned = pruningText(model.settings.pruning);
  if (pruned) facts.push(['pruned', pruned]);
  const settings = Object.entries(model.settings).filter(([, v]) => v !== undefined && typeof v !== 'function' && typeof v !== 'object');
  if (settings.length > 0) facts.push(['settings', settings.map(([k, v]) => `${k}=${formatCell(v)}`).join(', ')]);
  if (model.seed) facts.push(['seed', String(model.seed)]);
  return facts;
}

/**
 * The bundle for a fitted model.
 * @example
 * modelBundle(model)['text/plain']; // 'tree model\n  task  classification of species (3 classes)\n  ...'
 */
export function modelBundle(model: ModelHeader, name?: string): MimeBundle {
  const facts = modelFacts(model);
  const heading = `${name ? `${name}: ` : ''}${model.kind} model`;
  const width = Math.max(...facts.map(([k]) => k.length));
  const text = [heading, ...facts.map(([k, v]) => `  ${k.padEnd(width)}  ${v}`)].join('\n');
  const rows = facts.map(([k, v]) => `<tr><th style="text-align:left">${escapeHtml(k)}</th><td style="text-align:left">${escapeHtml(v)}</td></tr>`).join('');
  const html = `<div class="coppice-model"><div><strong>${escapeHtml(heading)}</strong></div><table>${rows}</table></div>`;
  return { 'text/html': html, 'text/plain': text };
}
