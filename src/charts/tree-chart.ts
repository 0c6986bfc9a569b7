/**
 * The tree itself: boxes for nodes (split feature or prediction, rows reaching the node, and the class
 * mix as a small bar or the mean value as a tint), right-angled connectors with the condition of each
 * branch, laid out as a tidy tree (see `tree-layout.ts`). Deep trees are cut at a depth with a note.
 */
import { errors } from '../errors.js';
import { LEAF, type FlatTree } from '../learn/flat-tree.js';
import { chartEmpty } from './empty-chart.js';
import { formatNumber, formatShare } from './format-number.js';
import { finishChart, titles, type ChartOptions, type ChartSpec } from './spec.js';
import { ROLE, SEQUENTIAL_RAMP, SERIES_COLOURS } from './theme.js';
import { countBelow, treeEdges, type TreeFeature } from './tree-labels.js';
import { BOX_HALF_W, LINE_FONT, sizeBoxes, textRoom, TITLE_FONT } from './tree-box-size.js';
import { layoutTidyTree } from './tree-layout.js';

/** A fitted tree with the names needed to label it. */
export interface TreeChartInput {
  readonly tree: FlatTree;
  /** Feature columns in the order the tree indexes them (a column schema fits). */
  readonly features: readonly TreeFeature[];
  /** Class labels in code order (classification trees). __Default:__ none: node values are drawn as numbers. */
  readonly classes?: readonly string[];
}

/** Options for `chartTree`. */
export interface TreeChartOptions extends Omit<ChartOptions, 'width' | 'height'> {
  /** Deepest level drawn (root = 0); deeper branches are collapsed into a note. __Default:__ 3. */
  readonly maxDepth?: number;
  /** Name of the predicted quantity (regression legend title). __Default:__ 'value'. */
  readonly valueName?: string;
  /**
   * Pixels per node slot across (a box is 88% of a slot). __Default:__ 128, widened so the longest caption
   * shown fits its box, up to 220; longer captions end in "…".
   */
  readonly slotWidth?: number;
  /** Pixels per level down. __Default:__ 92 (108 when a caption takes two lines). */
  readonly levelHeight?: number;
}

/** Box half-height in levels: normal, and with two-line titles. */
const BOX_HALF_H = 0.31;
const BOX_HALF_H_WRAPPED = 0.35;
/** Line height of a two-line title, in pixels. */
const TITLE_LINE = 13;

function nodeHeadline(tree: FlatTree, n: number, input: TreeChartInput): { title: string; share?: string; mean: number } {
  const k = tree.nOutputs;
  if (input.classes && k > 1) {
    let best = 0, total = 0;
    for (let c = 0; c < k; c++) { total += tree.value[n * k + c]; if (tree.value[n * k + c] > tree.value[n * k + best]) best = c; }
    const share = total > 0 ? tree.value[n * k + best] / total : 0;
    const label = input.classes[best] ?? `class ${best}`;
    return { title: tree.kind[n] === LEAF ? `${label} ${formatShare(share)}` : (input.features[tree.feature[n]]?.name ?? `feature ${tree.feature[n]}`), mean: NaN };
  }
  const v = tree.value[n * k];
  return { title: tree.kind[n] === LEAF ? formatNumber(v) : (input.features[tree.feature[n]]?.name ?? `feature ${tree.feature[n]}`), mean: v };
}

/**
 * Draw a fitted tree.
 *
 * @param input   The `FlatTree`, feature names/categories and class labels.
 * @param options `maxDepth` __Default:__ 3; `valueName` __Default:__ 'value'; `slotWidth` __Default:__ 128, widened up
 *                to 220 to fit captions; `levelHeight` __Default:__ 92 (108 with two-line captions); plus title and subtitle.
 * @example
 * chartTree({ tree, features: model.features, classes: model.target.classes }, { maxDepth: 2 });
 */
export function chartTree(input: TreeChartInput, options: TreeChartOptions = {}): ChartSpec {
  const { tree } = input;
  const maxDepth = options.maxDepth ?? 3;
  if (!(Number.isInteger(maxDepth) && maxDepth >= 0)) throw errors.badOption('maxDepth', maxDepth, 'an integer >= 0');
  if (options.slotWidth !== undefined && !(options.slotWidth >= 60)) throw errors.badOption('slotWidth', options.slotWidth, 'a number of pixels >= 60');
  if (options.levelHeight !== undefined && !(options.levelHeight >= 60)) throw errors.badOption('levelHeight', options.levelHeight, 'a number of pixels >= 60');
  if (tree.nNodes === 0) return chartEmpty(options.title ?? 'Tree', 'The tree has no nodes.', {});
  const classification = input.classes !== undefined && tree.nOutputs > 1;
  if (input.classes !== undefined && tree.nOutputs !== input.classes.length && tree.nOutputs > 1) {
    throw errors.badOption('classes', input.classes.length, `${tree.nOutputs} class labels (the tree's outputs)`);
  }
  // Visible nodes: breadth-first down to maxDepth; children lists for the layout.
  const children: number[][] = Array.from({ length: tree.nNodes }, () => []);
  const edgeInfo: { parent: number; child: number; condition: string; takesMissing: boolean }[] = [];
  const depthOf = new Int32Array(tree.nNodes).fill(-1);
  const collapsed = new Set<number>();
  const queue = [0];
  depthOf[0] = 0;
  let deepest = 0, treeDepth = 0;
  const allDepth = new Int32Array(tree.nNodes);
  for (let n = 0; n < tree.nNodes; n++) {
    if (tree.kind[n] === LEAF) continue;
    for (const e of treeEdges(tree, n, input.features)) if (e.child > n) allDepth[e.child] = allDepth[n] + 1;
  }
  for (let n = 0; n < tree.nNodes; n++) treeDepth = Math.max(treeDepth, allDepth[n]);
  while (queue.length > 0) {
    const v = queue.shift()!;
    deepest = Math.max(deepest, depthOf[v]);
    if (tree.kind[v] === LEAF) continue;
    if (depthOf[v] >= maxDepth) { collapsed.add(v); continue; }
    for (const e of treeEdges(tree, v, input.features)) {
      if (e.child < 0 || e.child >= tree.nNodes || depthOf[e.child] >= 0) throw errors.badModel(`tree node ${v} has an invalid child ${e.child}`);
      depthOf[e.child] = depthOf[v] + 1;
      children[v].push(e.child);
      edgeInfo.push({ parent: v, ...e });
      queue.push(e.child);
    }
  }
  const layout = layoutTidyTree(children);
  const rootRows = tree.count[0];
  const nodes: Record<string, unknown>[] = [];
  const bars: Record<string, unknown>[] = [];
  for (let n = 0; n < tree.nNodes; n++) {
    if (depthOf[n] < 0) continue;
    const x = layout.x[n], d = depthOf[n];
    const head = nodeHeadline(tree, n, input);
    const rows = `${formatNumber(tree.count[n])} ${tree.count[n] === 1 ? 'row' : 'rows'}${rootRows > 0 && n !== 0 ? ` · ${formatShare(tree.count[n] / rootRows)}` : ''}`;
    const third = classification ? '' : tree.kind[n] === LEAF ? '' : `mean ${formatNumber(head.mean)}`;
    const hidden = collapsed.has(n) ? countBelow(tree, n, input.features) : 0;
    nodes.push({ id: n, x, d, x0: x - BOX_HALF_W, x1: x + BOX_HALF_W,
      title: head.title, rows, third, leaf: tree.kind[n] === LEAF, collapsed: hidden > 0, note: hidden > 0 ? `+ ${hidden} nodes below` : '',
      mean: head.mean });
    if (classification) {
      const k = tree.nOutputs;
      let total = 0;
      for (let c = 0; c < k; c++) total += tree.value[n * k + c];
      let at = x - BOX_HALF_W + 0.05;
      const span = 2 * (BOX_HALF_W - 0.05);
      for (let c = 0; c < k; c++) {
        const w = total > 0 ? (span * tree.value[n * k + c]) / total : 0;
        if (w > 0) bars.push({ cls: input.classes![c], bx0: at, bx1: at + w, by0: d + 0.12, by1: d + 0.22, share: formatShare(w / span) });
        at += w;
      }
    }
  }
  const sized = sizeBoxes(nodes as { title: string; rows: string; third: string }[], options.slotWidth);
  const slot = sized.slot;
  // Two-line titles: taller boxes, more room between levels, the title block moved up.
  const halfH = sized.wrapped ? BOX_HALF_H_WRAPPED : BOX_HALF_H;
  const level = options.levelHeight ?? (sized.wrapped ? 108 : 92);
  const titleAt = sized.wrapped ? -0.19 : -0.16, rowsAt = sized.wrapped ? 0.02 : 0;
  // vega puts the first line of a multi-line text at the given y, so a two-line title starts half a line higher.
  nodes.forEach((node, i) => Object.assign(node, {
    title: sized.titles[i], titleDy: titleAt - (Array.isArray(sized.titles[i]) ? TITLE_LINE / 2 / level : 0),
    y0: (node.d as number) - halfH, y1: (node.d as number) + halfH,
  }));
  const links: Record<string, unknown>[] = [];
  const labels: Record<string, unknown>[] = [];
  for (const e of edgeInfo) {
    const xp = layout.x[e.parent], xc = layout.x[e.child], d = depthOf[e.parent];
    const mid = d + 0.47;
    links.push({ ax: xp, ay: d + halfH, bx: xp, by: mid }, { ax: xp, ay: mid, bx: xc, by: mid }, { ax: xc, ay: mid, bx: xc, by: d + 1 - halfH });
    labels.push({ x: xc, y: d + 0.59, text: `${e.takesMissing ? '∗ ' : ''}${e.condition}` });
  }
  const notes = [`∗ missing values follow this branch`];
  if (treeDepth > maxDepth) notes.unshift(`Showing depth ≤ ${maxDepth} of ${treeDepth}; deeper branches are collapsed`);
  const [title, subtitle] = titles(options, `Tree: ${tree.nNodes} nodes, depth ${treeDepth}`, notes.join(' · '));
  const xDomain = [-0.5, layout.width + 0.5];
  const yDomain = [-0.5, deepest + 0.5];
  const X = (field: string) => ({ field, type: 'quantitative', axis: null, scale: { domain: xDomain, nice: false, zero: false } });
  const Y = (field: string) => ({ field, type: 'quantitative', axis: null, scale: { domain: yDomain, nice: false, zero: false, reverse: true } });
  const text = (field: string, dy: number, extra: Record<string, unknown>) => ({
    data: { values: nodes },
    transform: [{ calculate: `datum.d + ${dy}`, as: 'ty' }],
    mark: { type: 'text', baseline: 'middle', limit: textRoom(slot), ...extra },
    encoding: { x: X('x'), y: Y('ty'), text: { field } },
  });
  const fill = classification
    ? { value: '#ffffff' }
    : { field: 'mean', type: 'quantitative', title: options.valueName ?? 'value', scale: { range: [SEQUENTIAL_RAMP[0], SEQUENTIAL_RAMP[1], '#a3b1de'], interpolate: 'lab', zero: false }, legend: { gradientLength: 160 } };
  const layers: Record<string, unknown>[] = [
    { data: { values: links }, mark: { type: 'rule', color: ROLE.faint, strokeWidth: 1.3 }, encoding: { x: X('ax'), y: Y('ay'), x2: { field: 'bx' }, y2: { field: 'by' } } },
    { data: { values: nodes }, transform: [{ filter: '!datum.collapsed' }], mark: { type: 'rect', cornerRadius: 4, stroke: '#8a8f98', strokeWidth: 1 },
      encoding: { x: X('x0'), x2: { field: 'x1' }, y: Y('y0'), y2: { field: 'y1' }, fill } },
    { data: { values: nodes }, transform: [{ filter: 'datum.collapsed' }], mark: { type: 'rect', cornerRadius: 4, stroke: '#5f6673', strokeWidth: 1.2, strokeDash: [4, 3] },
      encoding: { x: X('x0'), x2: { field: 'x1' }, y: Y('y0'), y2: { field: 'y1' }, fill } },
    { ...text('title', 0, { fontWeight: 'bold', fontSize: TITLE_FONT, lineHeight: TITLE_LINE, color: ROLE.ink }),
      transform: [{ calculate: 'datum.d + datum.titleDy', as: 'ty' }] },
    text('rows', rowsAt, { fontSize: LINE_FONT, color: '#3b4250' }),
    { data: { values: labels }, mark: { type: 'text', align: 'left', dx: 4, baseline: 'middle', fontSize: 10, color: '#3b4250', limit: slot - 16 },
      encoding: { x: X('x'), y: Y('y'), text: { field: 'text' } } },
  ];
  if (!classification) layers.push(text('third', 0.16, { fontSize: LINE_FONT, color: '#3b4250' }));
  if (classification && bars.length > 0) {
    layers.push({ data: { values: bars }, mark: { type: 'rect' },
      encoding: { x: X('bx0'), x2: { field: 'bx1' }, y: Y('by0'), y2: { field: 'by1' },
        color: { field: 'cls', type: 'nominal', title: 'class', scale: { domain: [...input.classes!], range: [...SERIES_COLOURS] } },
        tooltip: [{ field: 'cls', title: 'class' }, { field: 'share' }] } });
  }
  if (collapsed.size > 0) {
    layers.push({ ...text('note', halfH + 0.12, { fontSize: 10, fontStyle: 'italic', color: ROLE.muted }), transform: [{ filter: 'datum.collapsed' }, { calculate: `datum.d + ${halfH + 0.12}`, as: 'ty' }] });
  }
  return finishChart({ width: (layout.width + 1) * slot, height: (deepest + 1) * level, layer: layers }, title, subtitle);
}
