/**
 * Flat trees as ONNX-ML TreeEnsembleRegressor tuples (ai.onnx.ml opset 3 operator definition in
 * onnx/docs/Operators-ml.md: node ids restart at 0 per tree and increase by 1; modes BRANCH_LEQ,
 * BRANCH_EQ, LEAF; nodes_missing_value_tracks_true).
 */
import { describe, expect, it } from 'vitest';
import { additiveModelOf } from '../../src/explain/additive-model.js';
import { ensembleTuples, float32AtMost } from '../../src/explain/onnx-tree-nodes.js';
import { modelToOnnx } from '../../src/explain/onnx-export.js';
import { fitStack } from '../../src/learn/ensemble/stacking.js';
import { MULTIWAY, SUBSET } from '../../src/learn/flat-tree.js';
import { fitTree } from '../../src/learn/tree/fit-tree.js';
import { orchard } from './fixtures.js';

/** The next float32 above float32 `f`. */
function nextFloat32Up(f: number): number {
  if (f === 0) return 1.401298464324817e-45;
  const a = new Float32Array([f]);
  const bits = new Int32Array(a.buffer);
  if (f > 0) bits[0] += 1; else bits[0] -= 1;
  return a[0];
}

describe('float32AtMost(t)', () => {
  it('is a float32 not above t, and the next float32 is above t (IEEE 754 single precision)', () => {
    for (const t of [0.1, -0.1, 1 / 3, 2.5, 1e-40, -1e-40, 123456.789, 0, 16777217]) {
      const f = float32AtMost(t);
      expect(Math.fround(f)).toBe(f);
      expect(f).toBeLessThanOrEqual(t);
      expect(nextFloat32Up(f)).toBeGreaterThan(t);
    }
    expect(float32AtMost(Infinity)).toBe(Infinity);
  });
});

describe('ensembleTuples(members, features)', () => {
  const data = orchard(200, 21, 'class');

  it('numbers nodes 0, 1, 2, ... per tree and writes one LEAF per leaf with its weights', () => {
    const model = fitTree(data, { depthLimit: 3, categorical: 'subset' });
    const t = ensembleTuples(additiveModelOf(model).members, model.features);
    expect(t.nodeIds).toEqual(t.nodeIds.map((_, i) => i));
    const leaves = t.modes.filter((m) => m === 'LEAF').length;
    const flatLeaves = Array.from(model.tree.kind).filter((k) => k === 0).length;
    expect(leaves).toBe(flatLeaves);
    expect(new Set(t.targetIds)).toEqual(new Set([0, 1, 2]));
  });

  it('a subset split becomes BRANCH_EQ tests on category codes; a multiway split one test per non-missing branch', () => {
    const sub = fitTree(data, { depthLimit: 4, categorical: 'subset' });
    const multi = fitTree(data, { depthLimit: 4, categorical: 'multiway' });
    expect(Array.from(sub.tree.kind)).toContain(SUBSET);
    expect(Array.from(multi.tree.kind)).toContain(MULTIWAY);
    for (const m of [sub, multi]) {
      const t = ensembleTuples(additiveModelOf(m).members, m.features);
      const eq = t.modes.map((mode, i) => [mode, i] as const).filter(([mode]) => mode === 'BRANCH_EQ');
      expect(eq.length).toBeGreaterThan(0);
      for (const [, i] of eq) {
        expect(Number.isInteger(t.values[i]) && t.values[i] >= 0 && t.values[i] < 4).toBe(true);
        expect(t.missingTrue[i]).toBe(0);
      }
    }
  });

  it('modelToOnnx refuses a stack (not additive in its trees)', () => {
    const stack = fitStack(orchard(120, 3, 'number'), [
      { name: 'a', fit: (d) => fitTree(d, { depthLimit: 2 }) },
      { name: 'b', fit: (d) => fitTree(d, { depthLimit: 3 }) },
    ]);
    expect(() => modelToOnnx(stack)).toThrow(/not supported/);
  });
});
