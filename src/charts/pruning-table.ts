/**
 * Reduced-error pruning table as a chart: for every candidate node, the held-out error with its subtree
 * kept and with the node turned into a leaf, joined by a line coloured by the decision taken.
 */
import { errors } from '../errors.js';
import { checkFinite } from './check-input.js';
import { chartEmpty } from './empty-chart.js';
import { finishChart, plotSize, titles, type ChartOptions, type ChartSpec } from './spec.js';
import { ROLE } from './theme.js';

/** One candidate node of reduced-error pruning. */
export interface PruningTableRow {
  /** Node id (index in the tree). */
  readonly node: number;
  /** Depth of the node (root = 0). */
  readonly depth: number;
  /** Held-out rows reaching the node. */
  readonly rows: number;
  /** Held-out error of the node's subtree as it stands. */
  readonly errorWithSubtree: number;
  /** Held-out error if the node became a leaf. */
  readonly errorAsLeaf: number;
  /** What pruning did with the node. */
  readonly decision: 'prune' | 'keep';
}

/** Options for `chartPruningTable`. */
export interface PruningTableOptions extends ChartOptions {
  /** Name of the error (x-axis title). __Default:__ 'held-out errors (rows misclassified)'. */
  readonly errorName?: string;
}

const CHART = 'chartPruningTable';

/**
 * One line per candidate node: error kept vs error pruned, coloured by the decision.
 *
 * @param rows    Candidate nodes, in the order pruning visited them.
 * @param options `errorName` __Default:__ 'held-out errors (rows misclassified)'; plus title, subtitle, width,
 *                height (__Default:__ 24 px per node).
 * @example
 * chartPruningTable([{ node: 3, depth: 2, rows: 40, errorWithSubtree: 6, errorAsLeaf: 5, decision: 'prune' }]);
 */
export function chartPruningTable(rows: readonly PruningTableRow[], options: PruningTableOptions = {}): ChartSpec {
  const [title, subtitle] = titles(options, 'Reduced-error pruning: candidate nodes',
    'Hollow: error with the subtree kept · filled: error as a leaf; a node is pruned when that is no worse');
  if (rows.length === 0) return chartEmpty(title, 'No node was a pruning candidate.', options);
  const size = plotSize(options, 460, Math.max(80, rows.length * 24));
  const values = rows.map((r, i) => {
    if (r.decision !== 'prune' && r.decision !== 'keep') throw errors.chartInput(CHART, 'decision', i, r.decision, "'prune' or 'keep'");
    const node = checkFinite(CHART, 'node', i, r.node);
    const depth = checkFinite(CHART, 'depth', i, r.depth);
    const n = checkFinite(CHART, 'rows', i, r.rows);
    return {
      label: `node ${node} · depth ${depth} · ${n} rows`,
      kept: checkFinite(CHART, 'errorWithSubtree', i, r.errorWithSubtree),
      leaf: checkFinite(CHART, 'errorAsLeaf', i, r.errorAsLeaf),
      decision: r.decision === 'prune' ? 'pruned' : 'kept',
    };
  });
  const y = { field: 'label', type: 'nominal', title: null, sort: null, axis: { labelLimit: 220 } };
  const colour = {
    field: 'decision', type: 'nominal', title: 'decision',
    scale: { domain: ['pruned', 'kept'], range: [ROLE.accent, ROLE.primary] },
  };
  const x = { type: 'quantitative', title: options.errorName ?? 'held-out errors (rows misclassified)', scale: { zero: false, nice: true } };
  return finishChart({
    width: size.width,
    height: size.height,
    data: { values },
    encoding: { y },
    layer: [
      { mark: { type: 'rule', strokeWidth: 2.5 }, encoding: { x: { ...x, field: 'kept' }, x2: { field: 'leaf' }, color: colour } },
      { mark: { type: 'point', filled: false, size: 70, strokeWidth: 2 }, encoding: { x: { ...x, field: 'kept' }, color: colour } },
      { mark: { type: 'point', filled: true, size: 70 }, encoding: { x: { ...x, field: 'leaf' }, color: colour } },
    ],
  }, title, subtitle);
}
