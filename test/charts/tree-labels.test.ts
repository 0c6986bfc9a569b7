import { describe, expect, it } from 'vitest';
import { countBelow, formatThreshold, treeEdges } from '../../src/charts/tree-labels.js';
import { FEATURES, gradeTree } from './gallery.js';

describe('treeEdges(tree, n, features)', () => {
  const tree = gradeTree();
  it('numeric split: "≤ t" to the left and "> t" to the right, marking where missing values go', () => {
    expect(treeEdges(tree, 0, FEATURES)).toEqual([
      { child: 1, condition: '≤ 4.25', takesMissing: true },
      { child: 2, condition: '> 4.25', takesMissing: false },
    ]);
  });
  it('subset split: categories whose bit is set go left, the others right', () => {
    // bits 0b10001: codes 0 (Elstar) and 4 (Santana) go left.
    expect(treeEdges(tree, 2, FEATURES)).toEqual([
      { child: 5, condition: 'Elstar, Santana', takesMissing: false },
      { child: 6, condition: 'Jonagold, Boskoop, Topaz', takesMissing: true },
    ]);
  });
  it('multiway split: one edge per distinct child, naming every category that leads there', () => {
    expect(treeEdges(tree, 4, FEATURES)).toEqual([
      { child: 7, condition: 'Elstar, Boskoop', takesMissing: true },
      { child: 8, condition: 'Jonagold', takesMissing: false },
      { child: 9, condition: 'Topaz, Santana', takesMissing: false },
    ]);
  });
  it('leaf: no edges', () => {
    expect(treeEdges(tree, 3, FEATURES)).toEqual([]);
  });
});

describe('countBelow(tree, n, features)', () => {
  it('counts every node under n', () => {
    const tree = gradeTree();
    expect(countBelow(tree, 0, FEATURES)).toBe(13);
    expect(countBelow(tree, 10, FEATURES)).toBe(2);
    expect(countBelow(tree, 3, FEATURES)).toBe(0);
  });
});

describe('formatThreshold(t)', () => {
  it('keeps six significant digits so labels do not round across data values', () => {
    expect(formatThreshold(38.25)).toBe('38.25');
    expect(formatThreshold(0.1234567)).toBe('0.123457');
    expect(formatThreshold(-2.5)).toBe('−2.5');
  });
});
