import { describe, expect, it } from 'vitest';
import { chartTree } from '../../src/charts/tree-chart.js';
import { CoppiceError } from '../../src/errors.js';
import { LEAF, type FlatTree } from '../../src/learn/flat-tree.js';
import { FEATURES, gradeTree, LONG_FEATURES, oneRowLeafTree, shelfTree } from './gallery.js';
import { checkSpec } from './validate-spec.js';

type Layered = { layer: { data?: { values: Record<string, unknown>[] } }[]; title: { text: string; subtitle?: string }; width: number; height: number };

function nodeRows(spec: unknown): Record<string, unknown>[] {
  return (spec as Layered).layer[1].data!.values;
}

describe('chartTree({ tree, features, classes }, options)', () => {
  it('draws every node of a shallow tree and labels leaves with class and share', () => {
    const spec = chartTree({ tree: gradeTree(), features: FEATURES, classes: ['grade A', 'grade B', 'rejected'] }, { maxDepth: 5 });
    const rows = (spec as unknown as Layered).layer[1].data!.values;
    expect(rows).toHaveLength(14);
    expect(rows.find((r) => r.id === 3)!.title).toBe('grade A 84%');
    expect(rows.find((r) => r.id === 0)!.title).toBe('bruise_score');
    expect((spec as unknown as Layered).title.subtitle).not.toContain('collapsed');
  });

  it('collapses below maxDepth, says so, and notes how many nodes are hidden', () => {
    const spec = chartTree({ tree: gradeTree(), features: FEATURES, classes: ['A', 'B', 'R'] }, { maxDepth: 1 });
    const all = [...nodeRows(spec), ...((spec as unknown as Layered).layer[2].data!.values)];
    const ids = new Set(all.map((r) => r.id));
    expect([...ids].sort((a, b) => Number(a) - Number(b))).toEqual([0, 1, 2]);
    expect(all.find((r) => r.id === 2)!.note).toBe('+ 6 nodes below'); // 5, 6; 10, 11 under 6; 12, 13 under 10
    expect((spec as unknown as Layered).title.subtitle).toContain('Showing depth ≤ 1 of 4');
  });

  it('regression tree: values as numbers, width grows with the number of slots', async () => {
    const spec = chartTree({ tree: shelfTree(), features: FEATURES }, { maxDepth: 2, slotWidth: 100 });
    expect((spec as unknown as Layered).width).toBe(4 * 100);
    const { schema, warnings } = await checkSpec(spec);
    expect(schema).toEqual([]);
    expect(warnings).toEqual([]);
  });

  it('a one-node tree (a single leaf) draws one box', async () => {
    const leaf: FlatTree = { ...gradeTree(), nNodes: 1, kind: Uint8Array.of(LEAF), value: Float64Array.of(0.2, 0.3, 0.5), count: Float64Array.of(9) };
    const spec = chartTree({ tree: leaf, features: FEATURES, classes: ['A', 'B', 'R'] });
    expect(nodeRows(spec)).toHaveLength(1);
    expect(nodeRows(spec)[0].title).toBe('R 50%');
    expect((await checkSpec(spec)).warnings).toEqual([]);
  });

  it('a node reached by one training row says "1 row", not "1 rows"', () => {
    const rows = nodeRows(chartTree({ tree: oneRowLeafTree(), features: FEATURES, classes: ['A', 'B', 'R'] }));
    expect(rows.find((r) => r.id === 8)!.rows).toBe('1 row · 0.1%'); // 1 of 1,200 rows
    expect(rows.find((r) => r.id === 3)!.rows).toBe('410 rows · 34.2%');
  });

  it('long feature names: wider slots, and a name too long even then on two lines in taller boxes', async () => {
    const spec = chartTree({ tree: gradeTree(), features: LONG_FEATURES, classes: ['A', 'B', 'R'] });
    const rows = nodeRows(spec);
    expect(rows.find((r) => r.id === 0)!.title).toBe('Bruise Score (0–10)');
    expect(rows.find((r) => r.id === 1)!.title).toEqual(['Storage Duration', 'Before Grading (h)']);
    expect((spec as unknown as Layered).height).toBe(4 * 108);
    const { schema, warnings } = await checkSpec(spec);
    expect(schema).toEqual([]);
    expect(warnings).toEqual([]);
  });

  it('rejects a bad maxDepth and class labels that do not match the outputs', () => {
    expect(() => chartTree({ tree: gradeTree(), features: FEATURES }, { maxDepth: -1 })).toThrow(CoppiceError);
    expect(() => chartTree({ tree: gradeTree(), features: FEATURES, classes: ['A', 'B'] })).toThrow(/classes/);
  });
});
