import { describe, expect, it } from 'vitest';
import * as aq from 'arquero';
import { tableBundle } from '../../src/notebook/table-bundle.js';
import { chartBundle, isChartSpec, VEGA_LITE_MIME } from '../../src/notebook/chart-bundle.js';
import { modelBundle, isModelValue } from '../../src/notebook/model-bundle.js';
import { escapeHtml } from '../../src/notebook/html-escape.js';
import { kindOfValue } from '../../src/notebook/represent.js';
import { formatCell } from '../../src/notebook/format-cell.js';
import { glanceBundle } from '../../src/notebook/glance-bundle.js';
import { installSink } from '../../src/notebook/display-sink.js';
import { show } from '../../src/notebook/show.js';
import type { DisplayMessage } from '../../src/notebook/display-types.js';
import type { TreeModel } from '../../src/learn/tree-model.js';

describe('escapeHtml(text)', () => {
  it('escapes the five reserved characters (HTML Living Standard, "escaping a string")', () => {
    expect(escapeHtml(`<a href="x">'&'</a>`)).toBe('&lt;a href=&quot;x&quot;&gt;&#39;&amp;&#39;&lt;/a&gt;');
  });
});

describe('formatCell(value)', () => {
  it('shortens numbers and marks missing values', () => {
    expect([formatCell(0.123456), formatCell(3), formatCell(1.5e-7), formatCell(NaN), formatCell(null), formatCell(true)])
      .toEqual(['0.1235', '3', '1.500e-7', '·', '·', 'true']);
  });
});

describe('tableBundle(table, options)', () => {
  it('escapes every value and column name taken from data', () => {
    const b = tableBundle([{ '<col>': '<script>alert(1)</script>', n: 1 }]);
    const html = b['text/html'] as string;
    expect(html).not.toContain('<script>');
    expect(html).toContain('&lt;script&gt;alert(1)&lt;/script&gt;');
    expect(html).toContain('<th>&lt;col&gt;</th>');
  });

  it('cuts a long arquero table and says how many rows are shown', () => {
    const t = aq.table({ x: Array.from({ length: 50 }, (_, i) => i), y: Array.from({ length: 50 }, () => 'a') });
    const b = tableBundle(t, { rows: 5 });
    expect((b['text/html'] as string).match(/<tr>/g)).toHaveLength(6); // header + 5 rows
    expect(b['text/html']).toContain('5 of 50 rows shown × 2 columns');
    expect((b['text/plain'] as string).split('\n')).toEqual(['x  y', '0  a', '1  a', '2  a', '3  a', '4  a', '(5 of 50 rows shown)']);
  });

  it('reads a Frame, showing missing codes as missing', () => {
    const frame = {
      nRows: 2,
      columns: [
        { name: 'n', kind: 'numeric' as const, values: Float64Array.of(1.5, NaN) },
        { name: 'c', kind: 'categorical' as const, codes: Int32Array.of(-1, 0), categories: ['red'] },
      ],
      schema: { columns: [], fingerprint: '' },
    };
    expect(tableBundle(frame)['text/plain']).toBe('  n  c\n1.5  ·\n  ·  red\n(2 rows)');
  });

  it('shows an empty table as zero rows', () => {
    expect(tableBundle(aq.table({ a: [] }))['text/plain']).toBe('a\n(0 rows)');
  });
});

describe('glanceBundle(table)', () => {
  it('shows one row per column', () => {
    const b = glanceBundle(aq.table({ size: [1, 2, null], colour: ['red', 'blue', 'red'] }));
    const text = b['text/plain'] as string;
    expect(text.split('\n')[0]).toBe('3 rows × 2 columns');
    expect(text).toMatch(/size\s+numeric\s+1\s+2/);
    expect(text).toMatch(/colour\s+categorical\s+0\s+2/);
  });
});

const spec = {
  $schema: 'https://vega.github.io/schema/vega-lite/v5.json',
  title: 'sizes',
  data: { values: [{ a: 'x', b: 1 }, { a: 'y', b: 3 }] },
  mark: 'bar',
  encoding: { x: { field: 'a', type: 'nominal' }, y: { field: 'b', type: 'quantitative' } },
};

describe('chartBundle(spec)', () => {
  it('is one bundle: the vega-lite spec as an object, an SVG and a short text', async () => {
    const b = await chartBundle(spec as never);
    expect(Object.keys(b).sort()).toEqual(['image/svg+xml', 'text/plain', VEGA_LITE_MIME].sort());
    expect(typeof b[VEGA_LITE_MIME]).toBe('object');
    expect(b[VEGA_LITE_MIME]).toEqual(spec);
    expect(b['image/svg+xml']).toMatch(/^<svg[\s\S]*<\/svg>$/);
    expect(b['text/plain']).toBe('[chart: sizes]');
  });

  it('isChartSpec(x) recognises specs by schema or shape', () => {
    expect(isChartSpec(spec)).toBe(true);
    expect(isChartSpec({ mark: 'point', data: { values: [] } })).toBe(true);
    expect(isChartSpec({ mark: 'point' })).toBe(false);
    expect(isChartSpec([spec])).toBe(false);
  });
});

const leafTree = {
  nNodes: 3, nOutputs: 2, kind: Uint8Array.of(1, 0, 0), feature: Int32Array.of(0, -1, -1), threshold: Float64Array.of(2.45, 0, 0),
  left: Int32Array.of(1, -1, -1), right: Int32Array.of(2, -1, -1), missing: Int32Array.of(1, -1, -1), offset: new Int32Array(3), width: new Int32Array(3),
  branches: new Int32Array(0), catBits: new Uint32Array(0), value: new Float64Array(6), cover: new Float64Array(3), count: new Float64Array(3), gain: new Float64Array(3),
};
const model: TreeModel = {
  kind: 'tree', task: 'classification', features: [{ name: 'petal<length>', kind: 'numeric' }],
  target: { name: 'species', kind: 'class', classes: ['a', 'b'] }, settings: { depthLimit: 1, criterion: 'gini' }, seed: 0,
  fingerprint: { schema: '', data: '' }, tree: leafTree, trainingRows: 10, droppedRows: 0,
};

describe('modelBundle(model, name)', () => {
  it('summarises kind, task, features, size and settings, escaped in HTML', () => {
    const b = modelBundle(model, 'first');
    expect(isModelValue(model)).toBe(true);
    expect(b['text/plain']).toBe([
      'first: tree model',
      '  task           classification of species (2 classes)',
      '  features       1: petal<length>',
      '  size           3 nodes, 2 leaves',
      '  training rows  10',
      '  settings       depthLimit=1, criterion=gini',
    ].join('\n'));
    expect(b['text/html']).toContain('petal&lt;length&gt;');
  });

  it('states the last and the lowest watched loss of a boosting model, and the rounds it keeps', () => {
    // an early-stopped fit: watched loss lowest after round 2, stopped after round 4 (patience 2)
    const boosted = {
      ...model, kind: 'boosting', settings: {}, tree: undefined, trees: [leafTree, leafTree], loss: 'logistic',
      trainLoss: [0.69, 0.5, 0.4, 0.35, 0.3], watchLoss: [0.69, 0.55, 0.5, 0.52, 0.53], bestRound: 2, roundsKept: 2,
    };
    const lines = String(modelBundle(boosted as unknown as TreeModel)['text/plain']).split('\n');
    expect(lines).toContain('  training loss (logistic)  0.3 after round 4');
    expect(lines).toContain('  watched loss (logistic)   0.53 after round 4; lowest 0.5 after round 2; model keeps rounds 1–2');
  });

  it('says how a tree was pruned', () => {
    const pruned = { ...model, settings: { pruning: { method: 'costComplexity', alpha: 0.0125, rule: 'oneSE', evaluation: 'crossValidation', folds: 10 } } };
    expect(String(modelBundle(pruned)['text/plain'])).toContain('  pruned         cost complexity, α = 0.0125 (rule oneSE, 10-fold cross-validation)');
  });
});

describe('kindOfValue(value)', () => {
  it('picks chart, model, table or text', () => {
    expect([kindOfValue(spec), kindOfValue(model), kindOfValue([{ a: 1 }]), kindOfValue(aq.table({ a: [1] })), kindOfValue(42), kindOfValue([1, 2])])
      .toEqual(['chart', 'model', 'table', 'table', 'text', 'text']);
  });
});

describe('show(value, options)', () => {
  it('sends one display message per value to the installed sink', async () => {
    const seen: DisplayMessage[] = [];
    const restore = installSink({ onDisplay: (m) => seen.push(m) });
    try {
      await show([{ a: 1 }]);
      await show(spec);
      await show('plain words');
    } finally {
      restore();
    }
    expect(seen).toHaveLength(3);
    expect(seen[0].data['text/html']).toContain('<table>');
    expect(typeof seen[1].data[VEGA_LITE_MIME]).toBe('object');
    expect(seen[2].data).toEqual({ 'text/plain': 'plain words' });
  });
});
